// Helpers of the read-model and report e2e tests (not a test file itself).
import type { INestApplication } from '@nestjs/common';
import { expect } from 'vitest';
import { daySummary, type FindInput, hitRates } from '@shoalbook/analytics';
import { Catch } from '../src/catches/catch.entity';
import { TournamentEvent } from '../src/events/tournament-event.entity';
import { Find } from '../src/finds/find.entity';
import { READ_MODEL_TABLES } from '../src/read-models';
import { Stop } from '../src/stops/stop.entity';
import type { ApiClient } from './utils/api-client';
import type { EntityManager } from '@mikro-orm/mariadb';
import { testEm } from './utils/test-app';

/** A fresh SQL EntityManager for raw reads of the read model. */
export const sqlEm = (app: INestApplication) => testEm(app) as unknown as EntityManager;

/** Wait until the projector has applied every journal event (its checkpoint reaches the last seq). Usable in hooks. */
export async function waitForProjection(app: INestApplication, timeout = 15_000): Promise<void> {
  const until = Date.now() + timeout;
  for (;;) {
    const em = sqlEm(app);
    const [j] = (await em.execute('SELECT COALESCE(MAX(seq), 0) AS m FROM journal_event')) as { m: unknown }[];
    const [c] = (await em.execute(
      "SELECT COALESCE(MAX(last_seq), 0) AS m FROM projection_checkpoint WHERE name = 'journal'",
    )) as { m: unknown }[];
    if (Number(c?.m) >= Number(j?.m)) return;
    if (Date.now() > until)
      throw new Error(
        `the projection did not catch up within ${timeout} ms (checkpoint ${Number(c?.m)}, journal ${Number(j?.m)})`,
      );
    await new Promise((r) => setTimeout(r, 50));
  }
}

const KEYS: Record<string, string> = {
  rm_lake: 'id',
  rm_event: 'id',
  rm_competition_day: 'id',
  rm_find: 'id',
  rm_catch_fact: 'id',
  rm_stop: 'id',
  rm_find_outcome: 'find_id, event_id',
  rm_group_stats: 'event_id, grouping, group_key',
};

