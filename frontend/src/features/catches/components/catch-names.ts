import { SPECIES_LABELS, type UnitPreferences } from '@shoalbook/shared';
import { clockTime } from '../../../lib/lake-time';
import type { CatchWithSky } from '../../../lib/journal-types';
import { formatWeight } from '../../../lib/units';

/** How a catch is named in a heading or a confirmation: "the 3.45 lb largemouth at 07:10". */
export function catchName(c: CatchWithSky, prefs: UnitPreferences, timeZone: string): string {
  return `the ${formatWeight(c.weightLb, prefs.weight)} ${SPECIES_LABELS[c.species].toLowerCase()} at ${clockTime(c.caughtAt, timeZone)}`;
}
