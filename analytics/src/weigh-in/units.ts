import { assertFinite, assertNonNegative } from '../stats/validate.js';

/**
 * Exact unit factors. Sources: NIST Handbook 44 / NIST SP 811 Appendix B and 16 CFR 500.19
 * (the international pound and yard of 1959): 1 lb = 0.45359237 kg, 1 in = 25.4 mm,
 * 1 ft = 0.3048 m, 1 lb = 16 oz (avoirdupois).
 */
export const KG_PER_LB = 0.45359237;
export const MM_PER_IN = 25.4;
export const M_PER_FT = 0.3048;
export const OZ_PER_LB = 16;

/** Pounds kept to 1e-6 lb: sums of decimal pounds carry binary floating-point noise. */
export const cleanLb = (lb: number): number => Math.round(lb * 1e6) / 1e6;

/** Pounds and ounces, e.g. 3 lb 4.8 oz. */
export interface PoundsOunces {
  lb: number;
  oz: number;
}

/** Pounds (avoirdupois) → kilograms, exact factor 0.45359237 (16 CFR 500.19). */
function lbToKg(lb: number): number {
  assertFinite('lb', lb);
  return lb * KG_PER_LB;
}

/** Kilograms → pounds (divides by the exact 0.45359237). */
function kgToLb(kg: number): number {
  assertFinite('kg', kg);
  return kg / KG_PER_LB;
}

/** Pounds and ounces → decimal pounds (1 lb = 16 oz). */
function lbOzToLb(lb: number, oz: number): number {
  assertNonNegative('lb', lb);
  assertNonNegative('oz', oz);
  return lb + oz / OZ_PER_LB;
}

/**
 * Decimal pounds → whole pounds and ounces (1 lb = 16 oz). Ounces are cleaned of binary noise
 * (1e-9 oz) or, with `ozDecimals`, rounded to that many decimals, carrying 16 oz into a pound.
 */
function lbToLbOz(lb: number, ozDecimals?: number): PoundsOunces {
  assertNonNegative('lb', lb);
  const scale = 10 ** (ozDecimals ?? 9);
  const totalOz = Math.round(lb * OZ_PER_LB * scale) / scale;
  const whole = Math.floor(totalOz / OZ_PER_LB);
  const oz = Math.round((totalOz - whole * OZ_PER_LB) * scale) / scale;
  return { lb: whole, oz };
}

/** Inches → millimetres, exact factor 25.4. */
function inToMm(inches: number): number {
  assertFinite('inches', inches);
  return inches * MM_PER_IN;
}

/** Millimetres → inches (divides by the exact 25.4). */
function mmToIn(mm: number): number {
  assertFinite('mm', mm);
  return mm / MM_PER_IN;
}

/** Feet → metres, exact factor 0.3048. */
function ftToM(ft: number): number {
  assertFinite('ft', ft);
  return ft * M_PER_FT;
}

/** Metres → feet (divides by the exact 0.3048). */
function mToFt(m: number): number {
  assertFinite('m', m);
  return m / M_PER_FT;
}

/** Degrees Fahrenheit → degrees Celsius: (°F − 32) × 5/9 (NIST SP 811 B.9). */
function fToC(f: number): number {
  assertFinite('f', f);
  return ((f - 32) * 5) / 9;
}

/** Degrees Celsius → degrees Fahrenheit: °C × 9/5 + 32 (NIST SP 811 B.9). */
function cToF(c: number): number {
  assertFinite('c', c);
  return (c * 9) / 5 + 32;
}

/**
 * Unit conversions for display, with the exact defined factors (NIST SP 811; 16 CFR 500.19).
 * Store what the angler entered; convert only to show.
 */
export const units = Object.freeze({ lbToKg, kgToLb, lbOzToLb, lbToLbOz, inToMm, mmToIn, ftToM, mToFt, fToC, cToF });
