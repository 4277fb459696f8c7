import type { EntityManager } from '@mikro-orm/mariadb';
import type { ReportEventRef, ReportFilters, Season } from '@shoalbook/shared';
import type { EventRules, FieldContext } from '@shoalbook/shared';
import { isTrue, numberOrNull } from './row-values';

/** An event as the report queries read it from rm_event. */
export interface ReportEvent extends ReportEventRef {
  lakeId: string;
  practiceDates: string[];
  competitionDates: string[];
  rules: EventRules;
  finalPlace: number | null;
  field: FieldContext;
  /** Stops are logged on its competition days (the time-fished figures mean something). */
  stopsRecorded: boolean;
}

const json = <T>(v: unknown): T => (typeof v === 'string' ? (JSON.parse(v) as T) : (v as T));
/** Rules projected before the format existed read as a team event. */
const withFormat = (rules: EventRules): EventRules => ({ ...rules, format: rules.format ?? 'team' });

/** Each report filter and the condition it puts on rm_event (alias e). */
const FILTER_CONDITIONS: readonly [keyof ReportFilters, string][] = [
  ['lakeId', 'e.lake_id = ?'],
  ['eventId', 'e.id = ?'],
  ['season', 'e.season = ?'],
  ['year', 'e.year = ?'],
  ['from', 'e.first_date >= ?'],
  ['to', 'e.first_date <= ?'],
];

/** SQL (on rm_event alias e): the event has at least one stop (rm_stop). */
export const STOPS_RECORDED = 'EXISTS (SELECT 1 FROM rm_stop st WHERE st.crew_id = e.crew_id AND st.event_id = e.id)';

/** `WHERE …` on rm_event (alias e) for the crew and the filters, with its parameters. */
export function eventWhere(crewId: string, f: ReportFilters): { sql: string; params: unknown[] } {
  const set = FILTER_CONDITIONS.filter(([key]) => f[key]);
  return {
    sql: ['e.crew_id = ?', ...set.map(([, condition]) => condition)].join(' AND '),
    params: [crewId, ...set.map(([key]) => f[key])],
  };
}

/** The crew's events matching the filters, oldest first. */
export async function selectEvents(
  em: EntityManager,
  crewId: string,
  f: ReportFilters,
  extra: { ids?: string[] } = {},
): Promise<ReportEvent[]> {
  const where = eventWhere(crewId, f);
  let sql = `SELECT e.id, e.lake_id, e.name, e.first_date, e.season, e.year, e.practice_dates, e.competition_dates, e.rules, e.final_place, e.field_size, e.winning_lb, e.cut_lb,
         ${STOPS_RECORDED} AS stops_recorded,
         EXISTS (SELECT 1 FROM rm_catch_fact c WHERE c.crew_id = e.crew_id AND c.event_id = e.id) AS has_catches
    FROM rm_event e WHERE ${where.sql}`;
  const params = [...where.params];
  if (extra.ids) {
    if (!extra.ids.length) return [];
    sql += ` AND e.id IN (${extra.ids.map(() => '?').join(',')})`;
    params.push(...extra.ids);
  }
  sql += ' ORDER BY e.first_date IS NULL, e.first_date, e.name';
  const rows: Record<string, unknown>[] = await em.execute(sql, params);
  return rows.map((r) => ({
    id: String(r.id),
    lakeId: String(r.lake_id),
    name: String(r.name),
    firstDate: (r.first_date as string | null) ?? null,
    season: (r.season as Season | null) ?? null,
    year: numberOrNull(r.year),
    practiceDates: json<string[]>(r.practice_dates),
    competitionDates: json<string[]>(r.competition_dates),
    rules: withFormat(json<EventRules>(r.rules)),
    finalPlace: numberOrNull(r.final_place),
    field: {
      fieldSize: numberOrNull(r.field_size),
      winningLb: numberOrNull(r.winning_lb),
      cutLb: numberOrNull(r.cut_lb),
    },
    stopsRecorded: isTrue(r.stops_recorded),
    // Logged before stops existed: catches, and not one stop.
    derivedFromCatches: isTrue(r.has_catches) && !isTrue(r.stops_recorded),
  }));
}

export interface ReportLake {
  id: string;
  name: string;
  timeZone: string;
  lat: number;
  lon: number;
}

export async function findLake(em: EntityManager, crewId: string, lakeId: string): Promise<ReportLake | null> {
  const rows: Record<string, unknown>[] = await em.execute(
    'SELECT id, name, time_zone, lat, lon FROM rm_lake WHERE crew_id = ? AND id = ?',
    [crewId, lakeId],
  );
  const r = rows[0];
  return r
    ? { id: String(r.id), name: String(r.name), timeZone: String(r.time_zone), lat: Number(r.lat), lon: Number(r.lon) }
    : null;
}

/** "?,?,?" for an IN list. */
export const placeholders = (n: number) => new Array(n).fill('?').join(',');
