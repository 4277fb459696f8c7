import { describe, expect, it } from 'vitest';
import {
  entryToF,
  entryToFt,
  entryToIn,
  entryToLb,
  formatDepth,
  formatLength,
  formatTemperature,
  formatWeight,
  parseLength,
  parseTemperature,
  parseWeight,
  coordinateInputValue,
  formatShortDistance,
  readCoordinate,
  weightInputValue,
  lengthInputValue,
  temperatureInputValue,
  stepWeight,
} from './units';

// Exact defined factors, NIST SP 811 (2008) Appendix B.8/B.9 and 16 CFR 500.19 (the 1959 international
// yard and pound): 1 lb = 0.45359237 kg, 1 in = 25.4 mm, 1 ft = 0.3048 m, 1 lb = 16 oz; t/°C = (t/°F − 32)/1.8.

function entry<T>(parsed: { ok: true; entry: T } | { ok: false; error: string }): T {
  if (!parsed.ok) throw new Error(`expected a parse, got: ${parsed.error}`);
  return parsed.entry;
}

describe('weights', () => {
  it('1 lb is exactly 0.45359237 kg, and that many kilograms are exactly 1 lb back', () => {
    expect(entryToLb(entry(parseWeight('0.45359237', 'kg')))).toBe(1);
    expect(formatWeight(1, 'kg')).toBe('0.45 kg');
    // 1 kg ≈ 2.204 622 6 lb (NIST SP 811 B.9, inverse of the exact factor)
    expect(entryToLb(entry(parseWeight('1', 'kg')))).toBeCloseTo(2.2046226, 7);
    expect(formatWeight(1 / 0.45359237, 'kg')).toBe('1.00 kg');
  });

  it('reads pounds–ounces typed as 3-7, 3 7 or 3lb 7oz as 3 + 7/16 lb exactly', () => {
    for (const typed of ['3-7', '3 7', '3lb 7oz', '3 lb 7 oz']) {
      const e = entry(parseWeight(typed, 'lb-oz'));
      expect(e).toEqual({ value: 3, unit: 'lb-oz', ounces: 7 });
      expect(entryToLb(e)).toBe(3.4375);
    }
    expect(entry(parseWeight('4', 'lb-oz'))).toEqual({ value: 4, unit: 'lb-oz', ounces: 0 });
    expect(entryToLb(entry(parseWeight('2-8.5', 'lb-oz')))).toBe(2 + 8.5 / 16);
  });

  it('shows canonical pounds in each unit the user can pick', () => {
    expect(formatWeight(3.4375, 'lb')).toBe('3.44 lb');
    expect(formatWeight(3.4375, 'lb-oz')).toBe('3 lb 7.0 oz');
    // 3.4375 lb × 0.45359237 = 1.559223...kg
    expect(formatWeight(3.4375, 'kg')).toBe('1.56 kg');
    expect(formatWeight(null, 'kg')).toBe('—');
    // 15.99 oz rounds to 16.0 oz at one decimal and carries into the pound
    expect(formatWeight(2 + 15.99 / 16, 'lb-oz')).toBe('3 lb 0.0 oz');
  });

  it('refuses ounces of 16 or more, negative weights and words, with a sentence', () => {
    const sixteen = parseWeight('3-16', 'lb-oz');
    expect(sixteen.ok).toBe(false);
    expect(!sixteen.ok && sixteen.error).toMatch(/16 oz make a pound/);
    expect(parseWeight('-2.1', 'lb').ok).toBe(false);
    expect(parseWeight('heavy', 'lb').ok).toBe(false);
    expect(parseWeight('', 'kg').ok).toBe(false);
    expect(parseWeight('3.5-2', 'lb-oz').ok).toBe(false);
  });

  it('reads the decimal sign of the user’s locale (CLDR through Intl): 3,45 is 3.45 lb in de-DE', () => {
    expect(entry(parseWeight('3,45', 'lb', 'Weight', 'de-DE'))).toEqual({ value: 3.45, unit: 'lb' });
    expect(entry(parseWeight('3.45', 'lb', 'Weight', 'en-US'))).toEqual({ value: 3.45, unit: 'lb' });
    expect(entry(parseWeight('1,56', 'kg', 'Weight', 'fr-FR'))).toEqual({ value: 1.56, unit: 'kg' });
  });

  it('never turns 18,500 into 18.5 lb: refused, naming the field, with what to write instead', () => {
    // 18.5 lb = 18 lb 8 oz, since 1 lb = 16 oz (NIST Handbook 44, Appendix C).
    expect(parseWeight('18,500', 'lb', 'Weight', 'en-US')).toEqual({
      ok: false,
      error: "Weight: '18,500' is not a weight in pounds; write 18.5 or 18 lb 8 oz.",
    });
    expect(parseWeight('18.500', 'lb', 'Official weight', 'de-DE')).toEqual({
      ok: false,
      error: "Official weight: '18.500' is not a weight in pounds; write 18,5 or 18 lb 8 oz.",
    });
    expect(parseWeight('3,45', 'kg', 'Weight', 'en-US')).toEqual({
      ok: false,
      error: "Weight: '3,45' is not a weight in kilograms; write 3.45.",
    });
    const words = parseWeight('heavy', 'lb', 'Gross on the scale', 'en-US');
    expect(!words.ok && words.error).toBe(
      "Gross on the scale: 'heavy' is not a weight in pounds; write 3.5 or 3 lb 8 oz.",
    );
  });

  it('takes pounds and ounces spelled out in any unit, and the bare 18-8 only in pounds–ounces', () => {
    const lbOz = { value: 18, unit: 'lb-oz', ounces: 8 };
    for (const unit of ['lb', 'kg', 'lb-oz'] as const) {
      expect(entry(parseWeight('18 lb 8 oz', unit, 'Weight', 'en-US'))).toEqual(lbOz);
      expect(entry(parseWeight('18lbs 8oz', unit, 'Weight', 'en-US'))).toEqual(lbOz);
    }
    expect(entry(parseWeight('18 lb 8,5 oz', 'lb', 'Weight', 'de-DE'))).toEqual({ ...lbOz, ounces: 8.5 });
    expect(entry(parseWeight('18-8', 'lb-oz', 'Weight', 'en-US'))).toEqual(lbOz);
    expect(parseWeight('18-8', 'lb', 'Weight', 'en-US').ok).toBe(false); // in decimal pounds 18-8 means nothing sure
    expect(parseWeight('18 lb 16 oz', 'lb', 'Weight', 'en-US').ok).toBe(false);
  });

  it('keeps the unit typed after the number instead of reading it in the preferred one', () => {
    expect(entry(parseWeight('1.56 kg', 'lb', 'Weight', 'en-US'))).toEqual({ value: 1.56, unit: 'kg' });
    expect(entry(parseWeight('3.45 lb', 'kg', 'Weight', 'en-US'))).toEqual({ value: 3.45, unit: 'lb' });
    expect(entry(parseLength('387 mm', 'in', 'Length', 'en-US'))).toEqual({ value: 387, unit: 'mm' });
    expect(parseLength('15 kg', 'in', 'Length', 'en-US').ok).toBe(false);
  });

  it('refuses a length with another locale’s decimal sign, naming the field', () => {
    expect(parseLength('15,5', 'in', 'Length', 'en-US')).toEqual({
      ok: false,
      error: "Length: '15,5' is not a length in inches; write 15.5.",
    });
    expect(entry(parseLength('15,5', 'in', 'Length', 'de-DE'))).toEqual({ value: 15.5, unit: 'in' });
    expect(parseLength('1,016', 'mm', 'Minimum length', 'en-US')).toEqual({
      ok: false,
      error: "Minimum length: '1,016' is not a length in millimetres; write 1.016 or 1016.",
    });
  });

  it('prefills edit inputs in the user’s unit and locale so that they read back to the same weight', () => {
    expect(weightInputValue(3.45, 'lb', 'de-DE')).toBe('3,45');
    expect(entryToLb(entry(parseWeight(weightInputValue(3.45, 'lb', 'de-DE'), 'lb', 'Weight', 'de-DE')))).toBe(3.45);
    expect(lengthInputValue(15.25, 'in', 'fr-FR')).toBe('15,25');
    expect(weightInputValue(3.4375, 'lb-oz')).toBe('3-7');
    expect(entryToLb(entry(parseWeight(weightInputValue(3.4375, 'lb-oz'), 'lb-oz')))).toBe(3.4375);
    expect(weightInputValue(1, 'kg')).toBe('0.454');
    expect(weightInputValue(0.25, 'lb')).toBe('0.25');
  });
});

