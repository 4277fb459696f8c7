import { fisherExactTwoSided } from './fisher.js';
import { wilsonInterval } from './wilson.js';
import { assertConfidence, assertSuccessesTrials } from './validate.js';

/** A count of successes out of trials (e.g. finds that produced a fish out of finds fished). */
export interface SuccessCount {
  successes: number;
  trials: number;
}

/** Difference of two proportions with its interval and an exact p-value. */
export interface ProportionComparison {
  /** pA − pB as a fraction in [−1, 1] (NaN when either group has no trials). */
  difference: number;
  /** Lower bound of the difference (Newcombe's hybrid score interval). */
  lower: number;
  /** Upper bound of the difference. */
  upper: number;
  /** Two-sided p-value of Fisher's exact test of pA = pB. */
  pValue: number;
}

/**
 * Compares two independent proportions a and b.
 *
 * - `difference` = pA − pB;
 * - `lower`/`upper`: Newcombe's hybrid score interval, method 10 of R. G. Newcombe (1998),
 *   "Interval estimation for the difference between independent proportions: comparison of
 *   eleven methods", Statistics in Medicine 17:873–890 (built from the two Wilson intervals);
 * - `pValue`: two-sided Fisher exact test (R. A. Fisher 1935) on the 2×2 table of the counts.
 *
 * When either group has no trials nothing can be said: `{ difference: NaN, lower: −1, upper: 1, pValue: 1 }`.
 *
 * @param a `{ successes, trials }` of the first group
 * @param b `{ successes, trials }` of the second group
 * @param confidence two-sided confidence level, default 0.95
 */
export function compareProportions(a: SuccessCount, b: SuccessCount, confidence = 0.95): ProportionComparison {
  assertSuccessesTrials(a.successes, a.trials, 'a');
  assertSuccessesTrials(b.successes, b.trials, 'b');
  assertConfidence(confidence);
  if (a.trials === 0 || b.trials === 0) return { difference: NaN, lower: -1, upper: 1, pValue: 1 };
  const wa = wilsonInterval(a.successes, a.trials, confidence);
  const wb = wilsonInterval(b.successes, b.trials, confidence);
  const difference = wa.estimate - wb.estimate;
  const delta = Math.hypot(wa.estimate - wa.lower, wb.upper - wb.estimate);
  const epsilon = Math.hypot(wa.upper - wa.estimate, wb.estimate - wb.lower);
  const pValue = fisherExactTwoSided([
    [a.successes, a.trials - a.successes],
    [b.successes, b.trials - b.successes],
  ]);
  return {
    difference,
    lower: Math.max(-1, difference - delta),
    upper: Math.min(1, difference + epsilon),
    pValue,
  };
}
