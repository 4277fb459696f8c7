import type { BarCustomLayer, BarCustomLayerProps, BarDatum, ComputedBarDatum } from '@nivo/bar';
import { MARKER_FILL, MARKER_STROKE, WHISKER } from './palette';

/** An interval drawn over one bar, in the bar's own value unit (e.g. percent). */
export interface BarInterval {
  lower: number;
  upper: number;
  /** Optional point estimate drawn as a diamond (e.g. the sample-size-adjusted rate). */
  marker?: number | null;
  /** Spoken and hover text, e.g. "Hard bottom: 22–50 %". */
  description: string;
}

type ValueScale = (value: number) => number;

/**
 * A custom nivo bar layer that draws an interval whisker (a line from lower to upper with end caps) and an
 * optional diamond marker over each bar. Works for vertical and horizontal layouts: the value axis is
 * the y scale for vertical bars and the x scale for horizontal ones. The layer ignores the pointer, so
 * the bars' own tooltips keep working beneath it.
 */
export function whiskerLayer<D extends BarDatum>(
  intervalOf: (bar: ComputedBarDatum<D>) => BarInterval | null,
  layout: 'horizontal' | 'vertical',
): BarCustomLayer<D> {
  function WhiskerLayer({ bars, xScale, yScale }: BarCustomLayerProps<D>) {
    const scale = (layout === 'horizontal' ? xScale : yScale) as unknown as ValueScale;
    return (
      <g className="sb-whiskers" pointerEvents="none">
        {bars.map((bar) => {
          const interval = intervalOf(bar);
          if (!interval) return null;
          const thickness = layout === 'horizontal' ? bar.height : bar.width;
          const cap = Math.max(4, Math.min(12, thickness * 0.45));
          const centre = layout === 'horizontal' ? bar.y + bar.height / 2 : bar.x + bar.width / 2;
          const from = scale(interval.lower);
          const to = scale(interval.upper);
          const at = (v: number, across: number) =>
            layout === 'horizontal' ? { x: v, y: centre + across } : { x: centre + across, y: v };
          const a = at(from, 0);
          const b = at(to, 0);
          const capLine = (v: number) => {
            const p = at(v, -cap / 2);
            const q = at(v, cap / 2);
            return <line x1={p.x} y1={p.y} x2={q.x} y2={q.y} stroke={WHISKER} strokeWidth={2} />;
          };
          const marker = interval.marker;
          const m = marker === null || marker === undefined ? null : at(scale(marker), 0);
          const r = Math.max(4, Math.min(7, thickness * 0.3));
          return (
            <g
              key={bar.key}
              className="sb-whisker"
              data-bar={String(bar.data.indexValue)}
              data-series={String(bar.data.id)}
            >
              <title>{interval.description}</title>
              {/* A white halo keeps the black line visible over dark bars and patterns. */}
              <line x1={a.x} y1={a.y} x2={b.x} y2={b.y} stroke="#ffffff" strokeWidth={5} strokeLinecap="round" />
              <line x1={a.x} y1={a.y} x2={b.x} y2={b.y} stroke={WHISKER} strokeWidth={2} />
              {capLine(from)}
              {capLine(to)}
              {m ? (
                <path
                  className="sb-marker"
                  d={`M ${m.x} ${m.y - r} L ${m.x + r} ${m.y} L ${m.x} ${m.y + r} L ${m.x - r} ${m.y} Z`}
                  fill={MARKER_FILL}
                  stroke={MARKER_STROKE}
                  strokeWidth={1.5}
                />
              ) : null}
            </g>
          );
        })}
      </g>
    );
  }
  return WhiskerLayer;
}