describe('lengths, depths and temperatures', () => {
  it('converts inches and millimetres with 25.4 exactly', () => {
    expect(formatLength(12, 'mm')).toBe('305 mm'); // 304.8 mm
    expect(formatLength(15.25, 'in')).toBe('15.25 in');
    expect(entryToIn(entry(parseLength('254', 'mm')))).toBe(10);
    expect(lengthInputValue(12, 'mm')).toBe('304.8');
  });

  it('converts feet and metres with 0.3048 exactly', () => {
    expect(formatDepth(20, 'm')).toBe('6.1 m'); // 6.096 m
    expect(formatDepth(12.5, 'ft')).toBe('12.5 ft');
    expect(entryToFt({ value: 3.048, unit: 'm' })).toBeCloseTo(10, 12);
  });

  it('converts °F and °C: 68 °F is 20 °C, −40 is the same on both scales, 32 °F freezes', () => {
    expect(formatTemperature(68, 'C')).toBe('20 °C');
    expect(formatTemperature(-40, 'C')).toBe('-40 °C');
    expect(formatTemperature(32, 'C')).toBe('0 °C');
    expect(entryToF(entry(parseTemperature('18.5', 'C')))).toBeCloseTo(65.3, 10);
    expect(entryToF(entry(parseTemperature('-2', 'C')))).toBeCloseTo(28.4, 10);
    expect(temperatureInputValue(65.3, 'C')).toBe('18.5');
  });

  it('refuses a negative length but takes a water temperature below zero', () => {
    expect(parseLength('-3', 'in').ok).toBe(false);
    expect(parseTemperature('-1', 'C').ok).toBe(true);
  });
});

