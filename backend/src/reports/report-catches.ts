import type { EntityManager } from '@mikro-orm/mariadb';
import type { Fate, ReportFish, Species } from '@shoalbook/shared';
import { numberOrNull } from './row-values';

/** A catch as the recap and timing reports read it from rm_catch_fact (+ the find's name from rm_find). */
export interface ReportCatch extends ReportFish {
  competitionDayId: string;
  eventId: string;
  caughtAtMs: number;
  localMinutes: number;
  minutesFromSunrise: number | null;
  solunarPeriod: string;
  lat: number | null;
  lon: number | null;
  /** The crew member who logged it (an individual event's bag is per angler). */
  loggedBy: string | null;
}

const instant = (v: unknown): number =>
  v instanceof Date ? v.getTime() : Date.parse(`${String(v).replace(' ', 'T')}Z`);

const CATCH_COLUMNS = `c.id, c.event_id, c.competition_day_id, c.day_date, c.find_id, c.caught_at, c.weight_lb, c.length_in, c.species, c.fate, c.lure,
            c.lat, c.lon, c.logged_by, c.local_minutes, c.minutes_from_sunrise, c.solunar_period, f.name AS find_name`;
const CATCH_FROM = 'rm_catch_fact c LEFT JOIN rm_find f ON f.id = c.find_id AND f.crew_id = c.crew_id';

/** Every catch the condition selects, in time order. */
export async function selectCatches(em: EntityManager, where: string, params: unknown[]): Promise<ReportCatch[]> {
  const rows: Record<string, unknown>[] = await em.execute(
    `SELECT ${CATCH_COLUMNS} FROM ${CATCH_FROM} WHERE ${where} ORDER BY c.caught_at, c.id`,
    params,
  );
  return rows.map(reportCatchOf);
}

/**
 * At most `cap` (≥ 2) of the selected catches, thinned evenly in time order: with n > cap fish, the ones at
 * positions ⌈i·(n−1)/(cap−1)⌉ for i = 0…cap−1, so the first and the last fish are always kept and the gaps
 * differ by at most one fish. (Position j is kept when j·(cap−1) mod (n−1) < cap−1: a multiple of n−1 lies
 * in (j−1)·(cap−1) … j·(cap−1).) `total` is n, the number of fish before thinning.
 */
export async function selectThinnedCatches(
  em: EntityManager,
  where: string,
  params: unknown[],
  cap: number,
): Promise<{ catches: ReportCatch[]; total: number }> {
  const rows: Record<string, unknown>[] = await em.execute(
    `SELECT * FROM (
       SELECT ${CATCH_COLUMNS}, ROW_NUMBER() OVER (ORDER BY c.caught_at, c.id) - 1 AS position, COUNT(*) OVER () AS total
         FROM ${CATCH_FROM} WHERE ${where}
     ) t
     WHERE t.total <= ? OR MOD(t.position * (? - 1), t.total - 1) < ? - 1
     ORDER BY t.position`,
    [...params, cap, cap, cap],
  );
  return { catches: rows.map(reportCatchOf), total: rows.length ? Number(rows[0]!.total) : 0 };
}

function reportCatchOf(r: Record<string, unknown>): ReportCatch {
  const ms = instant(r.caught_at);
  return {
    catchId: String(r.id),
    eventId: String(r.event_id),
    competitionDayId: String(r.competition_day_id),
    day: String(r.day_date),
    findId: (r.find_id as string | null) ?? null,
    findName: (r.find_name as string | null) ?? null,
    caughtAtMs: ms,
    caughtAt: new Date(ms).toISOString(),
    weightLb: Number(r.weight_lb),
    lengthIn: numberOrNull(r.length_in),
    species: String(r.species) as Species,
    fate: String(r.fate) as Fate,
    lure: String(r.lure ?? ''),
    lat: numberOrNull(r.lat),
    lon: numberOrNull(r.lon),
    loggedBy: (r.logged_by as string | null) ?? null,
    localMinutes: Number(r.local_minutes),
    minutesFromSunrise: numberOrNull(r.minutes_from_sunrise),
    solunarPeriod: String(r.solunar_period),
  };
}

/** The public part of a catch (no position). */
export function reportFish(c: ReportCatch): ReportFish {
  return {
    catchId: c.catchId,
    caughtAt: c.caughtAt,
    weightLb: c.weightLb,
    lengthIn: c.lengthIn,
    species: c.species,
    fate: c.fate,
    findId: c.findId,
    findName: c.findName,
    lure: c.lure,
    day: c.day,
  };
}
