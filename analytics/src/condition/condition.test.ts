import { describe, expect, it } from 'vitest';
import { units } from '../weigh-in/units.js';
import { DEFAULT_PLAUSIBLE_RELATIVE_WEIGHT, relativeWeight, weightLooksWrong } from './relative-weight.js';
import { STANDARD_WEIGHT_EQUATIONS, standardWeightG } from './standard-weight.js';

describe('standardWeightG (Neumann, Guy & Willis 2012, Fisheries Techniques 3rd ed.)', () => {
  // Coefficients recalled from memory of the compilation; verify against the publication.
  it.each([
    ['largemouth', -5.528, 3.273, 150, 'Henson (1991)'],
    ['smallmouth', -5.329, 3.2, 150, 'Kolander et al. (1993)'],
    ['spotted', -5.392, 3.215, 100, 'Wiens et al. (1996)'],
  ] as const)(
    '%s uses log10 Ws = %f + %f log10 TL from %i mm (%s, recalled from memory)',
    (species, a, b, min, source) => {
      expect(STANDARD_WEIGHT_EQUATIONS[species]).toEqual({ intercept: a, slope: b, minTotalLengthMm: min, source });
    },
  );

  // Hand-computed with bc(1): 10^(a + b·log10 TL).
  it.each([
    ['largemouth', 400, 973.9628],
    ['smallmouth', 350, 648.6609],
    ['spotted', 300, 373.2027],
  ] as const)('%s at %i mm weighs %f g (hand-computed)', (species, tl, ws) => {
    expect(standardWeightG(species, tl)).toBeCloseTo(ws, 3);
  });

  it('returns null below each minimum length', () => {
    expect(standardWeightG('largemouth', 149.9)).toBeNull();
    expect(standardWeightG('largemouth', 150)).not.toBeNull();
    expect(standardWeightG('smallmouth', 149)).toBeNull();
    expect(standardWeightG('spotted', 99)).toBeNull();
    expect(standardWeightG('spotted', 100)).not.toBeNull();
  });

  it('a 20 in largemouth of standard weight is about 4½–5 lb (common practice among anglers)', () => {
    const lb = units.kgToLb(standardWeightG('largemouth', units.inToMm(20))! / 1000);
    expect(lb).toBeGreaterThan(4.3);
    expect(lb).toBeLessThan(5.2);
  });

  it('rejects unknown species and non-numeric lengths', () => {
    expect(() => standardWeightG('striped' as never, 300)).toThrow(/no standard-weight equation/);
    expect(() => standardWeightG('largemouth', Number.NaN)).toThrow(RangeError);
  });
});

describe('relativeWeight and weightLooksWrong', () => {
  it('Wr = 100·W/Ws (Wege & Anderson 1978)', () => {
    const ws = standardWeightG('smallmouth', 350)!;
    expect(relativeWeight('smallmouth', 350, ws)).toBeCloseTo(100, 10);
    expect(relativeWeight('smallmouth', 350, 1.1 * ws)).toBeCloseTo(110, 10);
    expect(relativeWeight('smallmouth', 120, 50)).toBeNull();
    expect(() => relativeWeight('smallmouth', 350, 0)).toThrow(/weightG/);
  });

  it('flags the typing mistakes the bounds were chosen for, not thin or fat real fish', () => {
    const tl = units.inToMm(18);
    const ws = standardWeightG('largemouth', tl)!;
    expect(DEFAULT_PLAUSIBLE_RELATIVE_WEIGHT).toEqual({ min: 60, max: 150 });
    expect(weightLooksWrong('largemouth', tl, ws)).toBe(false);
    expect(weightLooksWrong('largemouth', tl, 0.75 * ws)).toBe(false); // a thin fish
    expect(weightLooksWrong('largemouth', tl, 1.3 * ws)).toBe(false); // a heavy, gravid fish
    expect(weightLooksWrong('largemouth', tl, ws * units.lbToKg(1))).toBe(true); // kilograms typed as pounds
    expect(weightLooksWrong('largemouth', tl, ws / units.lbToKg(1))).toBe(true); // pounds typed as kilograms
    expect(weightLooksWrong('largemouth', tl * 2.54, ws)).toBe(true); // centimetres typed as inches
    expect(weightLooksWrong('largemouth', 100, 20)).toBeNull();
    expect(weightLooksWrong('largemouth', tl, 0.75 * ws, { min: 80, max: 120 })).toBe(true);
    expect(() => weightLooksWrong('largemouth', tl, ws, { min: 120, max: 80 })).toThrow(/bounds/);
  });
});
