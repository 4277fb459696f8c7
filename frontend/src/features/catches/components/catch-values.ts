import { FIND_KIND_LABELS, type FindView, type UnitPreferences } from '@shoalbook/shared';
import type { CatchWithSky } from '../../../lib/journal-types';
import {
  depthInputValue,
  formatDepth,
  lengthInputValue,
  temperatureInputValue,
  UNIT_SIGNS,
  weightInputValue,
} from '../../../lib/units';

/** One line per find for the type-to-filter list: name, kind and depth, so two "Shell bar"s can be told apart. */
export function findOptionLabel(find: FindView, prefs: UnitPreferences): string {
  const depth = find.depthFt !== null ? `, ${formatDepth(find.depthFt, prefs.depth)}` : '';
  return `${find.name} (${FIND_KIND_LABELS[find.kind]}${depth})`;
}

/** The find typed into a find field: by its list label or by its bare name (case-insensitive); undefined when none matches. */
export function matchFind(text: string, finds: FindView[], prefs: UnitPreferences): FindView | undefined {
  const wanted = text.trim().toLowerCase();
  return (
    finds.find((f) => findOptionLabel(f, prefs).toLowerCase() === wanted) ??
    finds.find((f) => f.name.toLowerCase() === wanted)
  );
}

/**
 * The text an edit field starts with. Where the angler typed the value in the unit the form asks for, it
 * is shown exactly as typed (3-4 stays 3-4); otherwise the stored value converted to the form's unit.
 */
export function catchInputValues(c: CatchWithSky, prefs: UnitPreferences) {
  const e = c.entered;
  const weight =
    e?.weight && e.weight.unit === prefs.weight
      ? e.weight.unit === 'lb-oz'
        ? `${e.weight.value}-${e.weight.ounces ?? 0}`
        : String(e.weight.value)
      : weightInputValue(c.weightLb, prefs.weight);
  const length =
    e?.length && e.length.unit === prefs.length ? String(e.length.value) : lengthInputValue(c.lengthIn, prefs.length);
  const depth =
    e?.depth && e.depth.unit === prefs.depth ? String(e.depth.value) : depthInputValue(c.depthFt, prefs.depth);
  const waterTemp =
    e?.waterTemp && e.waterTemp.unit === prefs.temperature
      ? String(e.waterTemp.value)
      : temperatureInputValue(c.waterTempF, prefs.temperature);
  return { weight, length, depth, waterTemp };
}

/** "Typed as 1.63 kg" when the stored entry was in another unit than the form's, else null. */
export function typedAs(
  entry: { value: number; unit: string; ounces?: number } | null | undefined,
  formUnit: string,
): string | null {
  if (!entry || entry.unit === formUnit) return null;
  if (entry.unit === 'lb-oz') return `Typed as ${entry.value} lb ${entry.ounces ?? 0} oz`;
  const sign = (UNIT_SIGNS as Record<string, string>)[entry.unit] ?? entry.unit;
  return `Typed as ${entry.value} ${sign}`;
}
