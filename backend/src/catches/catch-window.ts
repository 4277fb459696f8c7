import { clockTime, localBoundOn, localDateOf } from '@shoalbook/shared';
import type { CompetitionDay } from '../events/competition-day.entity';

/** The parts of a competition day that bound its catches: a lake-local date and optional "HH:MM" times. */
export type CatchWindowDay = Pick<CompetitionDay, 'date' | 'startTime' | 'checkInTime'>;

/**
 * Why a catch time does not fit its competition day, or null when it fits. A catch counts on the day's
 * date on the lake's clock and, where the day records them, from the start (take-off) to check-in, both
 * ends included: a fish landed before take-off or after check-in is not part of the day (common practice;
 * the event's rules decide the details). Compared as instants, so the lake's offset on that date applies.
 */
export function catchTimeProblem(at: Date, day: CatchWindowDay, timeZone: string): string | null {
  const date = localDateOf(at, timeZone);
  if (date !== day.date)
    return `The catch time falls on ${date} (lake time, ${timeZone}), not on the competition day ${day.date}.`;
  // A bound typed inside a spring-forward gap moves on by the gap, so a window bound always exists.
  const start = day.startTime ? localBoundOn(day.date, day.startTime, timeZone) : null;
  const checkIn = day.checkInTime ? localBoundOn(day.date, day.checkInTime, timeZone) : null;
  const early = start !== null && at < start;
  const late = checkIn !== null && at > checkIn;
  if (!early && !late) return null;
  // Seconds only when present, so "15:00:30 is after the 15:00 check-in" does not read as 15:00.
  const seconds = at.getUTCSeconds();
  const clock =
    clockTime(at, timeZone) + (seconds || at.getUTCMilliseconds() ? `:${String(seconds).padStart(2, '0')}` : '');
  const window =
    start && checkIn
      ? `from the ${day.startTime} start to the ${day.checkInTime} check-in`
      : start
        ? `from the ${day.startTime} start on`
        : `until the ${day.checkInTime} check-in`;
  return `Catches on ${day.date} count ${window} (lake time, ${timeZone}); ${clock} is ${early ? 'before the start' : 'after check-in'}.`;
}
