import { assertFinite } from '../stats/validate.js';
import { localDateOf, localDay, shiftDate } from '@shoalbook/shared';
import { instantMs, toIsoUtc } from './instants.js';
import { moonEvents, type MoonEvents } from './moon-events.js';

/** Which moon event a solunar period is centred on. */
export type SolunarMarker = 'moonUpperTransit' | 'moonLowerTransit' | 'moonrise' | 'moonset';

/** A solunar period: major around a moon transit, minor around moonrise or moonset. */
export interface SolunarPeriod {
  kind: 'major' | 'minor';
  /** ISO-8601 UTC instants. */
  start: string;
  end: string;
  centre: string;
  /** The moon event at the centre. */
  marker: SolunarMarker;
}

/** Period lengths in hours. Defaults 2 h (major) and 1 h (minor): common practice. */
export interface SolunarOptions {
  majorHours?: number;
  minorHours?: number;
}

const HOUR_MS = 3_600_000;

/** Checks a lake position in decimal degrees, throwing a RangeError that names the bad value. */
export function assertPosition(lat: number, lon: number): void {
  assertFinite('lat', lat);
  assertFinite('lon', lon);
  if (lat < -90 || lat > 90) throw new RangeError(`lat must be within ±90°, got ${lat}`);
  if (lon < -180 || lon > 180) throw new RangeError(`lon must be within ±180°, got ${lon}`);
}

function periodHours(options: SolunarOptions): { major: number; minor: number } {
  const major = options.majorHours ?? 2;
  const minor = options.minorHours ?? 1;
  for (const [name, h] of [
    ['majorHours', major],
    ['minorHours', minor],
  ] as const) {
    assertFinite(name, h);
    if (!(h > 0 && h <= 12)) throw new RangeError(`${name} must be within (0, 12], got ${h}`);
  }
  return { major, minor };
}

/** Solunar periods (ascending by start) for the moon events of one local day. */
export function periodsFromMoonEvents(events: MoonEvents, options: SolunarOptions = {}): SolunarPeriod[] {
  const { major, minor } = periodHours(options);
  const make = (kind: 'major' | 'minor', marker: SolunarMarker, hours: number) => (centreMs: number) => ({
    kind,
    marker,
    startMs: centreMs - (hours * HOUR_MS) / 2,
    endMs: centreMs + (hours * HOUR_MS) / 2,
    centreMs,
  });
  const periods = [
    ...events.upperTransits.map(make('major', 'moonUpperTransit', major)),
    ...events.lowerTransits.map(make('major', 'moonLowerTransit', major)),
    ...events.rises.map(make('minor', 'moonrise', minor)),
    ...events.sets.map(make('minor', 'moonset', minor)),
  ].sort((a, b) => a.startMs - b.startMs);
  return periods.map((p) => ({
    kind: p.kind,
    start: toIsoUtc(p.startMs),
    end: toIsoUtc(p.endMs),
    centre: toIsoUtc(p.centreMs),
    marker: p.marker,
  }));
}

/**
 * The solunar period containing an instant at a lake, or `null` when it falls in none. Periods of
 * the local day before and after are considered too, since a period can straddle midnight. Where
 * periods overlap, a major period wins over a minor one, then the nearer centre.
 *
 * @param instant ISO-8601 instant (Z or offset)
 * @param lat latitude in decimal degrees (north positive)
 * @param lon longitude in decimal degrees (east positive)
 * @param timeZone the lake's IANA time zone (its local days)
 * @param options period lengths; defaults 2 h major, 1 h minor (common practice)
 */
export function solunarPeriodAt(
  instant: string,
  lat: number,
  lon: number,
  timeZone: string,
  options: SolunarOptions = {},
): SolunarPeriod | null {
  const ms = instantMs(instant);
  assertPosition(lat, lon);
  periodHours(options);
  const date = localDateOf(ms, timeZone);
  const candidates = [-1, 0, 1]
    .flatMap((offset) =>
      periodsFromMoonEvents(moonEvents(localDay(shiftDate(date, offset), timeZone), lat, lon), options),
    )
    .filter((p) => Date.parse(p.start) <= ms && ms < Date.parse(p.end));
  candidates.sort(
    (a, b) =>
      (a.kind === b.kind ? 0 : a.kind === 'major' ? -1 : 1) ||
      Math.abs(Date.parse(a.centre) - ms) - Math.abs(Date.parse(b.centre) - ms),
  );
  return candidates[0] ?? null;
}
