/**
 * Times shown and typed in the lake's own time zone (an angler on a lake two zones away from home
 * thinks in the lake's clock). The rules (wall clock ↔ instant, daylight-saving gaps) live once in
 * @shoalbook/shared's lake time; this module only adds what the screens need around them.
 */
import { clockTime, isHhMm, localDateOf } from '@shoalbook/shared';

export { clockTime, localTimeOn } from '@shoalbook/shared';

/** The local calendar date (YYYY-MM-DD) of an instant in a time zone. */
export const localDate = localDateOf;

/** "07:42" or "—" for a nullable ISO instant. */
export function clockOrDash(instant: string | null | undefined, timeZone: string): string {
  return instant ? clockTime(instant, timeZone) : '—';
}

/** A local date for people: "Sat 12 Apr 2025". Dates are calendar days, so no zone shift. */
export function dayLabel(isoDate: string): string {
  const [y, m, d] = isoDate.split('-').map(Number);
  return new Intl.DateTimeFormat('en-GB', {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    timeZone: 'UTC',
  }).format(new Date(Date.UTC(y, m - 1, d)));
}

/** A "HH:MM" 24-hour clock time, as typed into the catch form. */
export function isClockTime(text: string): boolean {
  return isHhMm(text.trim());
}

/** Every IANA zone the browser knows, for the lake form's picker. */
export function timeZones(): string[] {
  const supported = (Intl as unknown as { supportedValuesOf?: (key: string) => string[] }).supportedValuesOf;
  const zones = supported ? supported('timeZone') : [];
  return zones.length ? zones : ['UTC'];
}

/** The browser's own zone: a sensible first choice for a new lake. */
export function browserTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
}
