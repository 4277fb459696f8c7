import { assertFinite } from '../stats/validate.js';

/**
 * Default depth band edges in feet: 0–5, 5–10, …, 25–30, 30–40, 40+. Shoalbook's own choice
 * (5 ft steps where most bass are caught, wider offshore), not a published standard.
 */
export const DEFAULT_DEPTH_BAND_EDGES_FT: readonly number[] = [5, 10, 15, 20, 25, 30, 40];

/**
 * Default water-temperature band edges in °F: below 50, 50–55, …, 80–85, 85 and over. Shoalbook's
 * own choice (5 °F steps across the range bass anglers fish), not a published standard.
 */
export const DEFAULT_TEMPERATURE_BAND_EDGES_F: readonly number[] = [50, 55, 60, 65, 70, 75, 80, 85];

function checkEdges(edges: readonly number[]): void {
  if (edges.length === 0) throw new RangeError('band edges must not be empty');
  edges.forEach((e, i) => {
    assertFinite(`band edge ${i}`, e);
    if (i > 0 && e <= edges[i - 1]) throw new RangeError('band edges must be strictly increasing');
  });
}

function bandIndex(value: number, edges: readonly number[]): number {
  let i = 0;
  while (i < edges.length && value >= edges[i]) i++;
  return i;
}

function depthLabels(edges: readonly number[]): string[] {
  const labels = [`0–${edges[0]} ft`];
  for (let i = 1; i < edges.length; i++) labels.push(`${edges[i - 1]}–${edges[i]} ft`);
  labels.push(`${edges[edges.length - 1]}+ ft`);
  return labels;
}

function temperatureLabels(edges: readonly number[]): string[] {
  const labels = [`<${edges[0]} °F`];
  for (let i = 1; i < edges.length; i++) labels.push(`${edges[i - 1]}–${edges[i]} °F`);
  labels.push(`${edges[edges.length - 1]}+ °F`);
  return labels;
}

/** Labels of the depth bands in order, shallow to deep (for chart axes). */
export function depthBandLabels(edges: readonly number[] = DEFAULT_DEPTH_BAND_EDGES_FT): string[] {
  checkEdges(edges);
  if (edges[0] <= 0) throw new RangeError('depth band edges must be positive');
  return depthLabels(edges);
}

/** Labels of the temperature bands in order, cold to warm (for chart axes). */
export function temperatureBandLabels(edges: readonly number[] = DEFAULT_TEMPERATURE_BAND_EDGES_F): string[] {
  checkEdges(edges);
  return temperatureLabels(edges);
}

/**
 * Depth band of a depth in feet, e.g. `'10–15 ft'`; each band includes its lower edge.
 *
 * @param depthFt depth in feet (≥ 0); `null`/`undefined` (not recorded) gives `null`
 * @param edges ascending upper edges in feet, default {@link DEFAULT_DEPTH_BAND_EDGES_FT}
 */
export function depthBand(
  depthFt: number | null | undefined,
  edges: readonly number[] = DEFAULT_DEPTH_BAND_EDGES_FT,
): string | null {
  const labels = depthBandLabels(edges);
  if (depthFt === null || depthFt === undefined) return null;
  assertFinite('depthFt', depthFt);
  if (depthFt < 0) throw new RangeError(`depthFt must not be negative, got ${depthFt}`);
  return labels[bandIndex(depthFt, edges)];
}

/**
 * Water-temperature band of a temperature in °F, e.g. `'60–65 °F'`; each band includes its lower edge.
 *
 * @param waterTempF water temperature in °F; `null`/`undefined` (not recorded) gives `null`
 * @param edges ascending edges in °F, default {@link DEFAULT_TEMPERATURE_BAND_EDGES_F}
 */
export function temperatureBand(
  waterTempF: number | null | undefined,
  edges: readonly number[] = DEFAULT_TEMPERATURE_BAND_EDGES_F,
): string | null {
  const labels = temperatureBandLabels(edges);
  if (waterTempF === null || waterTempF === undefined) return null;
  assertFinite('waterTempF', waterTempF);
  return labels[bandIndex(waterTempF, edges)];
}
