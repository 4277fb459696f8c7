import { Body, Observer, SearchHourAngle } from 'astronomy-engine';
import * as SunCalc from 'suncalc';
import type { LocalDay } from '@shoalbook/shared';

const DAY_MS = 86_400_000;
const MINUTE_MS = 60_000;

/** The moon's rise, set and meridian transits inside one local day (epoch ms, ascending). */
export interface MoonEvents {
  rises: number[];
  sets: number[];
  upperTransits: number[];
  lowerTransits: number[];
}

/**
 * Moonrise and moonset from suncalc 2.0 (upper limb on the horizon, the USNO convention), which
 * scans whole UTC days: every UTC day overlapping the local day is scanned and the events kept
 * that fall inside it. Transits (hour angle 0 = upper, 12 = lower) from astronomy-engine's
 * SearchHourAngle, since suncalc has none.
 */
export function moonEvents(day: LocalDay, lat: number, lon: number): MoonEvents {
  const rises: number[] = [];
  const sets: number[] = [];
  const firstUtcDay = Math.floor(day.startMs / DAY_MS) * DAY_MS;
  for (let utcDay = firstUtcDay; utcDay < day.endMs; utcDay += DAY_MS) {
    const times = SunCalc.getMoonTimes(new Date(utcDay), lat, lon);
    if (times.rise) rises.push(times.rise.getTime());
    if (times.set) sets.push(times.set.getTime());
  }
  const inside = (ms: number) => ms >= day.startMs && ms < day.endMs;
  const observer = new Observer(lat, lon, 0);
  const transits = (hourAngle: number): number[] => {
    const found: number[] = [];
    let from = day.startMs;
    for (;;) {
      const event = SearchHourAngle(Body.Moon, observer, hourAngle, new Date(from), +1);
      const ms = event.time.date.getTime();
      if (ms >= day.endMs) return found;
      found.push(ms);
      from = ms + MINUTE_MS;
    }
  };
  return {
    rises: [...new Set(rises.filter(inside))].sort((a, b) => a - b),
    sets: [...new Set(sets.filter(inside))].sort((a, b) => a - b),
    upperTransits: transits(0),
    lowerTransits: transits(12),
  };
}
