import { units } from '@shoalbook/analytics';
import type {
  DepthUnit,
  EnteredDepth,
  EnteredLength,
  EnteredTemperature,
  EnteredWeight,
  LengthUnit,
  TemperatureUnit,
  WeightUnit,
} from '@shoalbook/shared';

/**
 * A measurement resolved from a request: the canonical number (lb, in, ft, °F) and exactly what was
 * typed. Conversions use @shoalbook/analytics `units` (exact factors: 1 lb = 0.45359237 kg,
 * 1 in = 25.4 mm, 1 ft = 0.3048 m; NIST SP 811, 16 CFR 500.19).
 */
export interface Resolved<U extends string> {
  canonical: number;
  value: number;
  unit: U;
  ounces?: number | null;
}

export class MeasurementError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

/** Canonical field (e.g. weightLb) or entered value (e.g. weight), not both; both absent → undefined. */
function pick<T>(
  field: string,
  canonicalField: string,
  canonical: number | null | undefined,
  entered: T | null | undefined,
): 'canonical' | 'entered' | 'none' | 'null' {
  const hasCanonical = canonical !== undefined;
  const hasEntered = entered !== undefined;
  if (hasCanonical && hasEntered && canonical !== null && entered !== null) {
    throw new MeasurementError(field, `Give either ${canonicalField} or ${field}, not both.`);
  }
  if (hasEntered && entered !== null) return 'entered';
  if (hasCanonical && canonical !== null) return 'canonical';
  if (hasEntered || hasCanonical) return 'null';
  return 'none';
}

export function resolveWeight(
  weightLb: number | undefined,
  weight: EnteredWeight | undefined,
): Resolved<WeightUnit> | undefined {
  const which = pick('weight', 'weightLb', weightLb, weight);
  if (which === 'none' || which === 'null') return undefined;
  if (which === 'canonical') return { canonical: weightLb!, value: weightLb!, unit: 'lb', ounces: null };
  const w = weight!;
  if (w.unit === 'lb-oz')
    return { canonical: units.lbOzToLb(w.value, w.ounces ?? 0), value: w.value, unit: 'lb-oz', ounces: w.ounces ?? 0 };
  if (w.ounces !== undefined) throw new MeasurementError('weight.ounces', "Ounces go only with the unit 'lb-oz'.");
  return { canonical: w.unit === 'kg' ? units.kgToLb(w.value) : w.value, value: w.value, unit: w.unit, ounces: null };
}

export function resolveLength(
  lengthIn: number | null | undefined,
  length: EnteredLength | null | undefined,
): Resolved<LengthUnit> | null | undefined {
  const which = pick('length', 'lengthIn', lengthIn, length);
  if (which === 'none') return undefined;
  if (which === 'null') return null;
  if (which === 'canonical') return { canonical: lengthIn!, value: lengthIn!, unit: 'in' };
  return {
    canonical: length!.unit === 'mm' ? units.mmToIn(length!.value) : length!.value,
    value: length!.value,
    unit: length!.unit,
  };
}

export function resolveDepth(
  depthFt: number | null | undefined,
  depth: EnteredDepth | null | undefined,
): Resolved<DepthUnit> | null | undefined {
  const which = pick('depth', 'depthFt', depthFt, depth);
  if (which === 'none') return undefined;
  if (which === 'null') return null;
  if (which === 'canonical') return { canonical: depthFt!, value: depthFt!, unit: 'ft' };
  return {
    canonical: depth!.unit === 'm' ? units.mToFt(depth!.value) : depth!.value,
    value: depth!.value,
    unit: depth!.unit,
  };
}

export function resolveTemperature(
  waterTempF: number | null | undefined,
  waterTemp: EnteredTemperature | null | undefined,
): Resolved<TemperatureUnit> | null | undefined {
  const which = pick('waterTemp', 'waterTempF', waterTempF, waterTemp);
  if (which === 'none') return undefined;
  if (which === 'null') return null;
  if (which === 'canonical') return { canonical: waterTempF!, value: waterTempF!, unit: 'F' };
  return {
    canonical: waterTemp!.unit === 'C' ? units.cToF(waterTemp!.value) : waterTemp!.value,
    value: waterTemp!.value,
    unit: waterTemp!.unit,
  };
}

/** Rebuild the `entered` object of a view from stored columns. */
export function enteredOf<U extends string>(
  value: number | null,
  unit: string | null,
): { value: number; unit: U } | null {
  return value === null || unit === null ? null : { value, unit: unit as U };
}

export function enteredWeightOf(value: number, unit: string, ounces: number | null): EnteredWeight {
  return unit === 'lb-oz' ? { value, unit: 'lb-oz', ounces: ounces ?? 0 } : { value, unit: unit as WeightUnit };
}
