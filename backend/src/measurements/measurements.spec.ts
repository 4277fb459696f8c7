import { describe, expect, it } from 'vitest';
import { MeasurementError, resolveDepth, resolveLength, resolveTemperature, resolveWeight } from './measurements';

// Exact factors from NIST SP 811 Appendix B / 16 CFR 500.19: 1 lb = 0.45359237 kg, 1 in = 25.4 mm, 1 ft = 0.3048 m.
describe('measurements', () => {
  it('keeps what was typed and converts with exact factors', () => {
    expect(resolveWeight(undefined, { value: 3, unit: 'lb-oz', ounces: 4 })).toEqual({
      canonical: 3.25,
      value: 3,
      unit: 'lb-oz',
      ounces: 4,
    });
    const kg = resolveWeight(undefined, { value: 0.45359237, unit: 'kg' })!;
    expect(kg.canonical).toBeCloseTo(1, 12);
    expect(kg.value).toBe(0.45359237);
    expect(resolveLength(undefined, { value: 304.8, unit: 'mm' })!.canonical).toBeCloseTo(12, 12);
    expect(resolveDepth(undefined, { value: 3.048, unit: 'm' })!.canonical).toBeCloseTo(10, 12);
    // 100 °C is 212 °F (NIST SP 811 B.9).
    expect(resolveTemperature(undefined, { value: 100, unit: 'C' })!.canonical).toBeCloseTo(212, 12);
  });

  it('takes the canonical field as typed in canonical units', () => {
    expect(resolveWeight(2.75, undefined)).toEqual({ canonical: 2.75, value: 2.75, unit: 'lb', ounces: null });
    expect(resolveDepth(18, undefined)).toEqual({ canonical: 18, value: 18, unit: 'ft' });
  });

  it('distinguishes absent from cleared', () => {
    expect(resolveDepth(undefined, undefined)).toBeUndefined();
    expect(resolveDepth(null, undefined)).toBeNull();
  });

  it('refuses both forms at once, and ounces with another unit', () => {
    expect(() => resolveWeight(3, { value: 3, unit: 'lb' })).toThrow(MeasurementError);
    expect(() => resolveWeight(undefined, { value: 1, unit: 'kg', ounces: 2 })).toThrow(/lb-oz/);
  });
});
