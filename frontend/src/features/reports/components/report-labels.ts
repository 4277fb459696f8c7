import type { FindOutcome, HitRateGrouping } from '../api/report-types';

/** The grouping switch, in our own words. */
export const GROUPING_LABELS: Record<HitRateGrouping, string> = {
  kind: 'Kind of place',
  subKind: 'Sub-kind',
  depthBand: 'Depth',
  hardness: 'Hardness grade',
  temperatureBand: 'Water temperature',
  solunarPeriod: 'Sun & moon period',
  timeOfDay: 'Time of day',
};

/** Groupings counted by the fish rather than by the find (a find's fish fall in several periods). */
export const CATCH_BASED_GROUPINGS: readonly HitRateGrouping[] = ['solunarPeriod', 'timeOfDay'];

export const OUTCOME_LABELS: Record<FindOutcome, string> = {
  weighed: 'Counted fish',
  caught: 'Fish, none counted',
  'fished-blank': 'Fished, no bite',
  'not-fished': 'Not fished',
};

/** Below this many finds fished a group's rate is shown as uncertain ("few finds"). */
export const FEW_FINDS = 10;

/** 0.354 → "35 %". */
export function percent(share: number | null | undefined, digits = 0): string {
  if (share === null || share === undefined || !Number.isFinite(share)) return '—';
  return `${(share * 100).toFixed(digits)} %`;
}

/** An interval as "22–50 %". */
export function percentRange(lower: number, upper: number): string {
  return `${Math.round(lower * 100)}–${Math.round(upper * 100)} %`;
}

/** A difference in percentage points with its sign: "+33 points". */
export function points(difference: number): string {
  const value = Math.round(difference * 100);
  return `${value > 0 ? '+' : value < 0 ? '−' : '±'}${Math.abs(value)} points`;
}

/** Fish per hour fished, "1.25 /h"; a dash where no time was logged (no stops, or derived from catches). */
export function perHour(value: number | null | undefined): string {
  return value === null || value === undefined ? '—' : `${value.toFixed(2)} /h`;
}

/** Hours and minutes for time fished: "3 h 05 min", "40 min". */
export function hoursMinutes(seconds: number): string {
  const minutes = Math.round(seconds / 60);
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  return h ? `${h} h ${String(m).padStart(2, '0')} min` : `${m} min`;
}
