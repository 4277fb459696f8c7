import { DateTime, IANAZone } from 'luxon';

const DATE = /^\d{4}-\d{2}-\d{2}$/;
const HHMM = /^([01]\d|2[0-3]):[0-5]\d$/;

/** A real calendar date written YYYY-MM-DD (2024-02-30 is refused). */
export function isCalendarDate(value: string): boolean {
  return DATE.test(value) && DateTime.fromISO(value, { zone: 'UTC' }).isValid;
}

export function isHhMm(value: string): boolean {
  return HHMM.test(value);
}

export function isIanaZone(zone: string): boolean {
  return IANAZone.isValidZone(zone);
}

/** The lake-local calendar date of an instant. */
export function localDateOf(instant: Date, timeZone: string): string {
  return DateTime.fromJSDate(instant, { zone: timeZone }).toISODate()!;
}

/** "HH:MM" on a lake-local date → the instant; null for a local time that does not exist (DST gap). */
export function localTimeOn(date: string, hhmm: string, timeZone: string): Date | null {
  const dt = DateTime.fromISO(`${date}T${hhmm}`, { zone: timeZone });
  if (!dt.isValid) return null;
  // Luxon shifts a time in the spring-forward gap; such a wall-clock time did not happen that day.
  if (dt.toFormat('HH:mm') !== hhmm) return null;
  return dt.toJSDate();
}

/** ISO-8601 with a date, a time and a zone (Z or ±hh:mm). */
export const ISO_INSTANT = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,9})?)?(Z|[+-]\d{2}:\d{2})$/;

export function parseInstant(value: string): Date | null {
  if (!ISO_INSTANT.test(value)) return null;
  const ms = Date.parse(value);
  return Number.isNaN(ms) ? null : new Date(ms);
}
