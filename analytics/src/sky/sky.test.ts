import * as Astronomy from 'astronomy-engine';
import { DateTime } from 'luxon';
import * as SunCalc from 'suncalc';
import { describe, expect, it } from 'vitest';
import { solunarPeriodAt } from './solunar.js';
import { sunMoonDay, type SunMoonDay } from './sun-moon-day.js';

const MINUTE = 60_000;
const minutesBetween = (a: string | number, b: string | number) =>
  Math.abs(new Date(a).getTime() - new Date(b).getTime()) / MINUTE;

// Invented lake positions spread over latitudes and zones (no real lake is meant).
const places = [
  ['subtropical, Eastern time', 27.0, -81.8, 'America/New_York'],
  ['mid-latitude, Central time', 33.2, -96.1, 'America/Chicago'],
  ['northern, Central time', 46.5, -94.3, 'America/Chicago'],
  ['north-west, Pacific time', 47.6, -122.3, 'America/Los_Angeles'],
  ['no daylight saving, Arizona', 33.5, -112.0, 'America/Phoenix'],
  ['southern hemisphere', -33.9, 151.2, 'Australia/Sydney'],
] as const;
// Seasons, both daylight-saving changes in the US (2025-03-09, 2025-11-02) and solstices.
const dates = [
  '2025-01-15',
  '2025-03-09',
  '2025-04-20',
  '2025-06-21',
  '2025-08-03',
  '2025-10-12',
  '2025-11-02',
  '2025-12-21',
];

function localWindow(date: string, timeZone: string) {
  const start = DateTime.fromISO(date, { zone: timeZone }).startOf('day');
  const end = start.plus({ days: 1 });
  return { start: start.toJSDate(), endMs: end.toMillis(), days: (end.toMillis() - start.toMillis()) / 86_400_000 };
}

/** astronomy-engine's first event after local midnight, if it falls before the next one. */
function reference(found: Astronomy.AstroTime | null, endMs: number): number | null {
  return found && found.date.getTime() < endMs ? found.date.getTime() : null;
}

function expectSameEvent(ours: string | null, ref: number | null, toleranceMin: number) {
  expect(ours === null).toBe(ref === null);
  if (ours !== null && ref !== null) expect(minutesBetween(ours, ref)).toBeLessThan(toleranceMin);
}

describe('sunMoonDay against astronomy-engine 2.1.19 (latitudes, seasons, time zones)', () => {
  it.each(places)(
    '%s: sun and moon rise/set and twilight within 1 minute, illumination within 0.001',
    (_name, lat, lon, timeZone) => {
      const observer = new Astronomy.Observer(lat, lon, 0);
      for (const date of dates) {
        const day = sunMoonDay(date, lat, lon, timeZone);
        const w = localWindow(date, timeZone);
        expectSameEvent(
          day.sunrise,
          reference(Astronomy.SearchRiseSet(Astronomy.Body.Sun, observer, +1, w.start, w.days), w.endMs),
          1,
        );
        expectSameEvent(
          day.sunset,
          reference(Astronomy.SearchRiseSet(Astronomy.Body.Sun, observer, -1, w.start, w.days), w.endMs),
          1,
        );
        expectSameEvent(
          day.civilDawn,
          reference(Astronomy.SearchAltitude(Astronomy.Body.Sun, observer, +1, w.start, w.days, -6), w.endMs),
          1,
        );
        expectSameEvent(
          day.civilDusk,
          reference(Astronomy.SearchAltitude(Astronomy.Body.Sun, observer, -1, w.start, w.days, -6), w.endMs),
          1,
        );
        expectSameEvent(
          day.moonrise,
          reference(Astronomy.SearchRiseSet(Astronomy.Body.Moon, observer, +1, w.start, w.days), w.endMs),
          1,
        );
        expectSameEvent(
          day.moonset,
          reference(Astronomy.SearchRiseSet(Astronomy.Body.Moon, observer, -1, w.start, w.days), w.endMs),
          1,
        );
        const noon = DateTime.fromISO(`${date}T12:00`, { zone: timeZone }).toJSDate();
        expect(
          Math.abs(day.moonIllumination - Astronomy.Illumination(Astronomy.Body.Moon, noon).phase_fraction),
        ).toBeLessThan(0.001);
        // Phase: suncalc's comes from the elongation, astronomy-engine's from ecliptic longitudes.
        let phaseGap = day.moonPhase - Astronomy.MoonPhase(noon) / 360;
        phaseGap -= Math.round(phaseGap);
        expect(Math.abs(phaseGap)).toBeLessThan(0.005);
      }
    },
  );

  it.each(places)(
    '%s: moon transits are where suncalc’s moon azimuth crosses the meridian (within 1 minute)',
    (_name, lat, lon, timeZone) => {
      // On the meridian the azimuth is 0° or 180°, so sin(azimuth) changes sign there; parallax acts
      // in the vertical plane, so topocentric and geocentric transits coincide.
      const sinAzimuth = (ms: number) =>
        Math.sin((SunCalc.getMoonPosition(new Date(ms), lat, lon).azimuth * Math.PI) / 180);
      const meridianCrossing = (near: number) => {
        let lo = near - 30 * MINUTE;
        let hi = near + 30 * MINUTE;
        expect(Math.sign(sinAzimuth(lo))).not.toBe(Math.sign(sinAzimuth(hi)));
        while (hi - lo > 500) {
          const mid = (lo + hi) / 2;
          if (Math.sign(sinAzimuth(mid)) === Math.sign(sinAzimuth(lo))) lo = mid;
          else hi = mid;
        }
        return (lo + hi) / 2;
      };
      for (const date of dates) {
        const day = sunMoonDay(date, lat, lon, timeZone);
        expect(day.moonUpperTransit ?? day.moonLowerTransit).not.toBeNull();
        for (const transit of [day.moonUpperTransit, day.moonLowerTransit]) {
          if (transit) expect(minutesBetween(transit, meridianCrossing(Date.parse(transit)))).toBeLessThan(1);
        }
        if (day.moonUpperTransit && day.moonLowerTransit) {
          const altitude = (iso: string) => SunCalc.getMoonPosition(new Date(iso), lat, lon).altitude;
          expect(altitude(day.moonUpperTransit)).toBeGreaterThan(altitude(day.moonLowerTransit));
        }
      }
    },
  );
});

