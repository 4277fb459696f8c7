import { sunMoonDay } from '@shoalbook/analytics';
import { zoneOffsetMinutes, type TimeOfDayBand } from '@shoalbook/shared';

/** Where a catch's timing is computed: the lake's reference point and zone. */
export interface TimingPlace {
  lat: number;
  lon: number;
  timeZone: string;
}

export interface CatchTiming {
  /** Lake-local calendar date of the instant. */
  localDate: string;
  /** Wall-clock minutes after local midnight (0–1439). */
  localMinutes: number;
  /** Minutes after the local day's sunrise (negative before), rounded; null when the sun does not rise. */
  minutesFromSunrise: number | null;
  /** 'major' | 'minor' | 'none'. */
  solunarPeriod: 'major' | 'minor' | 'none';
  timeOfDay: TimeOfDayBand;
}

interface SkyDay {
  sunriseMs: number | null;
  periods: { kind: 'major' | 'minor'; startMs: number; endMs: number; centreMs: number }[];
}

const QUARTER_HOUR_MS = 900_000;
const DAY_MS = 86_400_000;
const MAX_CACHED = 50_000;

/** Clock bands of TIME_OF_DAY_BANDS (our own choice): minutes after local midnight where each band ends. */
export function timeOfDayBand(localMinutes: number): TimeOfDayBand {
  if (localMinutes < 8 * 60) return 'early';
  if (localMinutes < 11 * 60) return 'morning';
  if (localMinutes < 14 * 60) return 'midday';
  if (localMinutes < 17 * 60) return 'afternoon';
  return 'late';
}

/**
 * Timing of catches in a lake's zone with @shoalbook/analytics, fast enough for a rebuild of a million catches:
 * zone offsets are cached per quarter hour (every zone's transitions fall on quarter hours) and sun/moon days
 * per place and date (a day costs milliseconds; a journal has few distinct days). The solunar period follows
 * analytics' solunarPeriodAt exactly (periods of the day before, the day and the day after; major wins over
 * minor, then the nearer centre); the spec checks the two agree. Deterministic, so a process-wide cache is safe.
 */
export class CatchTimingCalculator {
  private readonly offsets = new Map<string, number>();
  private readonly days = new Map<string, SkyDay>();
  /** The day before, the day and the day after, per place and date: what one instant's period search reads. */
  private readonly triples = new Map<string, [SkyDay, SkyDay, SkyDay]>();

  /** Offset of the zone from UTC in minutes at the instant. */
  offsetMinutes(ms: number, timeZone: string): number {
    const key = `${timeZone}|${Math.floor(ms / QUARTER_HOUR_MS)}`;
    let offset = this.offsets.get(key);
    if (offset === undefined) {
      offset = zoneOffsetMinutes(Math.floor(ms / QUARTER_HOUR_MS) * QUARTER_HOUR_MS, timeZone);
      if (this.offsets.size >= MAX_CACHED) this.offsets.clear();
      this.offsets.set(key, offset);
    }
    return offset;
  }

  skyDay(place: TimingPlace, date: string): SkyDay {
    const key = `${place.lat}|${place.lon}|${place.timeZone}|${date}`;
    let day = this.days.get(key);
    if (!day) {
      const d = sunMoonDay(date, place.lat, place.lon, place.timeZone);
      day = {
        sunriseMs: d.sunrise ? Date.parse(d.sunrise) : null,
        periods: d.periods.map((p) => ({
          kind: p.kind,
          startMs: Date.parse(p.start),
          endMs: Date.parse(p.end),
          centreMs: Date.parse(p.centre),
        })),
      };
      if (this.days.size >= MAX_CACHED) this.days.clear();
      this.days.set(key, day);
    }
    return day;
  }

  timing(ms: number, place: TimingPlace): CatchTiming {
    const localMs = ms + this.offsetMinutes(ms, place.timeZone) * 60_000;
    const localDate = new Date(localMs).toISOString().slice(0, 10);
    const localMinutes = Math.floor((((localMs % DAY_MS) + DAY_MS) % DAY_MS) / 60_000);
    const key = `${place.lat}|${place.lon}|${place.timeZone}|${localDate}`;
    let triple = this.triples.get(key);
    if (!triple) {
      triple = [
        this.skyDay(place, shiftDate(localDate, -1)),
        this.skyDay(place, localDate),
        this.skyDay(place, shiftDate(localDate, 1)),
      ];
      if (this.triples.size >= MAX_CACHED) this.triples.clear();
      this.triples.set(key, triple);
    }
    const today = triple[1];
    let best: SkyDay['periods'][number] | null = null;
    for (const day of triple) {
      for (const p of day.periods) {
        if (p.startMs > ms || ms >= p.endMs) continue;
        if (!best || better(p, best, ms)) best = p;
      }
    }
    return {
      localDate,
      localMinutes,
      minutesFromSunrise: today.sunriseMs === null ? null : Math.round((ms - today.sunriseMs) / 60_000),
      solunarPeriod: best ? best.kind : 'none',
      timeOfDay: timeOfDayBand(localMinutes),
    };
  }
}

function better(p: SkyDay['periods'][number], q: SkyDay['periods'][number], ms: number): boolean {
  if (p.kind !== q.kind) return p.kind === 'major';
  return Math.abs(p.centreMs - ms) < Math.abs(q.centreMs - ms);
}

function shiftDate(date: string, days: number): string {
  return new Date(Date.parse(`${date}T00:00:00Z`) + days * DAY_MS).toISOString().slice(0, 10);
}

/** One calculator per process: its caches hold only deterministic astronomy and zone data. */
export const catchTiming = new CatchTimingCalculator();
