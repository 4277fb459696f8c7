/**
 * Categorical colours for charts, taken from the colour-blind-safe set of Okabe & Ito ("Color Universal
 * Design", 2008), darkened where needed so each reaches at least 3:1 against white (WCAG 2.1, 1.4.11
 * non-text contrast). Colour never carries meaning alone: every series also gets a fill pattern or a
 * symbol shape, and a text label.
 */
export const SERIES_COLOURS = ['#0b6e99', '#c25400', '#117a5b', '#a8386b', '#6a51a3', '#8a6d00', '#4a4a4a'] as const;

/** Fill pattern ids, one per series, in the order of SERIES_COLOURS (see chart-patterns.ts). */
export const SERIES_PATTERNS = ['solid', 'diagonal', 'dots', 'cross', 'vertical', 'horizontal', 'grid'] as const;
export type SeriesPattern = (typeof SERIES_PATTERNS)[number];

export function seriesColour(index: number): string {
  return SERIES_COLOURS[index % SERIES_COLOURS.length];
}

export function seriesPattern(index: number): SeriesPattern {
  return SERIES_PATTERNS[index % SERIES_PATTERNS.length];
}

/** The bar colour of a single-series chart (our lake teal, 7.3:1 on white). */
export const PRIMARY_BAR = '#0d5c63';
/** The marker of the adjusted (shrunk) rate: warm amber with a dark outline so it reads on any bar. */
export const MARKER_FILL = '#f2b84b';
export const MARKER_STROKE = '#1f2328';
/** Whisker (interval) lines. */
export const WHISKER = '#1f2328';
