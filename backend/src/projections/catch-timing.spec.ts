import fc from 'fast-check';
import { solunarPeriodAt, sunMoonDay } from '@shoalbook/analytics';
import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { CatchTimingCalculator, spanSeconds, timeOfDayBand } from './catch-timing';

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

describe("spanSeconds (a stop's time by solunar period and time-of-day band)", () => {
  const calc = new CatchTimingCalculator();
  const chicago = places[0]!;
  const at = (iso: string) => DateTime.fromISO(iso, { zone: chicago.timeZone }).toMillis();

  it('splits a stop at a band edge by the lake clock (10:30–11:30 is half morning, half midday)', () => {
    const split = spanSeconds(calc, at('2026-06-13T10:30'), at('2026-06-13T11:30'), chicago);
    expect(Object.fromEntries(split.timeOfDay)).toEqual({ morning: 1800, midday: 1800 });
  });

  it("puts exactly the part of a stop inside a major period into 'major' (periods from analytics sunMoonDay)", () => {
    const major = sunMoonDay('2026-06-13', chicago.lat, chicago.lon, chicago.timeZone).periods.find(
      (p) => p.kind === 'major',
    )!;
    const start = Date.parse(major.start);
    // From 40 min before the period opens to 30 min into it: 30 min are in it, whatever lies before.
    const split = spanSeconds(calc, start - 40 * 60_000, start + 30 * 60_000, chicago);
    expect(split.solunarPeriod.get('major')).toBe(30 * 60);
    expect([...split.solunarPeriod.values()].reduce((a, b) => a + b, 0)).toBe(70 * 60);
  });

  it('classes every second of a stop as a catch at that second would be classed, and adds up to its duration', () => {
    // Reference: the calculator's own per-instant rule (checked above against analytics and luxon), one whole
    // second at a time — the second mark m·1000 belongs to the piece ending at or after it.
    fc.assert(
      fc.property(
        fc.integer({ min: Date.UTC(2026, 0, 1), max: Date.UTC(2027, 11, 31) }),
        fc.integer({ min: 1, max: 10 * 3600 }),
        fc.constantFrom(...places),
        (from, seconds, place) => {
          const to = from + seconds * 1000 + (from % 997);
          const expected = { solunarPeriod: new Map<string, number>(), timeOfDay: new Map<string, number>() };
          for (let m = Math.floor(from / 1000) + 1; m <= Math.floor(to / 1000); m++) {
            const t = calc.timing(m * 1000 - 1, place);
            expected.solunarPeriod.set(t.solunarPeriod, (expected.solunarPeriod.get(t.solunarPeriod) ?? 0) + 1);
            expected.timeOfDay.set(t.timeOfDay, (expected.timeOfDay.get(t.timeOfDay) ?? 0) + 1);
          }
          const split = spanSeconds(calc, from, to, place);
          expect(Object.fromEntries(split.solunarPeriod)).toEqual(Object.fromEntries(expected.solunarPeriod));
          expect(Object.fromEntries(split.timeOfDay)).toEqual(Object.fromEntries(expected.timeOfDay));
        },
      ),
      { numRuns: 25, seed: 11 },
    );
  });

  it('gives nothing for an empty or reversed span', () => {
    expect(spanSeconds(calc, 5000, 5000, chicago).timeOfDay.size).toBe(0);
    expect(spanSeconds(calc, 9000, 5000, chicago).solunarPeriod.size).toBe(0);
  });
});
