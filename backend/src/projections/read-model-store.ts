import type { EntityManager } from '@mikro-orm/mariadb';
import { countBagStates } from './bag-states';
import {
  CATCH_GROUPINGS,
  type CatchGroupSums,
  type CatchSums,
  deriveGroupStats,
  outcomesFromSums,
  stopGroupSeconds,
  type StopSums,
} from './derive';
import { catchTiming, UTC_PLACE } from './catch-timing';
import type { JournalRecord } from './journal-record';
import type { ProjectionState, StateTable } from './projection-state';
import type { EventRow, OutcomeRow } from './rows';
import { fromDb, inList, insertChunks, rowKey, sqlString, type TableSpec } from './sql-values';
import {
  CATCH_TABLE,
  DAY_TABLE,
  EVENT_TABLE,
  FIND_TABLE,
  GROUP_STATS_TABLE,
  LAKE_TABLE,
  OUTCOME_TABLE,
  STOP_TABLE,
} from './tables';

type Row = Record<string, unknown>;

const str = (v: unknown): string | null => (typeof v === 'string' && v ? v : null);
const instant = (v: unknown): number | null =>
  v === null || v === undefined
    ? null
    : v instanceof Date
      ? v.getTime()
      : Date.parse(`${String(v).replace(' ', 'T')}Z`);

/** The same sums as derive.ts sumCatches, in SQL (integer micro-pounds: exact in any order); weighed = counted in the bag. */
const SUM_COLUMNS =
  'COUNT(*) AS fish_count, SUM(bag_counted) AS weighed_count, SUM(weight_ulb) AS weight_ulb, SUM(IF(bag_counted, weight_ulb, 0)) AS weighed_weight_ulb';
const sumsOf = (r: Row) => ({
  fishCount: Number(r.fish_count),
  weighedCount: Number(r.weighed_count),
  weightUlb: Number(r.weight_ulb),
  weighedWeightUlb: Number(r.weighed_weight_ulb),
});

/** `SELECT * FROM table WHERE …` as projector rows. */
async function select<R>(tx: EntityManager, spec: TableSpec<R>, where: string): Promise<R[]> {
  if (where === 'FALSE') return [];
  const cols = spec.columns.map((c) => `\`${c.column}\``).join(', ');
  const rows: Row[] = await tx.execute(`SELECT ${cols} FROM \`${spec.table}\` WHERE ${where}`);
  return rows.map((r) => fromDb(spec, r));
}

/** Write a state table's changes: delete the removed ids, upsert the rest. */
async function writeChanges<R extends { id: string }>(
  tx: EntityManager,
  spec: TableSpec<R>,
  table: StateTable<R>,
): Promise<void> {
  const { upserts, deletes } = table.changes();
  if (deletes.length) await tx.execute(`DELETE FROM \`${spec.table}\` WHERE ${inList('id', deletes)}`);
  for (const sql of insertChunks(spec, upserts, true)) await tx.execute(sql);
}

/**
 * Loads, for one incremental batch, the read-model rows the batch's events touch; and writes back what applying
 * them changed, then recomputes the dirty finds' outcomes from rm_catch_fact and the dirty events' group
 * statistics from rm_find_outcome and rm_catch_fact, all inside the caller's transaction.
 */
export class ReadModelStore {
  constructor(private readonly tx: EntityManager) {}

  async preload(state: ProjectionState, batch: readonly JournalRecord[]): Promise<void> {
    const lakeIds = new Set<string>();
    const retimedLakes = new Set<string>();
    const eventIds = new Set<string>();
    const eventsWithDays = new Set<string>();
    const dayIds = new Set<string>();
    const findIds = new Set<string>();
    const catchIds = new Set<string>();
    const stopIds = new Set<string>();
    for (const e of batch) {
      const p = e.payload ?? {};
      if (e.aggregateType === 'lake') {
        lakeIds.add(e.aggregateId);
        if (e.type === 'LakeUpdated') retimedLakes.add(e.aggregateId);
      } else if (e.aggregateType === 'event') {
        eventIds.add(e.aggregateId);
        eventsWithDays.add(e.aggregateId);
      } else if (e.aggregateType === 'find') {
        findIds.add(e.aggregateId);
        for (const f of Array.isArray(p.finds) ? (p.finds as Row[]) : [p]) {
          if (str(f.id)) findIds.add(f.id as string);
          if (str(f.eventId)) eventIds.add(f.eventId as string);
        }
      } else if (e.aggregateType === 'catch') {
        catchIds.add(e.aggregateId);
        for (const c of Array.isArray(p.catches) ? (p.catches as Row[]) : [p]) {
          if (str(c.id)) catchIds.add(c.id as string);
          if (str(c.eventId)) eventIds.add(c.eventId as string);
          if (str(c.competitionDayId)) dayIds.add(c.competitionDayId as string);
        }
      } else if (e.aggregateType === 'stop') {
        stopIds.add(e.aggregateId);
        if (str(p.eventId)) eventIds.add(p.eventId as string);
      } else if (e.aggregateType === 'weighIn') {
        if (str(p.competitionDayId)) dayIds.add(p.competitionDayId as string);
      }
    }
    const tx = this.tx;
    const catches = [
      ...(await select(tx, CATCH_TABLE, inList('id', catchIds))),
      ...(await select(tx, CATCH_TABLE, inList('lake_id', retimedLakes))),
    ];
    for (const c of catches) {
      state.catches.load(c.id, c);
      eventIds.add(c.eventId);
    }
    for (const s of await select(tx, STOP_TABLE, inList('id', stopIds))) {
      state.stops.load(s.id, s);
      eventIds.add(s.eventId);
    }
    for (const f of await select(tx, FIND_TABLE, inList('id', findIds))) state.finds.load(f.id, f);
    const events = await select(tx, EVENT_TABLE, inList('id', eventIds));
    for (const ev of events) {
      state.events.load(ev.id, ev);
      lakeIds.add(ev.lakeId);
    }
    const dayWhere = [inList('id', dayIds), inList('event_id', eventsWithDays)].filter((w) => w !== 'FALSE');
    for (const d of await select(tx, DAY_TABLE, dayWhere.length ? dayWhere.join(' OR ') : 'FALSE'))
      state.days.load(d.id, d);
    for (const l of await select(tx, LAKE_TABLE, inList('id', lakeIds))) state.lakes.load(l.id, l);
  }

