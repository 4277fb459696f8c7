import { units } from '@shoalbook/analytics';
import type { DepthUnit, LengthUnit, TemperatureUnit, UnitPreferences, WeightUnit } from '@shoalbook/shared';
import { formatTypedNumber, readTypedNumber, typedDecimal, userLocale } from './typed-number';

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

/** A short distance (a GPS fix's accuracy, the way to a find) in the depth unit, whole: "38 m" or "125 ft". */
export function formatShortDistance(m: number, unit: DepthUnit): string {
  return unit === 'm' ? `${Math.round(m)} m` : `${Math.round(units.mToFt(m))} ft`;
}

/** Metres in a statute mile: 5,280 ft × 0.3048 m (exact, NIST SP 811 App. B). */
export const M_PER_MILE = units.ftToM(5_280);

/** A run across the lake, one decimal: "5.5 km" for metric users, "3.4 mi" (statute miles) otherwise. */
export function formatLongDistance(m: number, unit: DepthUnit): string {
  return unit === 'm' ? `${trimmed(m / 1000, 1)} km` : `${trimmed(m / M_PER_MILE, 1)} mi`;
}

/** A boat's speed goes with the distance unit: km/h beside kilometres, mph (statute) beside miles. */
export const SPEED_SIGNS: Record<DepthUnit, string> = { m: 'km/h', ft: 'mph' };

/** A speed in the user's unit → metres per second (1 mph = 1,609.344 m / 3,600 s, 1 km/h = 1,000 m / 3,600 s). */
export function speedToMps(value: number, unit: DepthUnit): number {
  return ((unit === 'm' ? 1000 : M_PER_MILE) * value) / 3600;
}

/** Metres per second → the user's speed unit. */
export function mpsToSpeed(mps: number, unit: DepthUnit): number {
  return (mps * 3600) / (unit === 'm' ? 1000 : M_PER_MILE);
}

/** A canonical water temperature (°F) in the user's unit, one decimal. */
export function formatTemperature(f: number | null | undefined, unit: TemperatureUnit): string {
  if (f === null || f === undefined) return '—';
  return unit === 'C' ? `${trimmed(units.fToC(f), 1)} °C` : `${trimmed(f, 1)} °F`;
}

/** A fixed-decimal number for an input, in the locale's decimal sign so that it reads back unchanged. */
function typed(value: number, decimals: number, locale: string): string {
  return typedDecimal(trimmed(value, decimals), locale);
}

/** Canonical → the number shown in an input of the user's unit (for edit forms; no unit sign). */
export function weightInputValue(lb: number | null | undefined, unit: WeightUnit, locale = userLocale()): string {
  if (lb === null || lb === undefined) return '';
  if (unit === 'kg') return typed(units.lbToKg(lb), 3, locale);
  if (unit === 'lb-oz') {
    const { lb: whole, oz } = units.lbToLbOz(lb, 2);
    return `${whole}-${typed(oz, 2, locale)}`;
  }
  return typed(lb, 2, locale);
}

export function lengthInputValue(inches: number | null | undefined, unit: LengthUnit, locale = userLocale()): string {
  if (inches === null || inches === undefined) return '';
  return unit === 'mm' ? typed(units.inToMm(inches), 1, locale) : typed(inches, 3, locale);
}

export function depthInputValue(ft: number | null | undefined, unit: DepthUnit, locale = userLocale()): string {
  if (ft === null || ft === undefined) return '';
  return unit === 'm' ? typed(units.ftToM(ft), 2, locale) : typed(ft, 2, locale);
}

export function temperatureInputValue(
  f: number | null | undefined,
  unit: TemperatureUnit,
  locale = userLocale(),
): string {
  if (f === null || f === undefined) return '';
  return unit === 'C' ? typed(units.fToC(f), 1, locale) : typed(f, 1, locale);
}

/** Read a plain number typed by the user's locale (see typed-number.ts); null when it is not one, or not unambiguously one. */
export function readNumber(text: string, locale: string = userLocale()): number | null {
  const read = readTypedNumber(text, locale);
  return read.ok ? read.value : null;
}

/** A latitude or longitude typed in WGS 84 decimal degrees; null when it is not a number or lies outside ±90 / ±180. */
export function readCoordinate(text: string, axis: 'lat' | 'lon', locale: string = userLocale()): number | null {
  const degrees = readNumber(text, locale);
  return degrees !== null && Math.abs(degrees) <= (axis === 'lat' ? 90 : 180) ? degrees : null;
}

/** Decimal degrees for a coordinate input, six decimals (about 0.1 m), in the locale's decimal sign. */
export function coordinateInputValue(degrees: number, locale: string = userLocale()): string {
  return typed(degrees, 6, locale);
}

const WEIGHT_WORDS: Record<WeightUnit, string> = { lb: 'pounds', 'lb-oz': 'pounds and ounces', kg: 'kilograms' };

