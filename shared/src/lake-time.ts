/**
 * Lake time: the one place where a lake's wall clock and calendar meet instants. Both ends and the
 * analytics library use it, so a typed time means the same thing everywhere. Built on luxon, which reads
 * the IANA time-zone database through Intl.
 */
import { DateTime, IANAZone } from 'luxon';

const DATE = /^\d{4}-\d{2}-\d{2}$/;
const HHMM = /^([01]\d|2[0-3]):[0-5]\d$/;

/** ISO-8601 with a date, a time and a zone (Z or ±hh:mm). */
export const ISO_INSTANT = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,9})?)?(Z|[+-]\d{2}:\d{2})$/;

type Instant = Date | string | number;

function toDateTime(instant: Instant, timeZone: string): DateTime {
  const ms = instant instanceof Date ? instant.getTime() : typeof instant === 'number' ? instant : Date.parse(instant);
  const dt = DateTime.fromMillis(ms, { zone: timeZone });
  if (!dt.isValid) throw new RangeError(`invalid instant or IANA time zone '${timeZone}'`);
  return dt;
}

/** A real calendar date written YYYY-MM-DD (2024-02-30 is refused). */
export function isCalendarDate(value: string): boolean {
  return DATE.test(value) && DateTime.fromISO(value, { zone: 'UTC' }).isValid;
}

/** A "HH:MM" 24-hour wall-clock time. */
export function isHhMm(value: string): boolean {
  return HHMM.test(value);
}

export function isIanaZone(zone: string): boolean {
  return IANAZone.isValidZone(zone);
}

/** The lake-local calendar date (YYYY-MM-DD) of an instant. */
export function localDateOf(instant: Instant, timeZone: string): string {
  return toDateTime(instant, timeZone).toISODate()!;
}

/** "HH:MM" of an instant on the lake's 24-hour clock. */
export function clockTime(instant: Instant, timeZone: string): string {
  return toDateTime(instant, timeZone).toFormat('HH:mm');
}

/**
 * "HH:MM" on a lake-local date → the instant; null for a wall-clock time that did not happen that day
 * (inside the spring-forward gap). In the repeated autumn hour the first occurrence is taken, as
 * RFC 5545 §3.3.5 does for a local time that occurs twice.
 */
export function localTimeOn(date: string, hhmm: string, timeZone: string): Date | null {
  if (!isCalendarDate(date) || !isHhMm(hhmm)) return null;
  const dt = DateTime.fromISO(`${date}T${hhmm}`, { zone: timeZone });
  if (!dt.isValid) return null;
  // Luxon shifts a time in the gap forward; such a time did not happen, so it is refused, not moved.
  if (dt.toFormat('HH:mm') !== hhmm) return null;
  const hourEarlier = dt.minus({ hours: 1 });
  return (hourEarlier.toFormat('yyyy-MM-dd HH:mm') === dt.toFormat('yyyy-MM-dd HH:mm') ? hourEarlier : dt).toJSDate();
}

/**
 * A bound of a lake-local window ("HH:MM" on a date) that always exists: a time the clocks skip on a
 * spring-forward day moves on by the gap (02:30 → 03:30), so a day whose start was typed in the gap still
 * has a start. For times a person logs, use localTimeOn, which refuses such a time instead.
 */
export function localBoundOn(date: string, hhmm: string, timeZone: string): Date {
  const dt = DateTime.fromISO(`${date}T${hhmm}`, { zone: timeZone });
  if (!dt.isValid) throw new RangeError(`invalid date '${date}', time '${hhmm}' or zone '${timeZone}'`);
  return dt.toJSDate();
}

/** The zone's offset from UTC in minutes at an instant (positive east of Greenwich). */
export function zoneOffsetMinutes(instant: Instant, timeZone: string): number {
  return toDateTime(instant, timeZone).offset;
}

/** One local calendar day of a lake as a half-open UTC interval [startMs, endMs). */
export interface LocalDay {
  date: string;
  timeZone: string;
  startMs: number;
  endMs: number;
  /** Local civil noon, used as the anchor of day-level values (sun times, moon illumination). */
  noonMs: number;
}

/**
 * The local calendar day `date` (YYYY-MM-DD) in the IANA zone `timeZone`, from local midnight to the next
 * local midnight (23 or 25 hours on daylight-saving changes).
 * @throws RangeError for a date that is not YYYY-MM-DD or an unknown zone
 */
export function localDay(date: string, timeZone: string): LocalDay {
  if (typeof date !== 'string' || !DATE.test(date)) {
    throw new RangeError(`date must be a calendar date YYYY-MM-DD, got ${String(date)}`);
  }
  const start = DateTime.fromISO(date, { zone: timeZone });
  if (!start.isValid) {
    throw new RangeError(
      `invalid date '${date}' or IANA time zone '${timeZone}': ${start.invalidExplanation ?? start.invalidReason}`,
    );
  }
  const startOfDay = start.startOf('day');
  return {
    date,
    timeZone,
    startMs: startOfDay.toMillis(),
    endMs: startOfDay.plus({ days: 1 }).toMillis(),
    noonMs: startOfDay.set({ hour: 12 }).toMillis(),
  };
}

/** A calendar date shifted by whole days. */
export function shiftDate(date: string, days: number): string {
  return DateTime.fromISO(date, { zone: 'UTC' }).plus({ days }).toISODate() as string;
}

/** An ISO-8601 instant with a zone → Date; null for anything else (a time without a zone is ambiguous). */
export function parseInstant(value: string): Date | null {
  if (typeof value !== 'string' || !ISO_INSTANT.test(value)) return null;
  const ms = Date.parse(value);
  return Number.isNaN(ms) ? null : new Date(ms);
}
