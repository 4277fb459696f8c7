import fc from 'fast-check';
import { solunarPeriodAt } from '@shoalbook/analytics';
import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { CatchTimingCalculator, timeOfDayBand } from './catch-timing';

// Reference: @shoalbook/analytics solunarPeriodAt (itself checked against astronomy-engine and a USNO table)
// and luxon's IANA zone handling; the cached calculator must agree with both exactly.
const places = [
  { lat: 34.75, lon: -92.29, timeZone: 'America/Chicago' },
  { lat: 47.6, lon: -52.7, timeZone: 'America/St_Johns' }, // a half-hour zone with DST
  { lat: 28.5, lon: 77.2, timeZone: 'Asia/Kolkata' },
];

describe('CatchTimingCalculator', () => {
  const calc = new CatchTimingCalculator();

  it('finds the same solunar period as analytics solunarPeriodAt', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: Date.UTC(2026, 0, 1), max: Date.UTC(2027, 11, 31) }),
        fc.constantFrom(...places),
        (ms, place) => {
          const expected = solunarPeriodAt(new Date(ms).toISOString(), place.lat, place.lon, place.timeZone);
          expect(calc.timing(ms, place).solunarPeriod).toBe(expected ? expected.kind : 'none');
        },
      ),
      { numRuns: 60, seed: 5 },
    );
  });

  it('gives the wall-clock minutes and local date that luxon gives, across DST changes', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: Date.UTC(2026, 0, 1), max: Date.UTC(2027, 11, 31) }),
        fc.constantFrom(...places),
        (ms, place) => {
          const local = DateTime.fromMillis(ms, { zone: place.timeZone });
          const t = calc.timing(ms, place);
          expect(t.localDate).toBe(local.toISODate());
          expect(t.localMinutes).toBe(local.hour * 60 + local.minute);
        },
      ),
      { numRuns: 300, seed: 7 },
    );
  });

  it('handles the hour after a spring-forward change (Chicago, 2026-03-08 03:30 CDT)', () => {
    const ms = DateTime.fromISO('2026-03-08T03:30', { zone: 'America/Chicago' }).toMillis();
    expect(calc.timing(ms, places[0]!).localMinutes).toBe(3 * 60 + 30);
  });

  it('bands the local clock into our time-of-day bands', () => {
    expect([0, 479, 480, 659, 660, 839, 840, 1019, 1020, 1439].map(timeOfDayBand)).toEqual([
      'early',
      'early',
      'morning',
      'morning',
      'midday',
      'midday',
      'afternoon',
      'afternoon',
      'late',
      'late',
    ]);
  });
});
