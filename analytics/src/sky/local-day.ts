import { DateTime } from 'luxon';

/** One local calendar day of a lake as a half-open UTC interval [startMs, endMs). */
export interface LocalDay {
  date: string;
  timeZone: string;
  startMs: number;
  endMs: number;
  /** Local civil noon, used as the anchor of day-level values (sun times, moon illumination). */
  noonMs: number;
}

const DATE_PATTERN = /^\d{4}-\d{2}-\d{2}$/;

/**
 * The local calendar day `date` (YYYY-MM-DD) in the IANA zone `timeZone`, from local midnight to
 * the next local midnight (23 or 25 hours on daylight-saving changes).
 */
export function localDay(date: string, timeZone: string): LocalDay {
  if (typeof date !== 'string' || !DATE_PATTERN.test(date)) {
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

/** The local calendar date (YYYY-MM-DD) of an instant in an IANA zone. */
export function localDateOf(ms: number, timeZone: string): string {
  const local = DateTime.fromMillis(ms, { zone: timeZone });
  if (!local.isValid) throw new RangeError(`invalid IANA time zone '${timeZone}'`);
  return local.toISODate() as string;
}

/** A local calendar date shifted by whole days. */
export function shiftDate(date: string, days: number): string {
  return DateTime.fromISO(date, { zone: 'UTC' }).plus({ days }).toISODate() as string;
}

/**
 * Parses an ISO-8601 instant (with `Z` or an offset) to epoch milliseconds.
 * @throws RangeError when the string is not an ISO-8601 instant with a zone designator
 */
export function parseInstant(instant: string): number {
  if (typeof instant !== 'string' || !/(Z|[+-]\d{2}:?\d{2})$/i.test(instant)) {
    throw new RangeError(`instant must be an ISO-8601 string with Z or an offset, got ${String(instant)}`);
  }
  const parsed = DateTime.fromISO(instant, { setZone: true });
  if (!parsed.isValid) throw new RangeError(`invalid ISO-8601 instant '${instant}'`);
  return parsed.toMillis();
}

/** Epoch milliseconds → ISO-8601 UTC string, rounded to the second (the models are not finer). */
export function toIsoUtc(ms: number): string {
  return new Date(Math.round(ms / 1000) * 1000).toISOString();
}
