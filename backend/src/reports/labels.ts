import {
  FIND_KIND_LABELS,
  type FindKind,
  type HitRateGroupingKey,
  SEASON_LABELS,
  TIME_OF_DAY_LABELS,
  type TimeOfDayBand,
} from '@shoalbook/shared';
import type { ReportEventRef } from '@shoalbook/shared';

const capitalise = (s: string) => (s ? s[0]!.toUpperCase() + s.slice(1) : s);

/** A group key in our own words. */
export function groupLabel(by: HitRateGroupingKey, key: string | null): string {
  if (key === null) return 'Not recorded';
  switch (by) {
    case 'kind':
      return FIND_KIND_LABELS[key as FindKind] ?? capitalise(key);
    case 'subKind':
      return capitalise(key);
    case 'hardness':
      return `Hardness ${key}`;
    case 'solunarPeriod':
      return key === 'major' ? 'Major period' : key === 'minor' ? 'Minor period' : 'Outside the periods';
    case 'timeOfDay':
      return TIME_OF_DAY_LABELS[key as TimeOfDayBand] ?? key;
    default:
      return key;
  }
}

/** "Fall 2026", or the event's name when two events share a season. */
export function eventLabel(event: ReportEventRef, all: readonly ReportEventRef[]): string {
  if (!event.season || !event.year) return event.name;
  const same = all.filter((e) => e.season === event.season && e.year === event.year);
  return same.length > 1 ? event.name : `${SEASON_LABELS[event.season]} ${event.year}`;
}

/** The groups of a find-based grouping, in a sentence: "between kinds of place". */
export const GROUPING_PLURALS: Record<string, string> = {
  kind: 'kinds of place',
  subKind: 'sub-kinds',
  depthBand: 'depth bands',
  hardness: 'hardness grades',
  temperatureBand: 'water-temperature bands',
};
