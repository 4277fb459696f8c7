import { units } from '@shoalbook/analytics';
import type { DepthUnit, LengthUnit, TemperatureUnit, UnitPreferences, WeightUnit } from '@shoalbook/shared';

/**
 * Display and entry of measurements. The API stores lb, in, ft and °F (canonical) and keeps what was typed;
 * the screens show the user's own units. Every conversion goes through @shoalbook/analytics `units`,
 * whose factors are the exact defined ones (NIST SP 811 App. B; 16 CFR 500.19: 1 lb = 0.45359237 kg,
 * 1 in = 25.4 mm, 1 ft = 0.3048 m, 1 lb = 16 oz).
 */

/** What a weight input sends: the typed value with its unit (ounces apart for lb-oz), per the journal contract. */
export interface WeightEntry {
  value: number;
  unit: WeightUnit;
  /** Only for 'lb-oz': the ounces part (0 ≤ oz < 16). */
  ounces?: number;
}

export interface LengthEntry {
  value: number;
  unit: LengthUnit;
}

export interface DepthEntry {
  value: number;
  unit: DepthUnit;
}

export interface TemperatureEntry {
  value: number;
  unit: 'F' | 'C';
}

/** The result of reading one typed measurement: the entry to send, or a sentence saying what is wrong. */
export type Parsed<T> = { ok: true; entry: T } | { ok: false; error: string };

export const WEIGHT_UNIT_LABELS: Record<WeightUnit, string> = {
  lb: 'pounds and hundredths (3.45)',
  'lb-oz': 'pounds–ounces (3-7)',
  kg: 'kilograms (1.56)',
};

/** The short unit sign shown after a number. */
export const UNIT_SIGNS = {
  lb: 'lb',
  'lb-oz': 'lb-oz',
  kg: 'kg',
  in: 'in',
  mm: 'mm',
  ft: 'ft',
  m: 'm',
  F: '°F',
  C: '°C',
} as const;

/** Trim a fixed-decimal string: "12.50" → "12.5", "12.00" → "12". */
function trimmed(value: number, decimals: number): string {
  const fixed = value.toFixed(decimals);
  return fixed.includes('.') ? fixed.replace(/\.?0+$/, '') : fixed;
}

/** A canonical weight (lb) in the user's unit: "3.44 lb", "3 lb 7.0 oz", "1.56 kg". */
export function formatWeight(lb: number | null | undefined, unit: WeightUnit): string {
  if (lb === null || lb === undefined) return '—';
  if (unit === 'kg') return `${units.lbToKg(lb).toFixed(2)} kg`;
  if (unit === 'lb-oz') {
    const { lb: whole, oz } = units.lbToLbOz(Math.abs(lb), 1);
    return `${lb < 0 ? '−' : ''}${whole} lb ${oz.toFixed(1)} oz`;
  }
  return `${lb.toFixed(2)} lb`;
}

/** A canonical length (in) in the user's unit: "15.25 in" or "387 mm". */
export function formatLength(inches: number | null | undefined, unit: LengthUnit): string {
  if (inches === null || inches === undefined) return '—';
  return unit === 'mm' ? `${trimmed(units.inToMm(inches), 0)} mm` : `${trimmed(inches, 2)} in`;
}

/** A canonical depth (ft) in the user's unit, one decimal: "12.5 ft" or "3.8 m". */
export function formatDepth(ft: number | null | undefined, unit: DepthUnit): string {
  if (ft === null || ft === undefined) return '—';
  return unit === 'm' ? `${trimmed(units.ftToM(ft), 1)} m` : `${trimmed(ft, 1)} ft`;
}

/** A canonical water temperature (°F) in the user's unit, one decimal. */
export function formatTemperature(f: number | null | undefined, unit: TemperatureUnit): string {
  if (f === null || f === undefined) return '—';
  return unit === 'C' ? `${trimmed(units.fToC(f), 1)} °C` : `${trimmed(f, 1)} °F`;
}

/** Canonical → the number shown in an input of the user's unit (for edit forms; no unit sign). */
export function weightInputValue(lb: number | null | undefined, unit: WeightUnit): string {
  if (lb === null || lb === undefined) return '';
  if (unit === 'kg') return trimmed(units.lbToKg(lb), 3);
  if (unit === 'lb-oz') {
    const { lb: whole, oz } = units.lbToLbOz(lb, 2);
    return `${whole}-${trimmed(oz, 2)}`;
  }
  return trimmed(lb, 2);
}

export function lengthInputValue(inches: number | null | undefined, unit: LengthUnit): string {
  if (inches === null || inches === undefined) return '';
  return unit === 'mm' ? trimmed(units.inToMm(inches), 1) : trimmed(inches, 3);
}

export function depthInputValue(ft: number | null | undefined, unit: DepthUnit): string {
  if (ft === null || ft === undefined) return '';
  return unit === 'm' ? trimmed(units.ftToM(ft), 2) : trimmed(ft, 2);
}

