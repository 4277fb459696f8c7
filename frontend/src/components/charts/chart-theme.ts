/**
 * Shoalbook's chart look. SVG needs plain colours, so the values mirror our CSS tokens: text in the
 * default foreground (#1f2328 on white ≈ 15:1), grid lines light enough not to compete with the data.
 */
export const CHART_TEXT = '#1f2328';
export const CHART_MUTED_TEXT = '#59636e';
export const CHART_GRID = '#d1d9e0';

export const chartTheme = {
  text: { fontFamily: "'Roboto Slab', Georgia, serif", fontSize: 12, fill: CHART_TEXT },
  axis: {
    domain: { line: { stroke: CHART_MUTED_TEXT, strokeWidth: 1 } },
    ticks: { line: { stroke: CHART_MUTED_TEXT, strokeWidth: 1 }, text: { fill: CHART_TEXT, fontSize: 12 } },
    legend: { text: { fill: CHART_TEXT, fontSize: 12, fontWeight: 600 } },
  },
  grid: { line: { stroke: CHART_GRID, strokeWidth: 1 } },
  labels: { text: { fontSize: 12, fontWeight: 600 } },
  tooltip: { container: { fontSize: 13, color: CHART_TEXT } },
};
