import { describe, expect, it } from 'vitest';
import { isCalendarDate, isIanaZone, localDateOf, localTimeOn, parseInstant } from './local-time';

describe('local time', () => {
  it('checks calendar dates and zones', () => {
    expect(isCalendarDate('2024-02-29')).toBe(true);
    expect(isCalendarDate('2023-02-29')).toBe(false);
    expect(isCalendarDate('2024-2-1')).toBe(false);
    expect(isIanaZone('America/Chicago')).toBe(true);
    expect(isIanaZone('Mars/Olympus')).toBe(false);
  });

  it('maps local wall-clock times to instants (America/Chicago is UTC−5 in summer, UTC−6 in winter)', () => {
    expect(localTimeOn('2024-07-01', '06:30', 'America/Chicago')!.toISOString()).toBe('2024-07-01T11:30:00.000Z');
    expect(localTimeOn('2024-01-15', '06:30', 'America/Chicago')!.toISOString()).toBe('2024-01-15T12:30:00.000Z');
    // 2024-03-10 02:30 does not exist in Chicago (clocks went from 02:00 to 03:00).
    expect(localTimeOn('2024-03-10', '02:30', 'America/Chicago')).toBeNull();
    expect(localDateOf(new Date('2024-07-02T03:00:00Z'), 'America/Chicago')).toBe('2024-07-01');
  });

  it('parses only instants with a zone', () => {
    expect(parseInstant('2024-07-01T06:30:00-05:00')!.toISOString()).toBe('2024-07-01T11:30:00.000Z');
    expect(parseInstant('2024-07-01T06:30:00')).toBeNull();
    expect(parseInstant('06:30')).toBeNull();
  });
});