/** "18.5 or 18 lb 8 oz": how to write the weight the user probably meant, in the locale's own signs. */
function weightSuggestion(unit: WeightUnit, meant: number | null, locale: string): string {
  const lb = meant ?? (unit === 'kg' ? 1.56 : 3.5);
  if (unit === 'kg') return formatTypedNumber(lb, locale);
  const whole = Math.floor(lb);
  const oz = Math.round((lb - whole) * 16 * 10) / 10; // 1 lb = 16 oz (NIST Handbook 44 App. C)
  const lbOz = oz < 16 ? `${whole} lb ${formatTypedNumber(oz, locale)} oz` : null;
  if (unit === 'lb-oz') return lbOz ? `${lbOz} or ${whole}-${formatTypedNumber(oz, locale)}` : '3 lb 7 oz or 3-7';
  return lbOz ? `${formatTypedNumber(lb, locale)} or ${lbOz}` : formatTypedNumber(lb, locale);
}

function notAWeight(
  label: string,
  text: string,
  unit: WeightUnit,
  meant: number | null,
  locale: string,
): Parsed<never> {
  return {
    ok: false,
    error: `${label}: '${text.trim()}' is not a weight in ${WEIGHT_WORDS[unit]}; write ${weightSuggestion(unit, meant, locale)}.`,
  };
}

/** A typed number, or what it might have meant: the decimal reading, and the grouped one when that is plausible too. */
type Reading = { ok: true; value: number } | { ok: false; meant: number | null; grouped?: number };

function readPart(text: string, locale: string): Reading {
  const read = readTypedNumber(text, locale);
  if (read.ok) return read;
  if (read.reason === 'not-a-number') return { ok: false, meant: null };
  return {
    ok: false,
    meant: read.decimalReading,
    grouped: read.reason === 'ambiguous' ? read.groupReading : undefined,
  };
}

/**
 * Read a typed weight. Pounds and ounces written out ("18 lb 8 oz", "18lb 8oz", "18 lb") are taken in any
 * unit, and a unit sign after a number ("1.56 kg", "3.45 lb") is the unit it was weighed in. The bare pair
 * "3-7" or "3 7" means 3 lb 7 oz only when the user's unit is pounds–ounces, where it cannot mean anything
 * else; a bare "3" there is 3 lb 0 oz. Ounces must be under 16 (1 lb = 16 oz). Numbers read by the locale.
 */
export function parseWeight(
  text: string,
  unit: WeightUnit,
  label = 'Weight',
  locale: string = userLocale(),
): Parsed<WeightEntry> {
  const raw = text.trim();
  if (!raw) return { ok: false, error: `${label}: enter the weight.` };
  if (/^[-−]/.test(raw)) return { ok: false, error: `${label}: a weight cannot be negative.` };
  const spelled = /^(.+?)\s*lbs?\.?(?:\s*(.+?)\s*oz\.?)?$/i.exec(raw);
  const pair = unit === 'lb-oz' ? /^(\d+)\s*(?:-|\s)\s*(\S+)$/.exec(raw) : null;
  if ((spelled && (spelled[2] !== undefined || unit === 'lb-oz')) || pair) {
    const [, lbText, ozText] = (spelled ?? pair)!;
    const whole = readPart(lbText!, locale);
    const ounces = ozText === undefined ? ({ ok: true, value: 0 } as const) : readPart(ozText, locale);
    if (!whole.ok || !ounces.ok || !Number.isInteger(whole.value) || whole.value < 0 || ounces.value < 0)
      return notAWeight(label, raw, unit, null, locale);
    if (ounces.value >= 16) return { ok: false, error: `${label}: ounces go from 0 to 15.9; 16 oz make a pound.` };
    return { ok: true, entry: { value: whole.value, unit: 'lb-oz', ounces: ounces.value } };
  }
  const suffixed = /^(.+?)\s*(lbs?|kg)\.?$/i.exec(raw);
  const typedUnit: WeightUnit = suffixed ? (suffixed[2]!.toLowerCase() === 'kg' ? 'kg' : 'lb') : unit;
  if (typedUnit === 'lb-oz') {
    const whole = readPart(raw, locale);
    if (whole.ok && Number.isInteger(whole.value)) return { ok: true, entry: { value: whole.value, unit, ounces: 0 } };
    return notAWeight(label, raw, unit, whole.ok ? whole.value : whole.meant, locale);
  }
  const read = readPart(suffixed ? suffixed[1]! : raw, locale);
  if (!read.ok) return notAWeight(label, raw, typedUnit, read.meant, locale);
  if (read.value < 0) return { ok: false, error: `${label}: a weight cannot be negative.` };
  return { ok: true, entry: { value: read.value, unit: typedUnit } };
}

const MEASURE_WORDS: Record<string, string> = {
  in: 'inches',
  mm: 'millimetres',
  ft: 'feet',
  m: 'metres',
  F: 'degrees Fahrenheit',
  C: 'degrees Celsius',
};

