import { applyDecorators } from '@nestjs/common';
import { IsNumber, Max, Min } from 'class-validator';
import type { FieldProblems } from '../journal/journal-errors';
import type { Resolved } from './measurements';

/**
 * Plausible ranges in canonical units (our choices). The heaviest black bass on record weighed about
 * 22 lb 4 oz (from memory; a common-practice figure), so 25 lb leaves room without admitting typing
 * slips, and a fish under 0.01 lb or 1 in is a slip too; 40 in is far beyond any bass; bass are fished
 * shallower than 400 ft, and liquid fresh water at the surface stays within 32–100 °F. A bag or a
 * weigh-in figure (five fish, or a team's ten) stays under 150 lb. The DTOs check the canonical fields
 * with these (InRange), the commands check entered values after conversion (checkRange).
 */
export const RANGES = Object.freeze({
  weightLb: { min: 0.01, max: 25, label: 'weight', unit: 'lb' },
  lengthIn: { min: 1, max: 40, label: 'length', unit: 'in' },
  depthFt: { min: 0, max: 400, label: 'depth', unit: 'ft' },
  waterTempF: { min: 32, max: 100, label: 'water temperature', unit: '°F' },
  bagLb: { min: 0, max: 150, label: 'weight', unit: 'lb' },
});

type Range = (typeof RANGES)[keyof typeof RANGES];

function rangeMessage(range: Range): string {
  return `The ${range.label} must be at least ${range.min} and at most ${range.max} ${range.unit}`;
}

/** A canonical numeric DTO field in its plausible range (finite, min and max), one message for both ends. */
export function InRange(range: Range): PropertyDecorator {
  const message = `${rangeMessage(range)}.`;
  return applyDecorators(
    IsNumber({ allowNaN: false, allowInfinity: false }),
    Min(range.min, { message }),
    Max(range.max, { message }),
  );
}

/**
 * A number as typed with its unit (mm, kg, °C...): the exact range is checked after conversion
 * (checkRange), this only keeps float edges such as 1e308 away from the arithmetic.
 */
export function EnteredNumber(): PropertyDecorator {
  return applyDecorators(IsNumber({ allowNaN: false, allowInfinity: false }), Min(-1000), Max(100_000));
}

/** Report a value outside its range beside the field the client sent. */
export function checkRange(
  problems: FieldProblems,
  field: string,
  range: Range,
  value: number | null | undefined,
): void {
  if (value === null || value === undefined) return;
  if (value < range.min || value > range.max)
    problems.add(field, `${rangeMessage(range)} (got ${Number(value.toFixed(3))} ${range.unit}).`);
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
