/**
 * Times shown and typed in the lake's own time zone (an angler on a lake two zones away from home
 * thinks in the lake's clock). Built on Intl only: no time-zone data is bundled.
 */

/** "HH:MM" of an instant in a time zone (24-hour clock). */
export function clockTime(instant: Date | string, timeZone: string): string {
  const date = typeof instant === 'string' ? new Date(instant) : instant;
  const parts = new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).formatToParts(date);
  const hour = parts.find((p) => p.type === 'hour')?.value ?? '00';
  const minute = parts.find((p) => p.type === 'minute')?.value ?? '00';
  return `${hour}:${minute}`;
}

/** The local calendar date (YYYY-MM-DD) of an instant in a time zone. */
export function localDate(instant: Date | string, timeZone: string): string {
  const date = typeof instant === 'string' ? new Date(instant) : instant;
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(date);
}

/** "07:42" or "—" for a nullable ISO instant. */
export function clockOrDash(instant: string | null | undefined, timeZone: string): string {
  return instant ? clockTime(instant, timeZone) : '—';
}

/** A local date for people: "Sat 12 Apr 2025". Dates are calendar days, so no zone shift. */
export function dayLabel(isoDate: string): string {
  const [y, m, d] = isoDate.split('-').map(Number);
  return new Intl.DateTimeFormat('en-GB', { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' }).format(
    new Date(Date.UTC(y, m - 1, d)),
  );
}

/** A "HH:MM" 24-hour clock time, as typed into the catch form. */
export function isClockTime(text: string): boolean {
  return /^([01]\d|2[0-3]):[0-5]\d$/.test(text.trim());
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
