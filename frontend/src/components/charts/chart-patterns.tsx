import { Defs, patternDotsDef, patternLinesDef, patternSquaresDef, type Def } from '@nivo/core';
import { seriesColour, seriesPattern, type SeriesPattern } from './palette';

/**
 * Fill patterns that tell series apart without colour (for colour-blind readers and black-and-white
 * prints): each series gets its colour AND one of these textures, drawn in white over the colour.
 */
function patternDef(pattern: SeriesPattern, id: string, background: string): Def | null {
  const ink = '#ffffff';
  switch (pattern) {
    case 'solid':
      return null;
    case 'diagonal':
      return patternLinesDef(id, { background, color: ink, lineWidth: 2, spacing: 7, rotation: -45 });
    case 'dots':
      return patternDotsDef(id, { background, color: ink, size: 3, padding: 3, stagger: true });
    case 'cross':
      return patternSquaresDef(id, { background, color: ink, size: 3, padding: 4, stagger: true });
    case 'vertical':
      return patternLinesDef(id, { background, color: ink, lineWidth: 2, spacing: 6, rotation: 90 });
    case 'horizontal':
      return patternLinesDef(id, { background, color: ink, lineWidth: 2, spacing: 6, rotation: 0 });
    case 'grid':
      return patternLinesDef(id, { background, color: ink, lineWidth: 1, spacing: 4, rotation: 45 });
  }
}

/** The pattern id of series `index` under a chart's prefix. */
export function seriesPatternId(prefix: string, index: number): string {
  return `${prefix}-series-${index}`;
}

/** nivo `defs` for `count` series (solid series have none). */
export function seriesDefs(prefix: string, count: number): Def[] {
  const defs: Def[] = [];
  for (let i = 0; i < count; i += 1) {
    const def = patternDef(seriesPattern(i), seriesPatternId(prefix, i), seriesColour(i));
    if (def) defs.push(def);
  }
  return defs;
}

/** Hatching that marks a group as uncertain (few finds behind it), over the bar's own colour. */
export function uncertainDef(id: string, background: string): Def {
  return patternLinesDef(id, { background, color: '#ffffff', lineWidth: 3, spacing: 8, rotation: -45 });
}

/** A small legend swatch drawing the same colour and pattern as series `index`. */
export function SeriesSwatch({ index, prefix, size = 16 }: { index: number; prefix: string; size?: number }) {
  const id = `${seriesPatternId(prefix, index)}-swatch`;
  const def = patternDef(seriesPattern(index), id, seriesColour(index));
  return <PatternSwatch def={def} colour={seriesColour(index)} size={size} />;
}

/** A swatch of any def (or plain colour when def is null). */
export function PatternSwatch({ def, colour, size = 16 }: { def: Def | null; colour: string; size?: number }) {
  return (
    <svg width={size} height={size} aria-hidden="true" focusable="false" style={{ flex: 'none' }}>
      {def ? <Defs defs={[def]} /> : null}
      <rect
        x={0.5}
        y={0.5}
        width={size - 1}
        height={size - 1}
        rx={2}
        fill={def ? `url(#${def.id})` : colour}
        stroke="#1f2328"
        strokeWidth={1}
      />
    </svg>
  );
}
