import quantile from '@stdlib/stats-base-dists-normal-quantile';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { wilsonInterval } from './wilson.js';

describe('wilsonInterval', () => {
  // Newcombe (1998), Statistics in Medicine 17:857–872, Table I, method 3 (score, no continuity
  // correction). Values recalled from memory of the paper.
  it.each([
    [81, 263, 0.2553, 0.3662],
    [15, 148, 0.0624, 0.1605],
    [0, 20, 0, 0.1611],
    [1, 29, 0.0061, 0.1718],
  ])('%i/%i gives %f–%f (Newcombe 1998, recalled from memory)', (x, n, lower, upper) => {
    const w = wilsonInterval(x, n);
    expect(w.estimate).toBe(x / n);
    expect(w.lower).toBeCloseTo(lower, 4);
    expect(w.upper).toBeCloseTo(upper, 4);
  });

  it('equals the roots of the score-test quadratic with z from @stdlib normal quantile', () => {
    // Independent route: (p̂ − p)² = z² p(1 − p)/n  ⇔  (1 + z²/n)p² − (2p̂ + z²/n)p + p̂² = 0.
    for (const confidence of [0.8, 0.9, 0.95, 0.99]) {
      const z = quantile(1 - (1 - confidence) / 2, 0, 1);
      for (let n = 1; n <= 60; n++) {
        for (let x = 0; x <= n; x++) {
          const p = x / n;
          const a = 1 + (z * z) / n;
          const b = -(2 * p + (z * z) / n);
          const c = p * p;
          const root = Math.sqrt(b * b - 4 * a * c);
          const w = wilsonInterval(x, n, confidence);
          expect(Math.abs(w.lower - (-b - root) / (2 * a))).toBeLessThan(1e-12);
          expect(Math.abs(w.upper - (-b + root) / (2 * a))).toBeLessThan(1e-12);
        }
      }
    }
  });

  it('returns NaN, 0, 1 for no trials', () => {
    const w = wilsonInterval(0, 0);
    expect(w.estimate).toBeNaN();
    expect([w.lower, w.upper]).toEqual([0, 1]);
  });

  it('rejects inconsistent counts and bad confidence levels with a RangeError', () => {
    expect(() => wilsonInterval(5, 4)).toThrow(/cannot exceed/);
    expect(() => wilsonInterval(1.5, 4)).toThrow(RangeError);
    expect(() => wilsonInterval(-1, 4)).toThrow(RangeError);
    expect(() => wilsonInterval(1, 4, 1)).toThrow(/confidence/);
    expect(() => wilsonInterval(1, 4, 0)).toThrow(/confidence/);
  });

  it('property: the interval contains the estimate and stays within [0, 1]', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 100_000 }).chain((n) => fc.tuple(fc.integer({ min: 0, max: n }), fc.constant(n))),
        fc.double({ min: 0.5, max: 0.999, noNaN: true }),
        ([x, n], confidence) => {
          const w = wilsonInterval(x, n, confidence);
          expect(0 <= w.lower && w.lower <= w.estimate && w.estimate <= w.upper && w.upper <= 1).toBe(true);
        },
      ),
    );
  });

  it('property: a higher confidence level never narrows the interval', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 1000 }).chain((n) => fc.tuple(fc.integer({ min: 0, max: n }), fc.constant(n))),
        ([x, n]) => {
          const narrow = wilsonInterval(x, n, 0.9);
          const wide = wilsonInterval(x, n, 0.99);
          expect(wide.lower).toBeLessThanOrEqual(narrow.lower);
          expect(wide.upper).toBeGreaterThanOrEqual(narrow.upper);
        },
      ),
    );
  });
});
