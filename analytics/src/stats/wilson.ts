import { normalQuantile } from './special.js';
import { assertConfidence, assertSuccessesTrials } from './validate.js';

/** A proportion with its two-sided interval; all three values are fractions in [0, 1]. */
export interface ProportionInterval {
  /** successes / trials (NaN when trials = 0). */
  estimate: number;
  lower: number;
  upper: number;
}

/**
 * Wilson score interval for a binomial proportion, without continuity correction.
 *
 * Source: E. B. Wilson (1927), J. Am. Stat. Assoc. 22:209–212; method 3 of R. G. Newcombe (1998),
 * "Two-sided confidence intervals for the single proportion", Statistics in Medicine 17:857–872.
 *
 * @param successes count of successes (integer, 0 ≤ successes ≤ trials)
 * @param trials count of trials (integer ≥ 0)
 * @param confidence two-sided confidence level, default 0.95
 * @returns `{ estimate, lower, upper }` as fractions; `trials = 0` gives `{ NaN, 0, 1 }` (no information)
 * @throws RangeError on non-integer or inconsistent counts, or confidence outside (0, 1)
 */
export function wilsonInterval(successes: number, trials: number, confidence = 0.95): ProportionInterval {
  assertSuccessesTrials(successes, trials);
  assertConfidence(confidence);
  if (trials === 0) return { estimate: NaN, lower: 0, upper: 1 };
  const z = normalQuantile(1 - (1 - confidence) / 2);
  const p = successes / trials;
  const z2 = z * z;
  const denominator = 1 + z2 / trials;
  const centre = (p + z2 / (2 * trials)) / denominator;
  const half = (z / denominator) * Math.sqrt((p * (1 - p)) / trials + z2 / (4 * trials * trials));
  // At 0 or n successes the bound equals the estimate exactly; rounding must not push it past.
  const lower = successes === 0 ? 0 : Math.max(0, Math.min(p, centre - half));
  const upper = successes === trials ? 1 : Math.min(1, Math.max(p, centre + half));
  return { estimate: p, lower, upper };
}
