import { logBeta } from './special.js';
import { wilsonInterval } from './wilson.js';
import { assertConfidence, assertSuccessesTrials } from './validate.js';

/** Key of a group (a kind of place, a depth band, an event id, …). */
export type GroupKey = string | number | boolean | null;

/** Input row of {@link shrinkRates}. */
export interface RateGroup {
  key: GroupKey;
  successes: number;
  trials: number;
}

/** Output row of {@link shrinkRates}: the input plus the raw and shrunk rates (fractions). */
export type ShrunkRate<T extends RateGroup = RateGroup> = T & {
  /** successes / trials (NaN when trials = 0). */
  rate: number;
  /** Posterior mean under the fitted beta prior, between `rate` and the pooled rate. */
  shrunk: number;
  /** Wilson score interval of the raw rate (see {@link wilsonInterval}). */
  lower: number;
  upper: number;
};

/** Beta prior fitted to the groups: mean = pooled rate, strength = α + β in pseudo-trials. */
export interface BetaPrior {
  /** Pooled rate Σ successes / Σ trials (NaN when there are no trials at all). */
  mean: number;
  /** α + β; larger means the groups look more alike and are pulled harder to the mean. */
  strength: number;
  alpha: number;
  beta: number;
}

/** Strength cap: beyond this the groups are indistinguishable from one pooled rate. */
export const MAX_PRIOR_STRENGTH = 1e7;
const MIN_LOG10_STRENGTH = -2;
const MAX_LOG10_STRENGTH = Math.log10(MAX_PRIOR_STRENGTH);

/**
 * Fits the beta prior of an empirical-Bayes beta-binomial model. The prior mean is fixed at the
 * pooled rate (so shrinkage pulls toward it, never beyond it) and the strength α + β maximises the
 * beta-binomial marginal likelihood of the groups (grid on log10 strength, then golden-section).
 *
 * Source: the beta-binomial empirical-Bayes model, e.g. Efron & Morris (1975), J. Am. Stat. Assoc.
 * 70:311–319; Carlin & Louis, "Bayesian Methods for Data Analysis", ch. 5.
 */
export function fitBetaPrior(groups: readonly RateGroup[]): BetaPrior {
  let successes = 0;
  let trials = 0;
  for (const g of groups) {
    assertSuccessesTrials(g.successes, g.trials, `group ${String(g.key)}`);
    successes += g.successes;
    trials += g.trials;
  }
  if (trials === 0) return { mean: NaN, strength: 0, alpha: 0, beta: 0 };
  const mean = successes / trials;
  const observed = groups.filter((g) => g.trials > 0);
  if (mean === 0 || mean === 1 || observed.length < 2) {
    // Every group shows the same rate (or there is one group): nothing to tell them apart.
    return {
      mean,
      strength: MAX_PRIOR_STRENGTH,
      alpha: mean * MAX_PRIOR_STRENGTH,
      beta: (1 - mean) * MAX_PRIOR_STRENGTH,
    };
  }
  const logLikelihood = (log10Strength: number): number => {
    const m = 10 ** log10Strength;
    const a = mean * m;
    const b = (1 - mean) * m;
    const prior = logBeta(a, b);
    let sum = 0;
    for (const g of observed) sum += logBeta(g.successes + a, g.trials - g.successes + b) - prior;
    return sum;
  };
  const steps = 90;
  const step = (MAX_LOG10_STRENGTH - MIN_LOG10_STRENGTH) / steps;
  let best = 0;
  let bestValue = -Infinity;
  for (let i = 0; i <= steps; i++) {
    const value = logLikelihood(MIN_LOG10_STRENGTH + i * step);
    if (value > bestValue) {
      bestValue = value;
      best = i;
    }
  }
  let lo = MIN_LOG10_STRENGTH + Math.max(0, best - 1) * step;
  let hi = MIN_LOG10_STRENGTH + Math.min(steps, best + 1) * step;
  const ratio = (Math.sqrt(5) - 1) / 2;
  let x1 = hi - ratio * (hi - lo);
  let x2 = lo + ratio * (hi - lo);
  let f1 = logLikelihood(x1);
  let f2 = logLikelihood(x2);
  for (let i = 0; i < 40; i++) {
    if (f1 < f2) {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + ratio * (hi - lo);
      f2 = logLikelihood(x2);
    } else {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - ratio * (hi - lo);
      f1 = logLikelihood(x1);
    }
  }
  const strength = 10 ** ((lo + hi) / 2);
  return { mean, strength, alpha: mean * strength, beta: (1 - mean) * strength };
}

/**
 * Empirical-Bayes shrinkage of group rates toward the pooled rate, so that 2 successes in 3
 * trials do not outrank 40 in 100: each `shrunk` = (successes + α) / (trials + α + β), with the
 * beta prior (α, β) fitted from the groups themselves by {@link fitBetaPrior}. Small groups move
 * a lot, large ones barely; a group with no trials gets the pooled rate.
 *
 * @param groups `{ key, successes, trials }[]` (other fields are kept)
 * @param confidence level of the Wilson interval given as `lower`/`upper`, default 0.95
 * @returns the groups in input order with `{ rate, shrunk, lower, upper }` added (fractions)
 */
export function shrinkRates<T extends RateGroup>(groups: readonly T[], confidence = 0.95): ShrunkRate<T>[] {
  assertConfidence(confidence);
  const prior = fitBetaPrior(groups);
  return groups.map((g) => {
    const interval = wilsonInterval(g.successes, g.trials, confidence);
    const rate = interval.estimate;
    let shrunk: number;
    if (g.trials === 0) shrunk = prior.mean;
    else {
      const raw = (g.successes + prior.alpha) / (g.trials + prior.strength);
      // Clamp away floating-point noise so the convex combination stays between its ends.
      shrunk = Math.min(Math.max(raw, Math.min(rate, prior.mean)), Math.max(rate, prior.mean));
    }
    return { ...g, rate, shrunk, lower: interval.lower, upper: interval.upper };
  });
}