  async write(state: ProjectionState): Promise<void> {
    const tx = this.tx;
    await writeChanges(tx, LAKE_TABLE, state.lakes);
    await writeChanges(tx, EVENT_TABLE, state.events);
    await writeChanges(tx, DAY_TABLE, state.days);
    await writeChanges(tx, FIND_TABLE, state.finds);
    await writeChanges(tx, CATCH_TABLE, state.catches);
    await writeChanges(tx, STOP_TABLE, state.stops);
    await countDirtyDays(tx, state);

    const dirtyFinds = [...state.dirtyFinds];
    const dirtyEvents = new Set(state.dirtyEvents);
    if (dirtyFinds.length) {
      const before = await select(tx, OUTCOME_TABLE, inList('find_id', dirtyFinds));
      const missing = dirtyFinds.filter((id) => !state.finds.rows.has(id) && !state.finds.changed.has(id));
      for (const f of await select(tx, FIND_TABLE, inList('id', missing))) state.finds.load(f.id, f);
      // Sums per (find, event) straight from SQL: a find with thousands of catches costs one small result.
      const sumRows: Row[] = await tx.execute(
        `SELECT find_id, event_id, ${SUM_COLUMNS}, MIN(caught_at) AS first_bite FROM rm_catch_fact WHERE ${inList('find_id', dirtyFinds)} GROUP BY find_id, event_id`,
      );
      const sums = new Map<string, Map<string, CatchSums>>();
      for (const r of sumRows) {
        const findId = String(r.find_id);
        if (!sums.has(findId)) sums.set(findId, new Map());
        sums.get(findId)!.set(String(r.event_id), { ...sumsOf(r), firstBiteAtMs: instant(r.first_bite) });
      }
      const stopRows: Row[] = await tx.execute(
        `SELECT find_id, event_id, COUNT(*) AS stop_count, SUM(seconds) AS seconds_fished FROM rm_stop WHERE ${inList('find_id', dirtyFinds)} GROUP BY find_id, event_id`,
      );
      const stopSums = new Map<string, Map<string, StopSums>>();
      for (const r of stopRows) {
        const findId = String(r.find_id);
        if (!stopSums.has(findId)) stopSums.set(findId, new Map());
        stopSums
          .get(findId)!
          .set(String(r.event_id), { stopCount: Number(r.stop_count), secondsFished: Number(r.seconds_fished) });
      }
      const outcomes: OutcomeRow[] = dirtyFinds.flatMap((id) =>
        outcomesFromSums(state.finds.get(id), sums.get(id) ?? new Map(), stopSums.get(id) ?? new Map()),
      );
      // Only events whose outcome rows changed need their statistics again: a catch logged on a find changes
      // the find's outcome in the catch's event, not in the other events the find was fished in.
      for (const eventId of eventsWithChangedRows(OUTCOME_TABLE, before, outcomes)) dirtyEvents.add(eventId);
      await tx.execute(`DELETE FROM rm_find_outcome WHERE ${inList('find_id', dirtyFinds)}`);
      for (const sql of insertChunks(OUTCOME_TABLE, outcomes)) await tx.execute(sql);
    }

    const events = [...dirtyEvents];
    if (events.length) {
      const missing = events.filter((id) => !state.events.rows.has(id) && !state.events.changed.has(id));
      for (const ev of await select(tx, EVENT_TABLE, inList('id', missing))) state.events.load(ev.id, ev);
      // By crew and event, the (crew_id, event_id) index's order; events no longer present have no statistics.
      const present = events.map((id) => state.events.get(id)).filter((ev) => ev !== undefined);
      const outcomes = await select(tx, OUTCOME_TABLE, eventsOfCrews(present));
      const groupRows: Row[] = await tx.execute(
        CATCH_GROUPINGS.map(
          (
            g,
          ) => `SELECT event_id, '${g}' AS grouping_name, \`${g === 'solunarPeriod' ? 'solunar_period' : 'time_of_day'}\` AS group_key, ${SUM_COLUMNS}
                    FROM rm_catch_fact WHERE ${inList('event_id', events)} GROUP BY event_id, group_key`,
        ).join(' UNION ALL '),
      );
      const catchesByEvent = groupBy(
        groupRows.map((r) => ({
          eventId: String(r.event_id),
          grouping: String(r.grouping_name) as CatchGroupSums['grouping'],
          key: String(r.group_key),
          ...sumsOf(r),
          firstBiteAtMs: null,
        })),
        (c) => c.eventId,
      );
      const outcomesByEvent = groupBy(outcomes, (o) => o.eventId);
      // The stops (already written above) and lakes of the events: their time by period and band.
      const stopsByEvent = groupBy(await select(tx, STOP_TABLE, eventsOfCrews(present)), (s) => s.eventId);
      const lakeIds = [...new Set(present.map((ev) => ev.lakeId))].filter((id) => !state.lakes.get(id));
      for (const l of await select(tx, LAKE_TABLE, inList('id', lakeIds))) state.lakes.load(l.id, l);
      const stats = events.flatMap((id) => {
        const ev = state.events.get(id);
        const place = (ev && state.lakes.get(ev.lakeId)) ?? UTC_PLACE;
        return deriveGroupStats(
          ev,
          outcomesByEvent.get(id) ?? [],
          catchesByEvent.get(id) ?? [],
          stopGroupSeconds(stopsByEvent.get(id) ?? [], place, catchTiming),
        );
      });
      await tx.execute(`DELETE FROM rm_group_stats WHERE ${inList('event_id', events)}`);
      for (const sql of insertChunks(GROUP_STATS_TABLE, stats)) await tx.execute(sql);
    }
  }
}

