import { shrinkRates } from '@shoalbook/analytics';
import type { Rate } from '@shoalbook/shared';

const finiteOrNull = (x: number): number | null => (Number.isFinite(x) ? x : null);

/**
 * Rates of groups with their Wilson 95 % intervals and empirical-Bayes shrunk values (@shoalbook/analytics
 * shrinkRates: shrinkage toward the pooled rate of the groups given).
 */
export function groupRates(groups: readonly { successes: number; trials: number }[]): Rate[] {
  const shrunk = shrinkRates(groups.map((g, i) => ({ key: i, successes: g.successes, trials: g.trials })));
  return shrunk.map((r) => ({
    successes: r.successes,
    trials: r.trials,
    rate: finiteOrNull(r.rate),
    lower: r.lower,
    upper: r.upper,
    shrunk: finiteOrNull(r.shrunk),
  }));
}

/** One rate on its own (its shrunk value is the rate itself: there is nothing to pool with). */
export function singleRate(successes: number, trials: number): Rate {
  return groupRates([{ successes, trials }])[0]!;
}

/** 1 = best: by shrunk rate, then by more trials; groups without trials last. */
export function ranks(rates: readonly Rate[]): number[] {
  const order = rates
    .map((r, i) => ({ i, s: r.trials > 0 && r.shrunk !== null ? r.shrunk : -1, t: r.trials }))
    .sort((a, b) => b.s - a.s || b.t - a.t || a.i - b.i);
  const out = new Array<number>(rates.length);
  order.forEach((o, rank) => (out[o.i] = rank + 1));
  return out;
}

/**
 * Fish per hour fished: `fish` over `seconds` on the finds; null without any time (no timed stop, or figures
 * derived from catches, which carry no time).
 */
export function fishPerHour(fish: number, seconds: number): number | null {
  return seconds > 0 ? (fish * 3600) / seconds : null;
}
