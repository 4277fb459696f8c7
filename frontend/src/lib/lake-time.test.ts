import { describe, expect, it } from 'vitest';
import { clockTime, lakeWallTimeToIso, localDate } from './lake-time';

// Offsets from the IANA tz database: America/Chicago is UTC−5 in summer (CDT) and UTC−6 in winter (CST);
// in 2025 daylight time began on 9 March at 02:00 local (US rule: second Sunday of March).
describe('lake clock', () => {
  it('turns a lake wall-clock time into the UTC instant, on either side of a daylight-saving change', () => {
    expect(lakeWallTimeToIso('2025-04-12', '06:40', 'America/Chicago')).toBe('2025-04-12T11:40:00.000Z');
    expect(lakeWallTimeToIso('2025-01-18', '06:40', 'America/Chicago')).toBe('2025-01-18T12:40:00.000Z');
    expect(lakeWallTimeToIso('2025-03-09', '03:30', 'America/Chicago')).toBe('2025-03-09T08:30:00.000Z');
    expect(lakeWallTimeToIso('2025-03-08', '23:30', 'America/Chicago')).toBe('2025-03-09T05:30:00.000Z');
  });

  it('shows an instant on the lake’s clock and calendar, not the browser’s', () => {
    expect(clockTime('2025-04-12T11:40:00Z', 'America/Chicago')).toBe('06:40');
    expect(clockTime('2025-04-12T11:40:00Z', 'America/New_York')).toBe('07:40');
    expect(localDate('2025-04-13T03:30:00Z', 'America/Los_Angeles')).toBe('2025-04-12');
  });
});
