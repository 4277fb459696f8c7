import quantile from '@stdlib/stats-base-dists-normal-quantile';
import fc from 'fast-check';
import { jStat } from 'jstat';
import { describe, expect, it } from 'vitest';
import { logFactorial, logGamma, normalCdf, normalQuantile } from './special.js';

describe('normal distribution helpers (reference: @stdlib normal quantile, jstat)', () => {
  it('normalQuantile matches @stdlib/stats-base-dists-normal-quantile to 1e-11 over [1e-6, 1 − 1e-6]', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1 - 1e-6, noNaN: true }), (p) => {
        const reference = quantile(p, 0, 1);
        expect(Math.abs(normalQuantile(p) - reference)).toBeLessThanOrEqual(1e-11 * Math.max(1, Math.abs(reference)));
      }),
    );
  });

  it('normalQuantile matches @stdlib in the far tail [1e-10, 1e-6] to 1e-8 relative', () => {
    // There @stdlib itself drifts (about 1.3e-8 at p = 1e-10, against an arbitrary-precision
    // erfinv), so the tail is held to its precision, and to the round trip below.
    fc.assert(
      fc.property(fc.double({ min: 1e-10, max: 1e-6, noNaN: true }), (p) => {
        const reference = quantile(p, 0, 1);
        expect(Math.abs(normalQuantile(p) / reference - 1)).toBeLessThan(1e-8);
      }),
    );
  });

  it('round trip: normalCdf(normalQuantile(p)) = p to 1e-11 relative', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-12, max: 1 - 1e-6, noNaN: true }), (p) => {
        expect(Math.abs(normalCdf(normalQuantile(p)) / p - 1)).toBeLessThan(1e-11);
      }),
    );
  });

  it('gives the textbook z values 1.959964 (95 %) and 2.575829 (99 %) (standard normal tables)', () => {
    expect(normalQuantile(0.975)).toBeCloseTo(1.959964, 6);
    expect(normalQuantile(0.995)).toBeCloseTo(2.575829, 6);
  });

  it('normalCdf matches jstat.normal.cdf to 1e-13 absolute', () => {
    fc.assert(
      fc.property(fc.double({ min: -9, max: 9, noNaN: true }), (x) => {
        expect(Math.abs(normalCdf(x) - jStat.normal.cdf(x, 0, 1))).toBeLessThan(1e-13);
      }),
    );
  });

  it('rejects p outside (0, 1)', () => {
    expect(() => normalQuantile(0)).toThrow(RangeError);
    expect(() => normalQuantile(1)).toThrow(RangeError);
  });

  it('logGamma matches jstat.gammaln to 1e-12 relative', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e7, noNaN: true }), (x) => {
        const reference = jStat.gammaln(x);
        expect(Math.abs(logGamma(x) - reference)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(reference)));
      }),
    );
  });

  it('logFactorial agrees with summed logarithms on both sides of its table', () => {
    for (const n of [0, 1, 5, 100, 256, 257, 1000]) {
      let sum = 0;
      for (let k = 2; k <= n; k++) sum += Math.log(k);
      expect(logFactorial(n)).toBeCloseTo(sum, 9);
    }
  });
});
