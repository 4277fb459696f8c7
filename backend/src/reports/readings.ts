import type { Rate } from '@shoalbook/shared';

/** 0.3456 → "35 %". */
export const percent = (x: number | null): string => (x === null ? '–' : `${Math.round(x * 100)} %`);

/** "22–50 %". */
export const interval = (r: { lower: number; upper: number }): string =>
  `${Math.round(r.lower * 100)}–${Math.round(r.upper * 100)} %`;

export const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

export function pValueText(p: number): string {
  if (p < 0.001) return 'p < 0.001';
  return `p = ${p < 0.01 ? p.toFixed(3) : p.toFixed(2)}`;
}

/** "Hard bottom produced on 14 of 40 finds fished (35 %, 22–50 %)." */
export function findRateReading(label: string, r: Rate): string {
  if (r.trials === 0) return `${label}: no finds fished yet.`;
  return `${label} produced on ${r.successes} of ${plural(r.trials, 'find')} fished (${percent(r.rate)}, ${interval(r)}).`;
}

/** "Major period: 63 of 150 fish (42 %, 34–50 %)." */
export function catchShareReading(label: string, r: Rate): string {
  if (r.trials === 0) return 'No catches logged yet.';
  return `${label}: ${r.successes} of ${plural(r.trials, 'fish', 'fish')} (${percent(r.rate)}, ${interval(r)}).`;
}

/** Said when a group is too small for its rank to mean much. */
export function smallSampleReading(label: string, trials: number): string {
  return `${label}: only ${plural(trials, 'find')} fished, too few to rank with confidence; its ranking leans on the crew's overall rate.`;
}

/**
 * Said when the small-sample adjustment pulls every group to the same rate: the empirical-Bayes prior found
 * no spread between the groups beyond what chance gives with these counts, so the ranking is not telling.
 */
export function noSpreadReading(groupingLabel: string, shrunk: number): string {
  return `Between ${groupingLabel}, the differences are no bigger than chance would give with these numbers of finds, so every adjusted rate sits near the overall ${percent(shrunk)}: narrow the filters to one lake or season, or fish more finds, before ranking them.`;
}

const points = (x: number) => `${Math.round(Math.abs(x) * 100)}`;

/**
 * The difference as a size in points with its interval on the same side, so "worse" never reads with negative
 * bounds; an interval that reaches past zero names both directions ("likely from 6 points higher to 94 lower").
 */
export function differenceText(difference: number, lower: number, upper: number): string {
  const [lo, hi] = difference < 0 ? [-upper, -lower] : [lower, upper];
  const [side, other] = difference < 0 ? ['lower', 'higher'] : ['higher', 'lower'];
  const size = difference === 0 ? '0 points' : `${points(difference)} points ${side}`;
  if (Math.round(lo * 100) < 0) return `${size}, likely from ${points(lo)} points ${other} to ${points(hi)} ${side}`;
  return `${size}, likely ${Math.round(lo * 100)} to ${Math.round(hi * 100)}`;
}