/** Every read-model row of a crew, table by table, in key order (values normalised for comparison). */
export async function readModelSnapshot(app: INestApplication, crewId: string): Promise<Record<string, unknown[]>> {
  const em = sqlEm(app);
  const out: Record<string, unknown[]> = {};
  for (const table of READ_MODEL_TABLES) {
    const rows = (await em.execute(`SELECT * FROM \`${table}\` WHERE crew_id = ? ORDER BY ${KEYS[table]}`, [
      crewId,
    ])) as Record<string, unknown>[];
    out[table] = rows.map((r) =>
      Object.fromEntries(
        Object.entries(r).map(([k, v]) => [
          k,
          typeof v === 'bigint'
            ? Number(v)
            : v instanceof Date
              ? v.toISOString()
              : typeof v === 'string' && /^[[{]/.test(v)
                ? JSON.parse(v)
                : v,
        ]),
      ),
    );
  }
  return out;
}

export const FIND_GROUPINGS = ['kind', 'subKind', 'depthBand', 'hardness', 'temperatureBand'] as const;

export interface GroupFigures {
  finds: number;
  findsFished: number;
  findsProducing: number;
  findsWeighed: number;
  fishCount: number;
  weightLb: number;
}

/**
 * The reference: hit rates recomputed from the raw journal tables (finds, catches, stops) with @shoalbook/analytics
 * hitRates. One analytics find per (find, event) it was marked in, stopped at or caught on; fished when it has a
 * stop or a catch in that event (a practice mark alone is not fishing it).
 */
export async function recomputeFromJournal(
  app: INestApplication,
  crewId: string,
  by: (typeof FIND_GROUPINGS)[number],
  eventIds?: string[],
): Promise<Map<string, GroupFigures>> {
  const em = testEm(app);
  const finds = await em.find(Find, { crewId });
  const catches = (await em.find(Catch, { crewId })).filter((c) => !eventIds || eventIds.includes(c.eventId));
  const stops = await em.find(Stop, { crewId });
  const pairs = new Map<string, FindInput>();
  const addPair = (f: Find, eventId: string, fished: boolean) => {
    if (eventIds && !eventIds.includes(eventId)) return;
    const id = `${f.id}|${eventId}`;
    pairs.set(id, {
      id,
      kind: f.kind,
      subKind: f.subKind || null,
      depthFt: f.depthFt,
      hardness: f.hardness,
      waterTempF: f.waterTempF,
      fished: fished || (pairs.get(id)?.fished ?? false),
    });
  };
  // "Weighed" is the counted bag of each day, by the event's rules (analytics daySummary, the one bag rule).
  const events = new Map((await em.find(TournamentEvent, { crewId })).map((e) => [e.id, e]));
  const counted = new Set<string>();
  const byDay = new Map<string, Catch[]>();
  for (const c of catches) byDay.set(c.competitionDayId, [...(byDay.get(c.competitionDayId) ?? []), c]);
  for (const list of byDay.values()) {
    const e = events.get(list[0]!.eventId)!;
    list.sort((a, b) => a.caughtAt.getTime() - b.caughtAt.getTime() || (a.id < b.id ? -1 : 1));
    const day = daySummary(
      list.map((c) => ({ id: c.id, weightLb: c.weightLb, lengthIn: c.lengthIn, fate: c.fate, anglerId: c.loggedBy })),
      { ...e, format: e.format },
    );
    for (const id of day.counted) counted.add(String(id));
  }
  const byId = new Map(finds.map((f) => [f.id, f]));
  for (const f of finds) if (f.eventId) addPair(f, f.eventId, false);
  for (const s of stops) if (s.findId && byId.has(s.findId)) addPair(byId.get(s.findId)!, s.eventId, true);
  for (const c of catches) if (c.findId && byId.has(c.findId)) addPair(byId.get(c.findId)!, c.eventId, true);
  const groups = hitRates(
    [...pairs.values()],
    catches.map((c) => ({
      id: c.id,
      findId: c.findId ? `${c.findId}|${c.eventId}` : null,
      weightLb: c.weightLb,
      fate: counted.has(c.id) ? ('weighed' as const) : ('released' as const),
    })),
    { by },
  );
  return new Map(
    groups.map((g) => [
      g.key === null ? '' : String(g.key),
      {
        finds: g.finds,
        findsFished: g.findsFished,
        findsProducing: g.findsWithFish,
        findsWeighed: g.findsWithWeighedFish,
        fishCount: g.fish,
        weightLb: g.fishWeightLb,
      },
    ]),
  );
}

/** rm_group_stats of a crew summed over events, per key of one grouping. */
export async function readModelFigures(
  app: INestApplication,
  crewId: string,
  grouping: string,
): Promise<Map<string, GroupFigures>> {
  const rows = (await sqlEm(app).execute(
    `SELECT group_key, SUM(finds) f, SUM(finds_fished) ff, SUM(finds_producing) fp, SUM(finds_weighed) fw, SUM(fish_count) fc, SUM(weight_ulb) w
       FROM rm_group_stats WHERE crew_id = ? AND grouping = ? GROUP BY group_key`,
    [crewId, grouping],
  )) as Record<string, unknown>[];
  return new Map(
    rows.map((r) => [
      String(r.group_key),
      {
        finds: Number(r.f),
        findsFished: Number(r.ff),
        findsProducing: Number(r.fp),
        findsWeighed: Number(r.fw),
        fishCount: Number(r.fc),
        weightLb: Number(r.w) / 1e6,
      },
    ]),
  );
}

/** Compare two sets of figures: counts exactly, weights to the micro-pound rounding of the read model. */
export function expectSameFigures(
  actual: Map<string, GroupFigures>,
  expected: Map<string, GroupFigures>,
  what: string,
): void {
  expect([...actual.keys()].sort(), what).toEqual([...expected.keys()].sort());
  for (const [key, e] of expected) {
    const a = actual.get(key)!;
    const { weightLb: wa, ...ca } = a;
    const { weightLb: we, ...ce } = e;
    expect(ca, `${what} ${key}`).toEqual(ce);
    expect(Math.abs(wa - we), `${what} ${key} weight`).toBeLessThan(1e-5 * Math.max(1, e.fishCount));
  }
}

/** A lake with two events, as the crew's owner. */
export async function lakeWithEvents(
  client: ApiClient,
  crewId: string,
): Promise<{ lakeId: string; events: { id: string; dayIds: string[]; dates: string[] }[] }> {
  const post = async (path: string, body: object) => {
    const res = await client.post(`/api/crews/${crewId}${path}`, body);
    if (res.status !== 201) throw new Error(`${path}: ${res.status} ${JSON.stringify(res.body)}`);
    return res.body as { id: string };
  };
  const lake = await post('/lakes', {
    name: 'Lake Quillmere',
    region: 'Test County',
    timeZone: 'America/Chicago',
    lat: 32.95,
    lon: -96.2,
  });
  const events = [];
  for (const [name, practice, competition] of [
    ['Fall Shootout', ['2025-10-09'], ['2025-10-10', '2025-10-11']],
    ['Fall Classic', ['2026-10-08'], ['2026-10-09', '2026-10-10']],
  ] as const) {
    const ev = await post('/events', { lakeId: lake.id, name, practiceDates: practice, competitionDates: competition });
    const days = await client.get(`/api/crews/${crewId}/events/${ev.id}/competition-days`);
    const list = (days.body as { id: string; date: string }[]).sort((a, b) => a.date.localeCompare(b.date));
    events.push({ id: ev.id, dayIds: list.map((d) => d.id), dates: list.map((d) => d.date) });
  }
  return { lakeId: lake.id, events };
}
