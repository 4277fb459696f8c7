import { describe, expect, it } from 'vitest';
import { mpsToSpeed, speedToMps } from '../../../lib/units';
import { checkInAt, durationText, runBack, runMinutes } from './check-in-clock-model';

/** Metres along a meridian for a latitude difference: R·Δφ on the mean sphere (R = 6,371,008.8 m), exact there. */
const alongMeridianM = (dLat: number) => (dLat * Math.PI * 6_371_008.8) / 180;

describe('check-in on the lake clock', () => {
  it('is the local time on the day, across a change of clocks (IANA tz: Chicago is UTC−6 in winter, UTC−5 from 9 March 2025)', () => {
    expect(checkInAt({ date: '2025-03-08', checkInTime: '15:00' }, 'America/Chicago')?.toISOString()).toBe(
      '2025-03-08T21:00:00.000Z',
    );
    expect(checkInAt({ date: '2025-03-09', checkInTime: '15:00' }, 'America/Chicago')?.toISOString()).toBe(
      '2025-03-09T20:00:00.000Z',
    );
    expect(checkInAt({ date: '2025-03-09', checkInTime: null }, 'America/Chicago')).toBeNull();
  });
});

describe('speeds', () => {
  it('1 mph is 0.44704 m/s and 1 km/h is 1/3.6 m/s (exact, NIST SP 811 Appendix B.8)', () => {
    expect(speedToMps(30, 'ft')).toBeCloseTo(13.4112, 10);
    expect(speedToMps(36, 'm')).toBeCloseTo(10, 10);
    expect(mpsToSpeed(speedToMps(42.5, 'ft'), 'ft')).toBeCloseTo(42.5, 10);
  });
});

describe('the run back to the ramp', () => {
  const ramp = { lat: 31.65, lon: -94.32 };
  const checkIn = new Date('2025-06-14T20:00:00Z'); // 15:00 in Chicago (CDT)

  it('is the straight line at cruising speed, and the start is the last whole minute that still arrives in time', () => {
    const boat = { lat: 31.7, lon: -94.32 };
    const run = runBack(boat, ramp, speedToMps(30, 'ft'), checkIn);
    // 0.05° along the meridian: 5,559.9 m; at 13.4112 m/s that is 414.6 s, so 6.9 minutes.
    expect(run.distanceM).toBeCloseTo(alongMeridianM(0.05), 3);
    expect(run.runSeconds).toBeCloseTo(alongMeridianM(0.05) / 13.4112, 6);
    expect(runMinutes(run.runSeconds)).toBe(7);
    // 20:00:00 − 414.6 s = 19:53:05.4, down to the minute.
    expect(run.leaveBy.toISOString()).toBe('2025-06-14T19:53:00.000Z');
  });

  it('at the ramp itself leaves at check-in, and refuses a speed that is not above zero', () => {
    expect(runBack(ramp, ramp, 10, checkIn).leaveBy.toISOString()).toBe(checkIn.toISOString());
    expect(() => runBack(ramp, ramp, 0, checkIn)).toThrow(/speed must be above 0/);
    expect(() => runBack(ramp, ramp, Number.NaN, checkIn)).toThrow(/speed must be above 0/);
  });
});

describe('time left, in words', () => {
  it('counts whole minutes, rounded down', () => {
    expect(durationText(59_999)).toBe('under a minute');
    expect(durationText(14 * 60_000 + 59_000)).toBe('14 min');
    expect(durationText((2 * 60 + 5) * 60_000)).toBe('2 h 05 min');
    expect(runMinutes(1)).toBe(1);
    expect(runMinutes(60.5)).toBe(2);
  });
});