/** Unit signs a number may carry after it, per kind of measure; a typed sign names the unit used. */
const MEASURE_SIGNS: Record<string, Record<string, string>> = {
  length: { in: 'in', '"': 'in', inch: 'in', inches: 'in', mm: 'mm' },
  depth: { ft: 'ft', "'": 'ft', feet: 'ft', m: 'm' },
  'water temperature': { f: 'F', '°f': 'F', c: 'C', '°c': 'C' },
};

function parseMeasure<U extends string>(
  text: string,
  unit: U,
  what: 'length' | 'depth' | 'water temperature',
  label: string,
  locale: string,
): Parsed<{ value: number; unit: U }> {
  const raw = text.trim();
  const suffixed = /^(.*?\d)\s*(°?[a-z]+|["'])$/i.exec(raw);
  const typedUnit = suffixed ? (MEASURE_SIGNS[what]![suffixed[2]!.toLowerCase()] as U | undefined) : unit;
  const example = formatTypedNumber(what === 'length' ? 15.5 : what === 'depth' ? 12.5 : 18.5, locale);
  const refuse = (read: Reading & { ok: false }, inUnit: string): Parsed<never> => {
    // A length in millimetres may well be grouped (1,016 mm), so an ambiguous one offers both readings.
    const options = [read.meant, read.grouped].filter((n): n is number => n !== null && n !== undefined);
    const write = options.length ? options.map((n) => formatTypedNumber(n, locale)).join(' or ') : example;
    return {
      ok: false,
      error: `${label}: '${raw}' is not a ${what} in ${MEASURE_WORDS[inUnit] ?? inUnit}; write ${write}.`,
    };
  };
  if (typedUnit === undefined) return refuse({ ok: false, meant: null }, unit);
  const read = readPart(suffixed ? suffixed[1]! : raw, locale);
  if (!read.ok) return refuse(read, typedUnit);
  if (what !== 'water temperature' && read.value < 0)
    return { ok: false, error: `${label}: the ${what} cannot be negative.` };
  return { ok: true, entry: { value: read.value, unit: typedUnit } };
}

export function parseLength(
  text: string,
  unit: LengthUnit,
  label = 'Length',
  locale: string = userLocale(),
): Parsed<LengthEntry> {
  return parseMeasure(text, unit, 'length', label, locale);
}

export function parseDepth(
  text: string,
  unit: DepthUnit,
  label = 'Depth',
  locale: string = userLocale(),
): Parsed<DepthEntry> {
  return parseMeasure(text, unit, 'depth', label, locale);
}

export function parseTemperature(
  text: string,
  unit: TemperatureUnit,
  label = 'Water temperature',
  locale: string = userLocale(),
): Parsed<TemperatureEntry> {
  return parseMeasure(text, unit, 'water temperature', label, locale);
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
export function weightHint(unit: WeightUnit, locale = userLocale()): string {
  if (unit === 'lb-oz') return 'Pounds-ounces, e.g. 3-7 or 3 lb 7 oz';
  if (unit === 'kg') return `Kilograms, e.g. ${formatTypedNumber(1.56, locale)}`;
  return `Pounds and hundredths, e.g. ${formatTypedNumber(3.45, locale)} (or 3 lb 7 oz)`;
}

/** The stepper buttons beside a weight input: a whole pound (half a kilo) and a fine step, in the user's unit. */
export const WEIGHT_STEPS: Record<WeightUnit, readonly { by: number; label: string }[]> = {
  lb: [
    { by: 1, label: '1 lb' },
    { by: 0.05, label: '0.05 lb' },
  ],
  // In ounces: 1 lb = 16 oz (NIST Handbook 44 App. C).
  'lb-oz': [
    { by: 16, label: '1 lb' },
    { by: 1, label: '1 oz' },
  ],
  kg: [
    { by: 0.5, label: '0.5 kg' },
    { by: 0.05, label: '0.05 kg' },
  ],
};

/**
 * The typed weight moved by a step (see WEIGHT_STEPS; negative steps down), written in the user's unit as the
 * input takes it; never below 0. An empty field counts as 0; text that is not a weight is left as it is (null).
 */
export function stepWeight(text: string, unit: WeightUnit, by: number, locale: string = userLocale()): string | null {
  let lb = 0;
  if (text.trim()) {
    const parsed = parseWeight(text, unit, 'Weight', locale);
    if (!parsed.ok) return null;
    lb = entryToLb(parsed.entry);
  }
  if (unit === 'lb-oz') {
    const ounces = Math.max(0, Math.round((lb * 16 + by) * 100) / 100);
    const whole = Math.floor(ounces / 16);
    return `${whole}-${typed(ounces - whole * 16, 2, locale)}`;
  }
  const current = unit === 'kg' ? units.lbToKg(lb) : lb;
  const decimals = unit === 'kg' ? 3 : 2;
  const factor = 10 ** decimals;
  return typed(Math.max(0, Math.round((current + by) * factor) / factor), decimals, locale);
}

/** Optional field: blank means "not recorded" (null), otherwise parsed. */
export function parseOptional<T>(text: string, parse: (t: string) => Parsed<T>): Parsed<T | null> {
  return text.trim() ? parse(text) : { ok: true, entry: null };
}

export type { UnitPreferences };