// EPSG:4326 (WGS 84) axis ranges, from memory of the EPSG registry entry: latitude −90…90, longitude −180…180.
describe('coordinates', () => {
  it('reads decimal degrees up to the bounds and refuses past them or anything not a number', () => {
    expect(readCoordinate('34.512', 'lat', 'en-US')).toBe(34.512);
    expect(readCoordinate('-90', 'lat', 'en-US')).toBe(-90);
    expect(readCoordinate('180', 'lon', 'en-US')).toBe(180);
    expect(readCoordinate('90.0001', 'lat', 'en-US')).toBeNull();
    expect(readCoordinate('-180.5', 'lon', 'en-US')).toBeNull();
    expect(readCoordinate('120', 'lat', 'en-US')).toBeNull();
    expect(readCoordinate('120', 'lon', 'en-US')).toBe(120);
    expect(readCoordinate('north', 'lat', 'en-US')).toBeNull();
    expect(readCoordinate('-86,204', 'lon', 'de-DE')).toBe(-86.204);
  });

  it("writes a phone fix with six decimals in the locale's sign, and reads it back unchanged", () => {
    expect(coordinateInputValue(34.50031234, 'en-US')).toBe('34.500312');
    expect(coordinateInputValue(-86.2, 'de-DE')).toBe('-86,2');
    expect(readCoordinate(coordinateInputValue(-86.2041237, 'de-DE'), 'lon', 'de-DE')).toBe(-86.204124);
  });
});

describe('short distances (accuracy of a fix, the way to a find)', () => {
  it('are whole metres, or whole feet at 1 ft = 0.3048 m', () => {
    expect(formatShortDistance(4.4, 'm')).toBe('4 m');
    // 30 m = 98.43 ft, 45 m = 147.64 ft.
    expect(formatShortDistance(30, 'ft')).toBe('98 ft');
    expect(formatShortDistance(45, 'ft')).toBe('148 ft');
  });
});

describe("weight steps (the phone form's steppers)", () => {
  it("steps in the user's unit and never below 0; an empty field is 0, text that is no weight is left alone", () => {
    // 1.56 kg + 0.05 kg = 1.61 kg; in de-DE the decimal sign is the comma, both ways (CLDR).
    expect(stepWeight('1.56', 'kg', 0.05, 'en-US')).toBe('1.61');
    expect(stepWeight('1,56', 'kg', 0.05, 'de-DE')).toBe('1,61');
    expect(stepWeight('0.3', 'kg', -0.5, 'en-US')).toBe('0');
    // 3-15 is 63 oz; one more is 64 oz = 4 lb 0 oz (1 lb = 16 oz).
    expect(stepWeight('3-15', 'lb-oz', 1, 'en-US')).toBe('4-0');
    expect(stepWeight('', 'lb-oz', -16, 'en-US')).toBe('0-0');
    expect(stepWeight('', 'lb', 0.05, 'en-US')).toBe('0.05');
    // 2 lb typed in a kilogram form: 0.90718474 kg (× 0.45359237), up 0.05, to the gram.
    expect(stepWeight('2 lb', 'kg', 0.05, 'en-US')).toBe('0.957');
    expect(stepWeight('three', 'lb', 1, 'en-US')).toBeNull();
  });
});
