/**
 * Shoalbook's chart look. nivo writes these into style attributes, so the theme's CSS tokens work and follow
 * light and dark screens: text in the default foreground (#1f2328 on white ≈ 15:1 in light), grid lines in the
 * muted border colour so they do not compete with the data. The fallbacks are the light values.
 */
export const CHART_TEXT = 'var(--fgColor-default, #1f2328)';
export const CHART_MUTED_TEXT = 'var(--fgColor-muted, #59636e)';
export const CHART_GRID = 'var(--borderColor-muted, #d1d9e0)';

export const chartTheme = {
  text: { fontFamily: "'Roboto Slab', Georgia, serif", fontSize: 12, fill: CHART_TEXT },
  axis: {
    domain: { line: { stroke: CHART_MUTED_TEXT, strokeWidth: 1 } },
    ticks: { line: { stroke: CHART_MUTED_TEXT, strokeWidth: 1 }, text: { fill: CHART_TEXT, fontSize: 12 } },
    legend: { text: { fill: CHART_TEXT, fontSize: 12, fontWeight: 600 } },
  },
  grid: { line: { stroke: CHART_GRID, strokeWidth: 1 } },
  labels: { text: { fontSize: 12, fontWeight: 600 } },
  tooltip: { container: { fontSize: 13, color: CHART_TEXT, background: 'var(--bgColor-default, #ffffff)' } },
};
