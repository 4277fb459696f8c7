import type { FieldProblems } from '../journal/journal-errors';
import type { Resolved } from './measurements';

/**
 * Plausible ranges in canonical units (our choices). The heaviest black bass on record weighed about
 * 22 lb 4 oz (from memory; a common-practice figure), so 25 lb leaves room without admitting typing
 * slips; 36 in is far beyond any bass; lake depths beyond 1,000 ft and liquid fresh water outside
 * 28–110 °F are slips of the keyboard.
 */
export const RANGES = Object.freeze({
  weightLb: { min: 0, max: 25, label: 'weight', unit: 'lb', exclusiveMin: true },
  lengthIn: { min: 0, max: 36, label: 'length', unit: 'in', exclusiveMin: true },
  depthFt: { min: 0, max: 1000, label: 'depth', unit: 'ft', exclusiveMin: false },
  waterTempF: { min: 28, max: 110, label: 'water temperature', unit: '°F', exclusiveMin: false },
});

/** Report a value outside its range beside the field the client sent. */
export function checkRange(
  problems: FieldProblems,
  field: string,
  range: (typeof RANGES)[keyof typeof RANGES],
  value: number | null | undefined,
): void {
  if (value === null || value === undefined) return;
  const low = range.exclusiveMin ? value <= range.min : value < range.min;
  if (low || value > range.max) {
    const lower = range.exclusiveMin ? `more than ${range.min}` : `at least ${range.min}`;
    problems.add(
      field,
      `The ${range.label} must be ${lower} and at most ${range.max} ${range.unit} (got ${Number(value.toFixed(3))} ${range.unit}).`,
    );
  }
}

/** The request field a measurement came from: the entered form when given, else the canonical one. */
export function sentField(input: object, canonicalField: string, enteredField: string): string {
  return (input as Record<string, unknown>)[enteredField] !== undefined ? enteredField : canonicalField;
}

type Measured = Record<string, unknown>;

/** Write a resolved measurement onto the `<canonical>`, `<prefix>Value`, `<prefix>Unit` columns. */
export function assignMeasured(
  target: object,
  canonicalKey: string,
  prefix: string,
  resolved: Resolved<string> | null | undefined,
): void {
  if (resolved === undefined) return;
  const t = target as Measured;
  t[canonicalKey] = resolved?.canonical ?? null;
  t[`${prefix}Value`] = resolved?.value ?? null;
  t[`${prefix}Unit`] = resolved?.unit ?? null;
}
