import { DateTime } from 'luxon';
import type { CompetitionDay } from '../events/competition-day.entity';

/** The parts of a competition day that bound its catches: a lake-local date and optional "HH:MM" times. */
export type CatchWindowDay = Pick<CompetitionDay, 'date' | 'startTime' | 'checkInTime'>;

/**
 * The instant a lake-local "HH:MM" on the day's date stands for. A time that the clocks skip on a
 * spring-forward day is moved on by the gap (Luxon's rule), so a window bound always exists.
 */
function boundOn(date: string, hhmm: string, timeZone: string): DateTime {
  return DateTime.fromISO(`${date}T${hhmm}`, { zone: timeZone });
}

/**
 * Why a catch time does not fit its competition day, or null when it fits. A catch counts on the day's
 * date on the lake's clock and, where the day records them, from the start (take-off) to check-in, both
 * ends included: a fish landed before take-off or after check-in is not part of the day (common practice;
 * the event's rules decide the details). Compared as instants, so the lake's offset on that date applies.
 */
export function catchTimeProblem(at: Date, day: CatchWindowDay, timeZone: string): string | null {
  const local = DateTime.fromJSDate(at, { zone: timeZone });
  const date = local.toISODate();
  if (date !== day.date)
    return `The catch time falls on ${date} (lake time, ${timeZone}), not on the competition day ${day.date}.`;
  const start = day.startTime ? boundOn(day.date, day.startTime, timeZone) : null;
  const checkIn = day.checkInTime ? boundOn(day.date, day.checkInTime, timeZone) : null;
  const early = start !== null && local < start;
  const late = checkIn !== null && local > checkIn;
  if (!early && !late) return null;
  // Seconds only when present, so "15:00:30 is after the 15:00 check-in" does not read as 15:00.
  const clock = local.toFormat(local.second || local.millisecond ? 'HH:mm:ss' : 'HH:mm');
  const window =
    start && checkIn
      ? `from the ${day.startTime} start to the ${day.checkInTime} check-in`
      : start
        ? `from the ${day.startTime} start on`
        : `until the ${day.checkInTime} check-in`;
  return `Catches on ${day.date} count ${window} (lake time, ${timeZone}); ${clock} is ${early ? 'before the start' : 'after check-in'}.`;
}
