import { Injectable } from '@nestjs/common';
import { sunMoonDay, type SunMoonDay } from '@shoalbook/analytics';
import { localDateOf, shiftDate, type SkyContext, type SkyDayView } from '@shoalbook/shared';

interface SkyPlace {
  lat: number;
  lon: number;
  timeZone: string;
}

const MAX_CACHED_DAYS = 5000;

/**
 * Sun and moon context from @shoalbook/analytics, in the lake's time zone, at the lake's reference
 * point (so nothing about a find's exact position goes into it). A day costs a few milliseconds to
 * compute, and a list of thousands of finds shares a handful of days, so days are cached; the result
 * is deterministic, so a process-wide cache is safe.
 */
@Injectable()
export class SkyService {
  private readonly days = new Map<string, SunMoonDay>();

  day(place: SkyPlace, date: string): SunMoonDay {
    const key = `${place.lat}|${place.lon}|${place.timeZone}|${date}`;
    let day = this.days.get(key);
    if (!day) {
      day = sunMoonDay(date, place.lat, place.lon, place.timeZone);
      if (this.days.size >= MAX_CACHED_DAYS) this.days.delete(this.days.keys().next().value!);
      this.days.set(key, day);
    }
    return day;
  }

  /** GET /sky: the whole day. */
  dayView(place: SkyPlace, date: string): SkyDayView {
    const d = this.day(place, date);
    return {
      date: d.date,
      timeZone: d.timeZone,
      sunrise: d.sunrise,
      sunset: d.sunset,
      civilDawn: d.civilDawn,
      civilDusk: d.civilDusk,
      moonrise: d.moonrise,
      moonset: d.moonset,
      moonPhase: d.moonPhase,
      moonIllumination: d.moonIllumination,
      periods: d.periods.map(({ kind, start, end, centre }) => ({ kind, start, end, centre })),
    };
  }

  /**
   * The context of an instant: its local day, and the solunar period it fell in. Follows analytics'
   * solunarPeriodAt exactly (periods of the day before, the day and the day after; a major period wins
   * over a minor one, then the nearer centre), reusing the cached days; the spec checks the two agree.
   */
  at(place: SkyPlace, instant: Date): SkyContext {
    const ms = instant.getTime();
    const date = localDateOf(ms, place.timeZone);
    const day = this.day(place, date);
    const around = [-1, 0, 1].flatMap((offset) => this.day(place, shiftDate(date, offset)).periods);
    const containing = around
      .filter((p) => Date.parse(p.start) <= ms && ms < Date.parse(p.end))
      .sort(
        (a, b) =>
          (a.kind === b.kind ? 0 : a.kind === 'major' ? -1 : 1) ||
          Math.abs(Date.parse(a.centre) - ms) - Math.abs(Date.parse(b.centre) - ms),
      );
    const period = containing[0] ?? null;
    return {
      date,
      sunrise: day.sunrise,
      sunset: day.sunset,
      moonrise: day.moonrise,
      moonset: day.moonset,
      moonPhase: day.moonPhase,
      moonIllumination: day.moonIllumination,
      period: period && { kind: period.kind, start: period.start, end: period.end },
    };
  }
}
