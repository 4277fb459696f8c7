import hypergeometricPmf from '@stdlib/stats-base-dists-hypergeometric-pmf';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fisherExactTwoSided } from './fisher.js';
import { compareProportions } from './newcombe.js';

const count = (max: number) =>
  fc
    .integer({ min: 0, max })
    .chain((n) => fc.record({ successes: fc.integer({ min: 0, max: n }), trials: fc.constant(n) }));

describe('compareProportions: Newcombe method 10 interval', () => {
  // Newcombe (1998), Statistics in Medicine 17:873–890, Table II, method 10 (hybrid score).
  // Values recalled from memory of the paper.
  it.each([
    [56, 70, 48, 80, 0.0524, 0.3339],
    [9, 10, 3, 10, 0.1705, 0.809],
    [6, 7, 2, 7, 0.0582, 0.8062],
    [5, 56, 0, 29, -0.0381, 0.1926],
    [0, 10, 0, 20, -0.1611, 0.2775],
    [0, 10, 0, 10, -0.2775, 0.2775],
    [10, 10, 0, 20, 0.6791, 1],
    [10, 10, 0, 10, 0.6075, 1],
  ])('%i/%i vs %i/%i gives %f to %f (Newcombe 1998, recalled from memory)', (x1, n1, x2, n2, lower, upper) => {
    const r = compareProportions({ successes: x1, trials: n1 }, { successes: x2, trials: n2 });
    expect(r.difference).toBeCloseTo(x1 / n1 - x2 / n2, 12);
    expect(r.lower).toBeCloseTo(lower, 4);
    expect(r.upper).toBeCloseTo(upper, 4);
  });

  it('56/70 vs 48/80 has difference 0.2000 (Newcombe 1998)', () => {
    expect(compareProportions({ successes: 56, trials: 70 }, { successes: 48, trials: 80 }).difference).toBeCloseTo(
      0.2,
      12,
    );
  });

  it('says nothing when a group has no trials', () => {
    const r = compareProportions({ successes: 0, trials: 0 }, { successes: 3, trials: 9 });
    expect(r.difference).toBeNaN();
    expect([r.lower, r.upper, r.pValue]).toEqual([-1, 1, 1]);
  });

  it('rejects bad counts, naming the group', () => {
    expect(() => compareProportions({ successes: 4, trials: 3 }, { successes: 1, trials: 3 })).toThrow(/^a: /);
    expect(() => compareProportions({ successes: 1, trials: 3 }, { successes: 1, trials: -3 })).toThrow(/^b: /);
  });

  it('property: the interval contains the difference, stays in [−1, 1], and mirrors when a and b swap', () => {
    fc.assert(
      fc.property(count(300), count(300), (a, b) => {
        fc.pre(a.trials > 0 && b.trials > 0);
        const r = compareProportions(a, b);
        expect(
          -1 <= r.lower && r.lower <= r.difference + 1e-12 && r.difference <= r.upper + 1e-12 && r.upper <= 1,
        ).toBe(true);
        expect(r.pValue >= 0 && r.pValue <= 1).toBe(true);
        const s = compareProportions(b, a);
        expect(s.lower).toBeCloseTo(-r.upper, 12);
        expect(s.upper).toBeCloseTo(-r.lower, 12);
        expect(s.pValue).toBeCloseTo(r.pValue, 12);
      }),
    );
  });
});

describe("Fisher's exact test", () => {
  it('lady tasting tea [[3, 1], [1, 3]]: two-sided p = 0.4857 = 34/70 (Fisher 1935)', () => {
    expect(
      fisherExactTwoSided([
        [3, 1],
        [1, 3],
      ]),
    ).toBeCloseTo(34 / 70, 12);
    expect(
      fisherExactTwoSided([
        [3, 1],
        [1, 3],
      ]),
    ).toBeCloseTo(0.4857, 4);
  });

  it('the perfect tea table [[4, 0], [0, 4]] has p = 2/70 (Fisher 1935)', () => {
    expect(
      fisherExactTwoSided([
        [4, 0],
        [0, 4],
      ]),
    ).toBeCloseTo(2 / 70, 12);
  });

  it('matches the two-sided sum built from the @stdlib hypergeometric PMF', () => {
    // The PMF itself, not differences of the CDF: those lose all relative precision in the far
    // tail, where a tiny p-value lives.
    fc.assert(
      fc.property(fc.tuple(fc.nat(40), fc.nat(40), fc.nat(40), fc.nat(40)), ([a, b, c, d]) => {
        const n = a + b + c + d;
        fc.pre(n > 0);
        const draws = a + b; // row 1
        const successes = a + c; // column 1
        const pmf = (x: number) => hypergeometricPmf(x, n, successes, draws);
        const observed = pmf(a);
        let expected = 0;
        for (let x = Math.max(0, draws - (n - successes)); x <= Math.min(draws, successes); x++) {
          const p = pmf(x);
          if (p <= observed * (1 + 1e-7)) expected += p;
        }
        const actual = fisherExactTwoSided([
          [a, b],
          [c, d],
        ]);
        expect(Math.abs(actual - Math.min(1, expected))).toBeLessThanOrEqual(1e-9 * Math.max(expected, 1e-300) + 1e-12);
      }),
    );
  });

  it('compareProportions reports the Fisher p-value of its 2×2 table', () => {
    const r = compareProportions({ successes: 3, trials: 4 }, { successes: 1, trials: 4 });
    expect(r.pValue).toBeCloseTo(34 / 70, 12);
  });
});