export function temperatureInputValue(f: number | null | undefined, unit: TemperatureUnit): string {
  if (f === null || f === undefined) return '';
  return unit === 'C' ? trimmed(units.fToC(f), 1) : trimmed(f, 1);
}

/** Read a decimal number as people type it: "3.45", "3,45" and " 3.45 " are the same; anything else is not a number. */
export function readNumber(text: string): number | null {
  const cleaned = text.trim().replace(',', '.');
  if (!/^[-+]?(\d+(\.\d*)?|\.\d+)$/.test(cleaned)) return null;
  const value = Number(cleaned);
  return Number.isFinite(value) ? value : null;
}

/**
 * Read a typed weight in the user's unit. Pounds–ounces accept "3-7", "3 7", "3-7.5", "3lb 7oz" and a
 * bare "3" (3 lb 0 oz); ounces must be under 16.
 */
export function parseWeight(text: string, unit: WeightUnit): Parsed<WeightEntry> {
  const raw = text.trim();
  if (!raw) return { ok: false, error: 'Enter the weight.' };
  if (raw.startsWith('-')) return { ok: false, error: 'A weight cannot be negative.' };
  if (unit === 'lb-oz') {
    // "3-7", "3 7", "3lb 7oz", "3 lb 7.5 oz" → two parts; a bare "3" is 3 lb 0 oz.
    const parts = raw.toLowerCase().replace(/oz$/, '').replace(/lbs?/, ' ').replace('-', ' ').trim().split(/\s+/);
    const whole = parts.length <= 2 ? readNumber(parts[0]) : null;
    const ounces = parts.length === 2 ? readNumber(parts[1]) : parts.length === 1 ? 0 : null;
    if (whole === null || ounces === null || !Number.isInteger(whole)) {
      return { ok: false, error: 'Type pounds and ounces like 3-7 (3 lb 7 oz).' };
    }
    if (ounces >= 16) return { ok: false, error: 'Ounces go from 0 to 15.9; 16 oz make a pound.' };
    return { ok: true, entry: { value: whole, unit, ounces } };
  }
  const value = readNumber(raw.replace(/\s*(lbs?|kg)$/i, ''));
  if (value === null)
    return { ok: false, error: unit === 'kg' ? 'Type kilograms like 1.56.' : 'Type pounds like 3.45.' };
  if (value < 0) return { ok: false, error: 'A weight cannot be negative.' };
  return { ok: true, entry: { value, unit } };
}

function parseMeasure<U extends string>(
  text: string,
  unit: U,
  what: string,
  allowNegative = false,
): Parsed<{ value: number; unit: U }> {
  const value = readNumber(text.replace(/\s*(in|mm|ft|m|°?[fc])$/i, ''));
  if (value === null) return { ok: false, error: `Type the ${what} as a number.` };
  if (!allowNegative && value < 0) return { ok: false, error: `The ${what} cannot be negative.` };
  return { ok: true, entry: { value, unit } };
}

export function parseLength(text: string, unit: LengthUnit): Parsed<LengthEntry> {
  return parseMeasure(text, unit, 'length');
}

export function parseDepth(text: string, unit: DepthUnit): Parsed<DepthEntry> {
  return parseMeasure(text, unit, 'depth');
}

export function parseTemperature(text: string, unit: TemperatureUnit): Parsed<TemperatureEntry> {
  return parseMeasure(text, unit, 'water temperature', true);
}

/** Canonical pounds of an entry (for echoes beside the input and client-side checks; the server computes its own). */
export function entryToLb(entry: WeightEntry): number {
  if (entry.unit === 'kg') return units.kgToLb(entry.value);
  if (entry.unit === 'lb-oz') return units.lbOzToLb(entry.value, entry.ounces ?? 0);
  return entry.value;
}

export function entryToIn(entry: LengthEntry): number {
  return entry.unit === 'mm' ? units.mmToIn(entry.value) : entry.value;
}

export function entryToFt(entry: DepthEntry): number {
  return entry.unit === 'm' ? units.mToFt(entry.value) : entry.value;
}

export function entryToF(entry: TemperatureEntry): number {
  return entry.unit === 'C' ? units.cToF(entry.value) : entry.value;
}

/** What a weight input's caption says about the accepted format. */
export function weightHint(unit: WeightUnit): string {
  if (unit === 'lb-oz') return 'Pounds-ounces, e.g. 3-7';
  if (unit === 'kg') return 'Kilograms, e.g. 1.56';
  return 'Pounds and hundredths, e.g. 3.45';
}

/** Optional field: blank means "not recorded" (null), otherwise parsed. */
export function parseOptional<T>(text: string, parse: (t: string) => Parsed<T>): Parsed<T | null> {
  return text.trim() ? parse(text) : { ok: true, entry: null };
}

export type { UnitPreferences };