/** Counts the bags of the batch's dirty days again and writes the catches whose state changed. */
export async function countDirtyDays(tx: EntityManager, state: ProjectionState): Promise<void> {
  const days = [...state.dirtyDays];
  if (!days.length) return;
  const catches = await select(tx, CATCH_TABLE, inList('competition_day_id', days));
  const missing = [...new Set(catches.map((c) => c.eventId))].filter((id) => !state.events.rows.has(id));
  for (const ev of await select(tx, EVENT_TABLE, inList('id', missing))) state.events.load(ev.id, ev);
  const changed = countBagStates(catches, (id) => state.events.get(id)?.rules);
  // A fish counted or dropped changes its find's outcome and its event's statistics.
  for (const c of changed) {
    if (c.findId) state.dirtyFinds.add(c.findId);
    state.dirtyEvents.add(c.eventId);
  }
  for (const sql of insertChunks(CATCH_TABLE, changed, true)) await tx.execute(sql);
}

/** `(crew_id = … AND event_id IN (…)) OR …` for some events; `FALSE` for none. */
function eventsOfCrews(events: readonly EventRow[]): string {
  const perCrew = [...groupBy(events, (ev) => ev.crewId)].map(
    ([crewId, evs]) =>
      `(crew_id = ${sqlString(crewId)} AND ${inList(
        'event_id',
        evs.map((ev) => ev.id),
      )})`,
  );
  return perCrew.join(' OR ') || 'FALSE';
}

/** The events of the rows that differ between two sets of outcome rows (added, removed or changed). */
export function eventsWithChangedRows<R extends { eventId: string }>(
  spec: TableSpec<R>,
  before: readonly R[],
  after: readonly R[],
): Set<string> {
  const same = (a: R, b: R) => spec.columns.every((c) => a[c.prop] === b[c.prop]);
  const old = new Map(before.map((r) => [rowKey(spec, r), r]));
  const changed = new Set<string>();
  for (const r of after) {
    const key = rowKey(spec, r);
    const o = old.get(key);
    old.delete(key);
    if (!o || !same(o, r)) changed.add(r.eventId);
  }
  for (const r of old.values()) changed.add(r.eventId);
  return changed;
}

/** Rows grouped by a key, in input order. */
export function groupBy<T>(rows: Iterable<T>, key: (row: T) => string | null): Map<string, T[]> {
  const out = new Map<string, T[]>();
  for (const row of rows) {
    const k = key(row);
    if (k === null) continue;
    let list = out.get(k);
    if (!list) out.set(k, (list = []));
    list.push(row);
  }
  return out;
}
