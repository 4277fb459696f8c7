import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { KG_PER_LB, MM_PER_IN, M_PER_FT, OZ_PER_LB, units } from './units.js';

describe('units (NIST SP 811 Appendix B; 16 CFR 500.19)', () => {
  it('uses the exact defined factors: 1 lb = 0.45359237 kg, 1 in = 25.4 mm, 1 ft = 0.3048 m, 1 lb = 16 oz', () => {
    expect(KG_PER_LB).toBe(0.45359237);
    expect(MM_PER_IN).toBe(25.4);
    expect(M_PER_FT).toBe(0.3048);
    expect(OZ_PER_LB).toBe(16);
    expect(units.lbToKg(1)).toBe(0.45359237);
    expect(units.inToMm(1)).toBe(25.4);
    expect(units.ftToM(1)).toBe(0.3048);
    expect(units.lbOzToLb(0, 16)).toBe(1);
  });

  it('agrees with derived NIST values: 1 kg = 2.204 622 6 lb, 1 m = 3.280 839 9 ft, 1 ft = 12 in', () => {
    expect(units.kgToLb(1)).toBeCloseTo(2.2046226, 7);
    expect(units.mToFt(1)).toBeCloseTo(3.2808399, 7);
    expect(units.ftToM(1) * 1000).toBeCloseTo(units.inToMm(12), 10);
  });

  it('converts temperatures at the fixed points (water freezes at 32 °F = 0 °C, boils at 212 °F = 100 °C; −40 is −40)', () => {
    expect(units.fToC(32)).toBe(0);
    expect(units.fToC(212)).toBe(100);
    expect(units.cToF(-40)).toBe(-40);
    expect(units.fToC(-40)).toBe(-40);
  });

  it('splits decimal pounds into pounds and ounces, carrying 16 oz', () => {
    expect(units.lbToLbOz(3.3)).toEqual({ lb: 3, oz: 4.8 });
    expect(units.lbToLbOz(5)).toEqual({ lb: 5, oz: 0 });
    expect(units.lbToLbOz(3.99, 0)).toEqual({ lb: 4, oz: 0 });
    expect(units.lbToLbOz(2.47, 1)).toEqual({ lb: 2, oz: 7.5 });
    expect(units.lbOzToLb(3, 4.8)).toBeCloseTo(3.3, 12);
  });

  it('rejects non-numbers and negative weights', () => {
    expect(() => units.lbToKg(Number.NaN)).toThrow(RangeError);
    expect(() => units.lbToLbOz(-1)).toThrow(/must not be negative/);
    expect(() => units.lbOzToLb(1, -2)).toThrow(/oz/);
  });

  it('property: round trips return the value (to 1e-12 relative)', () => {
    const close = (a: number, b: number) => Math.abs(a - b) <= 1e-12 * Math.max(1, Math.abs(b));
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (x) => {
        expect(close(units.kgToLb(units.lbToKg(x)), x)).toBe(true);
        expect(close(units.mmToIn(units.inToMm(x)), x)).toBe(true);
        expect(close(units.mToFt(units.ftToM(x)), x)).toBe(true);
        expect(close(units.cToF(units.fToC(x)), x)).toBe(true);
      }),
    );
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e4, noNaN: true }), (lb) => {
        const { lb: whole, oz } = units.lbToLbOz(lb);
        expect(Number.isInteger(whole) && oz >= 0 && oz < 16).toBe(true);
        expect(Math.abs(units.lbOzToLb(whole, oz) - lb)).toBeLessThan(1e-9);
      }),
    );
  });
});