describe('sunMoonDay against the USNO rise/set tables', () => {
  // USNO "Sun and Moon data for one day", 20 March 2002, Eastern Standard Time, as reproduced at
  // stevekluge.com/astronomy/equinoxsunrise.html. USNO rounds to the minute, hence 1.5 min.
  it.each([
    ['Washington, DC', 38.9, -77.0, '05:45', '06:12', '18:21', '18:47'],
    ['Cape May, NJ', 38.9, -74.9, '05:37', '06:04', '18:12', '18:39'],
  ] as const)('%s on 2002-03-20 (USNO)', (_place, lat, lon, dawn, rise, set, dusk) => {
    const day = sunMoonDay('2002-03-20', lat, lon, 'America/New_York');
    const est = (hhmm: string) => DateTime.fromISO(`2002-03-20T${hhmm}`, { zone: 'UTC-5' }).toMillis();
    expect(minutesBetween(day.civilDawn!, est(dawn))).toBeLessThan(1.5);
    expect(minutesBetween(day.sunrise!, est(rise))).toBeLessThan(1.5);
    expect(minutesBetween(day.sunset!, est(set))).toBeLessThan(1.5);
    expect(minutesBetween(day.civilDusk!, est(dusk))).toBeLessThan(1.5);
  });
});

describe('altitude conventions (checked with astronomy-engine’s unrefracted altitude)', () => {
  const geometricSunAltitude = (iso: string, lat: number, lon: number) => {
    const observer = new Astronomy.Observer(lat, lon, 0);
    const time = new Date(iso);
    const eq = Astronomy.Equator(Astronomy.Body.Sun, time, observer, true, true);
    return Astronomy.Horizon(time, observer, eq.ra, eq.dec).altitude;
  };

  it.each(places)(
    '%s: sunrise/sunset at −0.833° and civil twilight at −6° (sun’s centre)',
    (_name, lat, lon, timeZone) => {
      for (const date of dates) {
        const day = sunMoonDay(date, lat, lon, timeZone);
        for (const iso of [day.sunrise!, day.sunset!])
          expect(geometricSunAltitude(iso, lat, lon)).toBeCloseTo(-0.833, 1);
        for (const iso of [day.civilDawn!, day.civilDusk!])
          expect(geometricSunAltitude(iso, lat, lon)).toBeCloseTo(-6, 1);
      }
    },
  );
});

describe('the lake’s local day', () => {
  const within = (day: SunMoonDay, iso: string | null) => {
    if (iso === null) return true;
    const local = DateTime.fromISO(iso, { zone: day.timeZone });
    return local.toISODate() === day.date;
  };

  it.each(places)(
    '%s: every event falls on the local calendar date, including daylight-saving days',
    (_name, lat, lon, timeZone) => {
      for (const date of dates) {
        const day = sunMoonDay(date, lat, lon, timeZone);
        for (const key of [
          'sunrise',
          'sunset',
          'civilDawn',
          'civilDusk',
          'moonrise',
          'moonset',
          'moonUpperTransit',
          'moonLowerTransit',
        ] as const) {
          expect(within(day, day[key])).toBe(true);
        }
        for (const p of day.periods) expect(within(day, p.centre)).toBe(true);
      }
    },
  );

  it('gives ISO-8601 UTC instants', () => {
    const day = sunMoonDay('2025-06-21', 33.2, -96.1, 'America/Chicago');
    expect(day.sunrise).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.000Z$/);
  });

  it('has no sunrise or sunset under the midnight sun (69.65° N, 21 June), as astronomy-engine agrees', () => {
    const day = sunMoonDay('2025-06-21', 69.65, 18.96, 'Europe/Oslo');
    expect([day.sunrise, day.sunset]).toEqual([null, null]);
    const w = localWindow('2025-06-21', 'Europe/Oslo');
    expect(
      reference(
        Astronomy.SearchRiseSet(Astronomy.Body.Sun, new Astronomy.Observer(69.65, 18.96, 0), +1, w.start, w.days),
        w.endMs,
      ),
    ).toBeNull();
  });

  it('rejects bad dates, zones and positions', () => {
    expect(() => sunMoonDay('2025-02-30', 33, -96, 'America/Chicago')).toThrow(/invalid date/);
    expect(() => sunMoonDay('6/21/2025', 33, -96, 'America/Chicago')).toThrow(/YYYY-MM-DD/);
    expect(() => sunMoonDay('2025-06-21', 33, -96, 'Mars/Olympus')).toThrow(/time zone/);
    expect(() => sunMoonDay('2025-06-21', 91, -96, 'America/Chicago')).toThrow(/lat/);
    expect(() => sunMoonDay('2025-06-21', 33, -96, 'America/Chicago', { majorHours: 0 })).toThrow(/majorHours/);
  });
});

