import { sunMoonDay } from '@shoalbook/analytics';
import { zoneOffsetMinutes, type TimeOfDayBand } from '@shoalbook/shared';

/** Where a catch's timing is computed: the lake's reference point and zone. */
export interface TimingPlace {
  lat: number;
  lon: number;
  timeZone: string;
}

/** Where timing falls back to when a lake is missing (never for a well-formed journal). */
export const UTC_PLACE: TimingPlace = { lat: 0, lon: 0, timeZone: 'UTC' };

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

/** Whole seconds of a span of time in each solunar period and each time-of-day band (keys as on catches). */
export interface SpanSeconds {
  solunarPeriod: Map<string, number>;
  timeOfDay: Map<string, number>;
}

const QUARTER_HOUR_MS = 900_000;
const DAY_MS = 86_400_000;
const MAX_CACHED = 50_000;
/** Longer spans are not split (the API bounds a stop to its competition day; this only guards bad journal data). */
const MAX_SPLIT_MS = 2 * DAY_MS;

/** Minutes after local midnight where the bands of TIME_OF_DAY_BANDS (our own choice) end. */
const BAND_ENDS: [number, TimeOfDayBand][] = [
  [8 * 60, 'early'],
  [11 * 60, 'morning'],
  [14 * 60, 'midday'],
  [17 * 60, 'afternoon'],
  [24 * 60, 'late'],
];

export function timeOfDayBand(localMinutes: number): TimeOfDayBand {
  return BAND_ENDS.find(([end]) => localMinutes < end)?.[1] ?? 'late';
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

/**
 * Splits the span [fromMs, toMs) at every edge of a solunar period and of a time-of-day band, and gives each piece
 * the period and band {@link CatchTimingCalculator.timing} gives an instant inside it, so time and catches are
 * classed by one rule. Seconds are counted on the whole-second grid a stop's duration uses, so the pieces add up to
 * floor(toMs / 1000) - floor(fromMs / 1000).
 */
export function spanSeconds(
  calc: CatchTimingCalculator,
  fromMs: number,
  toMs: number,
  place: TimingPlace,
): SpanSeconds {
  const out: SpanSeconds = { solunarPeriod: new Map(), timeOfDay: new Map() };
  const add = (m: Map<string, number>, key: string, seconds: number) => {
    if (seconds > 0) m.set(key, (m.get(key) ?? 0) + seconds);
  };
  if (!(toMs > fromMs)) return out;
  const whole = (ms: number) => Math.floor(ms / 1000);
  if (toMs - fromMs > MAX_SPLIT_MS) {
    add(out.solunarPeriod, '', whole(toMs) - whole(fromMs));
    add(out.timeOfDay, '', whole(toMs) - whole(fromMs));
    return out;
  }
  const edges = new Set<number>([fromMs, toMs]);
  for (let day = calc.timing(fromMs, place).localDate, last = calc.timing(toMs, place).localDate; ;) {
    for (const d of [shiftDate(day, -1), day, shiftDate(day, 1)])
      for (const p of calc.skyDay(place, d).periods) edges.add(p.startMs).add(p.endMs);
    if (day >= last) break;
    day = shiftDate(day, 1);
  }
  // Band edges: from each piece's start, the next local-clock band end (re-read after each step, so DST holds).
  for (let t = fromMs; t < toMs;) {
    const local = calc.timing(t, place);
    const localMsOfDay = (((t + calc.offsetMinutes(t, place.timeZone) * 60_000) % DAY_MS) + DAY_MS) % DAY_MS;
    const bandEnd = BAND_ENDS.find(([end]) => local.localMinutes < end)![0] * 60_000;
    const next = t + Math.max(1, bandEnd - localMsOfDay);
    edges.add(next);
    t = next;
  }
  const cuts = [...edges].filter((e) => e >= fromMs && e <= toMs).sort((a, b) => a - b);
  for (let i = 0; i + 1 < cuts.length; i++) {
    const [a, b] = [cuts[i]!, cuts[i + 1]!];
    const seconds = whole(b) - whole(a);
    if (seconds <= 0) continue;
    const t = calc.timing(a + (b - a) / 2, place);
    add(out.solunarPeriod, t.solunarPeriod, seconds);
    add(out.timeOfDay, t.timeOfDay, seconds);
  }
  return out;
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
