/**
 * Point symbols that tell series apart without colour. Drawn centred on (0, 0), as nivo's point and node
 * layers expect; `standalone` wraps one in its own <svg> for HTML legends. `hollow` draws the outline
 * only (in the colour), for "not yet paid off" marks.
 */
export const SYMBOL_SHAPES = ['circle', 'square', 'triangle', 'diamond', 'cross', 'hexagon', 'triangleDown'] as const;
export type SymbolShape = (typeof SYMBOL_SHAPES)[number];

/** The index-th shape, cycling. */
export function symbolShape(index: number): SymbolShape {
  return SYMBOL_SHAPES[((index % SYMBOL_SHAPES.length) + SYMBOL_SHAPES.length) % SYMBOL_SHAPES.length];
}

/** The SVG path of a shape `size` wide, centred on the origin (areas roughly alike across shapes). */
export function symbolPath(shape: SymbolShape, size: number): string {
  const r = size / 2;
  switch (shape) {
    case 'circle':
      return `M ${-r} 0 A ${r} ${r} 0 1 0 ${r} 0 A ${r} ${r} 0 1 0 ${-r} 0 Z`;
    case 'square': {
      const s = r * 0.85;
      return `M ${-s} ${-s} H ${s} V ${s} H ${-s} Z`;
    }
    case 'triangle':
      return `M 0 ${-r * 1.1} L ${r} ${r * 0.75} L ${-r} ${r * 0.75} Z`;
    case 'triangleDown':
      return `M 0 ${r * 1.1} L ${r} ${-r * 0.75} L ${-r} ${-r * 0.75} Z`;
    case 'diamond':
      return `M 0 ${-r * 1.1} L ${r} 0 L 0 ${r * 1.1} L ${-r} 0 Z`;
    case 'cross': {
      const t = r * 0.38;
      return `M ${-t} ${-r} H ${t} V ${-t} H ${r} V ${t} H ${t} V ${r} H ${-t} V ${t} H ${-r} V ${-t} H ${-t} Z`;
    }
    case 'hexagon': {
      const points = Array.from({ length: 6 }, (_, i) => {
        const a = (Math.PI / 3) * i + Math.PI / 6;
        return `${(Math.cos(a) * r).toFixed(2)} ${(Math.sin(a) * r).toFixed(2)}`;
      });
      return `M ${points.join(' L ')} Z`;
    }
  }
}

export function SymbolMark({
  shape,
  size,
  colour,
  hollow = false,
  standalone = false,
}: {
  shape: SymbolShape;
  size: number;
  colour: string;
  hollow?: boolean;
  standalone?: boolean;
}) {
  const path = hollow ? (
    <path d={symbolPath(shape, size)} fill="#ffffff" stroke={colour} strokeWidth={2} />
  ) : (
    <path d={symbolPath(shape, size)} fill={colour} stroke="#1f2328" strokeWidth={1.25} />
  );
  if (!standalone) return path;
  const box = size + 6;
  return (
    <svg
      width={box}
      height={box}
      viewBox={`${-box / 2} ${-box / 2} ${box} ${box}`}
      aria-hidden="true"
      focusable="false"
    >
      {path}
    </svg>
  );
}