describe('solunar periods (major 2 h around transits, minor 1 h around rise and set: common practice)', () => {
  const [lat, lon, timeZone] = [33.2, -96.1, 'America/Chicago'];

  it('centres major periods on the transits and minor periods on moonrise and moonset', () => {
    const day = sunMoonDay('2025-05-10', lat, lon, timeZone);
    const centres = (kind: string) =>
      day.periods
        .filter((p) => p.kind === kind)
        .map((p) => p.centre)
        .sort();
    expect(centres('major')).toEqual([day.moonUpperTransit, day.moonLowerTransit].filter((x) => x !== null).sort());
    expect(centres('minor')).toEqual([day.moonrise, day.moonset].filter((x) => x !== null).sort());
    for (const p of day.periods) {
      expect(minutesBetween(p.start, p.end)).toBeCloseTo(p.kind === 'major' ? 120 : 60, 6);
      expect(minutesBetween(p.start, p.centre)).toBeCloseTo(p.kind === 'major' ? 60 : 30, 6);
    }
    const starts = day.periods.map((p) => p.start);
    expect(starts).toEqual([...starts].sort());
  });

  it('takes period lengths as options', () => {
    const day = sunMoonDay('2025-05-10', lat, lon, timeZone, { majorHours: 3, minorHours: 1.5 });
    for (const p of day.periods) expect(minutesBetween(p.start, p.end)).toBeCloseTo(p.kind === 'major' ? 180 : 90, 6);
  });

  it('finds the period containing an instant, and null outside every period', () => {
    const day = sunMoonDay('2025-05-10', lat, lon, timeZone);
    const major = day.periods.find((p) => p.kind === 'major')!;
    expect(solunarPeriodAt(major.centre, lat, lon, timeZone)).toEqual(major);
    // Every 10 minutes of the day: found exactly when some period (of this day or a neighbour) holds it.
    const all = [-1, 0, 1].flatMap(
      (d) => sunMoonDay(DateTime.fromISO('2025-05-10').plus({ days: d }).toISODate()!, lat, lon, timeZone).periods,
    );
    for (let t = Date.parse('2025-05-10T05:00:00Z'); t < Date.parse('2025-05-11T05:00:00Z'); t += 10 * MINUTE) {
      const inside = all.filter((p) => Date.parse(p.start) <= t && t < Date.parse(p.end));
      const found = solunarPeriodAt(new Date(t).toISOString(), lat, lon, timeZone);
      expect(found === null).toBe(inside.length === 0);
      if (found) expect(inside).toContainEqual(found);
    }
  });

  it('finds a period that began on the previous local day (straddling midnight)', () => {
    // Look for a day whose last period runs past local midnight.
    let checked = 0;
    for (let d = 0; d < 40 && checked < 2; d++) {
      const date = DateTime.fromISO('2025-01-01').plus({ days: d }).toISODate()!;
      const day = sunMoonDay(date, lat, lon, timeZone);
      const midnight = DateTime.fromISO(date, { zone: timeZone }).plus({ days: 1 }).toMillis();
      const straddling = day.periods.find((p) => Date.parse(p.end) > midnight + 5 * MINUTE);
      if (!straddling) continue;
      const found = solunarPeriodAt(new Date(midnight + MINUTE).toISOString(), lat, lon, timeZone);
      expect(found).not.toBeNull();
      expect(Date.parse(found!.start)).toBeLessThan(midnight);
      checked++;
    }
    expect(checked).toBe(2);
  });

  it('accepts offsets, rejects instants without a zone', () => {
    const day = sunMoonDay('2025-05-10', lat, lon, timeZone);
    const major = day.periods.find((p) => p.kind === 'major')!;
    const withOffset = DateTime.fromISO(major.centre).setZone('UTC-5').toISO()!;
    expect(solunarPeriodAt(withOffset, lat, lon, timeZone)).toEqual(major);
    expect(() => solunarPeriodAt('2025-05-10T12:00:00', lat, lon, timeZone)).toThrow(/offset/);
    expect(() => solunarPeriodAt('yesterday Z', lat, lon, timeZone)).toThrow(RangeError);
  });
});
