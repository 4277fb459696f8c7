import fc from 'fast-check';
import { jStat } from 'jstat';
import { describe, expect, it } from 'vitest';
import { fitBetaPrior, MAX_PRIOR_STRENGTH, shrinkRates } from './shrinkage.js';
import { wilsonInterval } from './wilson.js';

const groupsArb = fc.array(
  fc
    .integer({ min: 0, max: 200 })
    .chain((n) => fc.record({ key: fc.string(), successes: fc.integer({ min: 0, max: n }), trials: fc.constant(n) })),
  { minLength: 1, maxLength: 30 },
);

// Invented demo counts: finds that produced a fish out of finds fished, per kind of place.
const demo = [
  { key: 'shell', successes: 2, trials: 3 },
  { key: 'rock', successes: 40, trials: 100 },
  { key: 'grass', successes: 30, trials: 100 },
  { key: 'brush', successes: 20, trials: 90 },
  { key: 'contour', successes: 12, trials: 60 },
  { key: 'bait', successes: 33, trials: 110 },
];

describe('shrinkRates (empirical-Bayes beta-binomial)', () => {
  it('fits the prior mean at the pooled rate', () => {
    const prior = fitBetaPrior(demo);
    const pooled = demo.reduce((s, g) => s + g.successes, 0) / demo.reduce((s, g) => s + g.trials, 0);
    expect(prior.mean).toBeCloseTo(pooled, 14);
    expect(prior.alpha + prior.beta).toBeCloseTo(prior.strength, 9);
  });

  it('fits the strength that maximises the beta-binomial likelihood, computed independently with jstat.betaln', () => {
    const groups = [
      { key: 1, successes: 2, trials: 20 },
      { key: 2, successes: 15, trials: 20 },
      { key: 3, successes: 7, trials: 25 },
      { key: 4, successes: 12, trials: 18 },
      { key: 5, successes: 1, trials: 10 },
    ];
    const mean = 37 / 93;
    const logLik = (m: number) =>
      groups.reduce(
        (s, g) =>
          s +
          jStat.betaln(g.successes + mean * m, g.trials - g.successes + (1 - mean) * m) -
          jStat.betaln(mean * m, (1 - mean) * m),
        0,
      );
    let best = 0;
    let bestValue = -Infinity;
    for (let m = 0.05; m < 1000; m *= 1.0005) {
      const v = logLik(m);
      if (v > bestValue) [best, bestValue] = [m, v];
    }
    expect(Math.abs(fitBetaPrior(groups).strength / best - 1)).toBeLessThan(0.002);
  });

  it('gives each group the posterior mean of Beta(x + α, n − x + β) (reference: jstat.beta.mean)', () => {
    const prior = fitBetaPrior(demo);
    for (const g of shrinkRates(demo)) {
      expect(g.shrunk).toBeCloseTo(jStat.beta.mean(g.successes + prior.alpha, g.trials - g.successes + prior.beta), 12);
    }
  });

  it('two fish on three finds do not outrank forty on a hundred', () => {
    const byKey = new Map(shrinkRates(demo).map((g) => [g.key, g]));
    expect(byKey.get('shell')!.rate).toBeGreaterThan(byKey.get('rock')!.rate);
    expect(byKey.get('shell')!.shrunk).toBeLessThan(byKey.get('rock')!.shrunk);
  });

  it('pulls small groups further than large ones', () => {
    const prior = fitBetaPrior(demo);
    const shrunk = shrinkRates(demo);
    const move = (i: number) => Math.abs(shrunk[i].shrunk - shrunk[i].rate) / Math.abs(shrunk[i].rate - prior.mean);
    expect(move(0)).toBeGreaterThan(move(1)); // 3 trials against 100
  });

  it('keeps other fields, gives the Wilson interval of the raw rate, and the pooled rate to an empty group', () => {
    const out = shrinkRates([
      ...demo.map((g) => ({ ...g, label: `kind ${g.key}` })),
      { key: 'wood', successes: 0, trials: 0, label: 'none yet' },
    ]);
    const empty = out[out.length - 1];
    expect(empty.label).toBe('none yet');
    expect(empty.rate).toBeNaN();
    expect(empty.shrunk).toBeCloseTo(fitBetaPrior(demo).mean, 12);
    expect(out[1].lower).toBe(wilsonInterval(40, 100).lower);
    expect(out[1].upper).toBe(wilsonInterval(40, 100).upper);
  });

  it('pools completely when the groups show no spread beyond chance', () => {
    const same = [1, 2, 3, 4].map((key) => ({ key, successes: 10, trials: 50 }));
    expect(fitBetaPrior(same).strength).toBeGreaterThan(MAX_PRIOR_STRENGTH / 20);
    for (const g of shrinkRates(same)) expect(g.shrunk).toBeCloseTo(0.2, 6);
  });

  it('rejects bad counts', () => {
    expect(() => shrinkRates([{ key: 'x', successes: 3, trials: 2 }])).toThrow(/group x/);
  });

  it('property: shrinkage never moves a rate past the pooled rate', () => {
    fc.assert(
      fc.property(groupsArb, (groups) => {
        const prior = fitBetaPrior(groups);
        for (const g of shrinkRates(groups)) {
          if (g.trials === 0) continue;
          const lo = Math.min(g.rate, prior.mean);
          const hi = Math.max(g.rate, prior.mean);
          expect(g.shrunk >= lo && g.shrunk <= hi).toBe(true);
        }
      }),
    );
  });
});
