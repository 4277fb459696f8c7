import { describe, expect, it } from 'vitest';
import {
  clockTime,
  isCalendarDate,
  isHhMm,
  isIanaZone,
  localBoundOn,
  localDateOf,
  localDay,
  localTimeOn,
  parseInstant,
  shiftDate,
  zoneOffsetMinutes,
} from './lake-time.js';

// Offsets and transitions from the IANA tz database (northamerica file, US rules since 2007): America/Chicago
// is UTC−6 (CST) in winter and UTC−5 (CDT) in summer; daylight time began 2025-03-09 at 02:00 local
// (second Sunday of March) and ended 2025-11-02 at 02:00 local (first Sunday of November).
const CHICAGO = 'America/Chicago';

describe('lake time', () => {
  it('checks calendar dates, clock times and zones', () => {
    expect(isCalendarDate('2024-02-29')).toBe(true);
    expect(isCalendarDate('2023-02-29')).toBe(false);
    expect(isCalendarDate('2024-2-1')).toBe(false);
    expect(isHhMm('06:40')).toBe(true);
    expect(isHhMm('24:00')).toBe(false);
    expect(isHhMm('6:40')).toBe(false);
    expect(isIanaZone(CHICAGO)).toBe(true);
    expect(isIanaZone('Mars/Olympus')).toBe(false);
  });

  it('maps a wall-clock time on either side of a change to the right instant', () => {
    expect(localTimeOn('2025-04-12', '06:40', CHICAGO)!.toISOString()).toBe('2025-04-12T11:40:00.000Z');
    expect(localTimeOn('2025-01-18', '06:40', CHICAGO)!.toISOString()).toBe('2025-01-18T12:40:00.000Z');
    expect(localTimeOn('2025-03-09', '03:30', CHICAGO)!.toISOString()).toBe('2025-03-09T08:30:00.000Z');
    expect(localTimeOn('2025-03-08', '23:30', CHICAGO)!.toISOString()).toBe('2025-03-09T05:30:00.000Z');
  });

  it('refuses a wall-clock time inside the spring-forward gap (02:00–02:59 did not happen on 2025-03-09)', () => {
    expect(localTimeOn('2025-03-09', '02:00', CHICAGO)).toBeNull();
    expect(localTimeOn('2025-03-09', '02:30', CHICAGO)).toBeNull();
    expect(localTimeOn('2025-03-09', '01:59', CHICAGO)!.toISOString()).toBe('2025-03-09T07:59:00.000Z');
  });

  it('moves a window bound in the gap on by the gap, and reads the offset at an instant', () => {
    expect(localBoundOn('2025-03-09', '02:30', CHICAGO).toISOString()).toBe('2025-03-09T08:30:00.000Z');
    expect(localBoundOn('2025-04-12', '06:40', CHICAGO).toISOString()).toBe('2025-04-12T11:40:00.000Z');
    expect(zoneOffsetMinutes('2025-07-01T12:00:00Z', CHICAGO)).toBe(-300);
    expect(zoneOffsetMinutes('2025-01-01T12:00:00Z', CHICAGO)).toBe(-360);
    expect(zoneOffsetMinutes('2025-07-01T12:00:00Z', 'Asia/Kolkata')).toBe(330);
  });

  it('takes the first occurrence in the repeated autumn hour (RFC 5545 §3.3.5) (01:00–01:59 happened twice on 2025-11-02)', () => {
    // First 01:30 is CDT (UTC−5) = 06:30Z; the second, an hour later, is CST (UTC−6) = 07:30Z.
    expect(localTimeOn('2025-11-02', '01:30', CHICAGO)!.toISOString()).toBe('2025-11-02T06:30:00.000Z');
    expect(clockTime('2025-11-02T07:30:00Z', CHICAGO)).toBe('01:30');
  });

  it('shows an instant on the lake’s clock and calendar, not the viewer’s', () => {
    expect(clockTime('2025-04-12T11:40:00Z', CHICAGO)).toBe('06:40');
    expect(clockTime(new Date('2025-04-12T11:40:00Z'), 'America/New_York')).toBe('07:40');
    expect(localDateOf('2025-04-13T03:30:00Z', 'America/Los_Angeles')).toBe('2025-04-12');
    expect(localDateOf(Date.parse('2024-07-02T03:00:00Z'), CHICAGO)).toBe('2024-07-01');
  });

  it('makes a local day of 23 or 25 hours across the changes', () => {
    const hours = (d: string) => {
      const day = localDay(d, CHICAGO);
      return (day.endMs - day.startMs) / 3_600_000;
    };
    expect(hours('2025-03-09')).toBe(23);
    expect(hours('2025-11-02')).toBe(25);
    expect(hours('2025-06-01')).toBe(24);
    expect(() => localDay('2025-6-1', CHICAGO)).toThrow(RangeError);
    expect(() => localDay('2025-06-01', 'Mars/Olympus')).toThrow(RangeError);
    expect(shiftDate('2024-02-28', 1)).toBe('2024-02-29');
  });

  it('parses only instants with a zone', () => {
    expect(parseInstant('2024-07-01T06:30:00-05:00')!.toISOString()).toBe('2024-07-01T11:30:00.000Z');
    expect(parseInstant('2024-07-01T06:30:00')).toBeNull();
    expect(parseInstant('06:30')).toBeNull();
  });
});
