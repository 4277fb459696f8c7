import * as SunCalc from 'suncalc';
import { localDay, type LocalDay } from '@shoalbook/shared';
import { toIsoUtc } from './instants.js';
import { moonEvents } from './moon-events.js';
import { assertPosition, periodsFromMoonEvents, type SolunarOptions, type SolunarPeriod } from './solunar.js';

const DAY_MS = 86_400_000;

/** Sun and moon context of one local day at a lake. Instants are ISO-8601 UTC strings or `null`. */
export interface SunMoonDay {
  /** The local calendar date (YYYY-MM-DD) in `timeZone`. */
  date: string;
  timeZone: string;
  /** Sun's upper limb on the horizon: centre at −0.833° (34′ refraction + 16′ semi-diameter). */
  sunrise: string | null;
  sunset: string | null;
  /** Civil twilight: sun's centre at −6°. */
  civilDawn: string | null;
  civilDusk: string | null;
  /** Moon's upper limb on the horizon (first event in the day when there are two). */
  moonrise: string | null;
  moonset: string | null;
  /** Moon on the meridian (hour angle 0) and on the lower meridian (hour angle 12). */
  moonUpperTransit: string | null;
  moonLowerTransit: string | null;
  /** Illuminated fraction of the moon's disc (0–1) at local noon. */
  moonIllumination: number;
  /** Moon phase at local noon, 0–1: 0 new, 0.25 first quarter, 0.5 full, 0.75 last quarter. */
  moonPhase: number;
  /** Solunar periods whose centre falls in the day, by start. */
  periods: SolunarPeriod[];
}

type SunEventName = 'sunrise' | 'sunset' | 'dawn' | 'dusk';

/**
 * suncalc's getTimes answers for the solar day nearest the instant given; asking at local noon and
 * at the noons either side, then keeping the event that falls in the local day, stays right in
 * zones far from their meridian.
 */
function sunEvent(day: LocalDay, lat: number, lon: number, name: SunEventName): string | null {
  for (const offset of [0, -1, 1]) {
    const time = SunCalc.getTimes(new Date(day.noonMs + offset * DAY_MS), lat, lon)[name];
    if (time instanceof Date) {
      const ms = time.getTime();
      if (ms >= day.startMs && ms < day.endMs) return toIsoUtc(ms);
    }
  }
  return null;
}

const first = (values: number[]): string | null => (values.length ? toIsoUtc(values[0]) : null);

/**
 * Sun and moon times of a lake's local calendar day, and the day's solunar periods (major: centred
 * on the moon's upper and lower transits; minor: on moonrise and moonset).
 *
 * Sources: sun and moon from suncalc 2.0.2 (Meeus, Astronomical Algorithms; sunrise/sunset at
 * −0.833°, civil twilight at −6°, moonrise/moonset by the USNO upper-limb convention); moon transits
 * from astronomy-engine 2.1.19. Checked in tests against astronomy-engine and a USNO table.
 *
 * @param date local calendar date YYYY-MM-DD
 * @param lat latitude in decimal degrees (north positive)
 * @param lon longitude in decimal degrees (east positive)
 * @param timeZone the lake's IANA time zone, e.g. 'America/Chicago'
 * @param options solunar period lengths; defaults 2 h major, 1 h minor (common practice)
 */
export function sunMoonDay(
  date: string,
  lat: number,
  lon: number,
  timeZone: string,
  options: SolunarOptions = {},
): SunMoonDay {
  assertPosition(lat, lon);
  const day = localDay(date, timeZone);
  const moon = moonEvents(day, lat, lon);
  const illumination = SunCalc.getMoonIllumination(new Date(day.noonMs));
  return {
    date,
    timeZone,
    sunrise: sunEvent(day, lat, lon, 'sunrise'),
    sunset: sunEvent(day, lat, lon, 'sunset'),
    civilDawn: sunEvent(day, lat, lon, 'dawn'),
    civilDusk: sunEvent(day, lat, lon, 'dusk'),
    moonrise: first(moon.rises),
    moonset: first(moon.sets),
    moonUpperTransit: first(moon.upperTransits),
    moonLowerTransit: first(moon.lowerTransits),
    moonIllumination: illumination.fraction,
    moonPhase: illumination.phase,
    periods: periodsFromMoonEvents(moon, options),
  };
}
