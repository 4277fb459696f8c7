import type { INestApplication } from '@nestjs/common';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { JournalEventsAppended } from '../src/journal-events/journal-events-appended.event';
import { JournalProjector } from '../src/projections/journal-projector.service';
import { EventBus } from '@nestjs/cqrs';
import { type ApiClient, makeAdmin, newUser } from './utils/api-client';
import { createTestApp } from './utils/test-app';
import {
  expectSameFigures,
  FIND_GROUPINGS,
  lakeWithEvents,
  readModelFigures,
  readModelSnapshot,
  recomputeFromJournal,
  sqlEm,
  waitForProjection,
} from './reports-support';

const KINDS = ['hard-bottom', 'vegetation', 'bait', 'contour'] as const;
const FATES = ['weighed', 'culled', 'released', 'dead'] as const;

const commandArb = fc.oneof(
  {
    weight: 3,
    arbitrary: fc.record({
      t: fc.constant('addFind' as const),
      kind: fc.constantFrom(...KINDS),
      event: fc.constantFrom(0, 1, null),
      depthFt: fc.option(fc.integer({ min: 2, max: 45 }), { nil: null }),
      hardness: fc.option(fc.integer({ min: 1, max: 5 }), { nil: null }),
      waterTempF: fc.option(fc.integer({ min: 45, max: 88 }), { nil: null }),
    }),
  },
  {
    weight: 5,
    arbitrary: fc.record({
      t: fc.constant('logCatch' as const),
      find: fc.option(fc.nat(), { nil: null, freq: 5 }),
      event: fc.constantFrom(0, 1),
      day: fc.constantFrom(0, 1),
      weightLb: fc.integer({ min: 50, max: 900 }).map((x) => x / 100),
      fate: fc.constantFrom(...FATES),
      minute: fc.integer({ min: 360, max: 1080 }),
    }),
  },
  {
    weight: 2,
    arbitrary: fc.record({
      t: fc.constant('updateCatch' as const),
      c: fc.nat(),
      weightLb: fc.option(
        fc.integer({ min: 50, max: 900 }).map((x) => x / 100),
        { nil: undefined },
      ),
      fate: fc.option(fc.constantFrom(...FATES), { nil: undefined }),
      find: fc.option(fc.option(fc.nat(), { nil: null }), { nil: undefined }),
    }),
  },
  { weight: 1, arbitrary: fc.record({ t: fc.constant('deleteCatch' as const), c: fc.nat() }) },
  {
    weight: 1,
    arbitrary: fc.record({
      t: fc.constant('updateFind' as const),
      f: fc.nat(),
      kind: fc.option(fc.constantFrom(...KINDS), { nil: undefined }),
      depthFt: fc.option(fc.integer({ min: 2, max: 45 }), { nil: undefined }),
    }),
  },
  { weight: 1, arbitrary: fc.record({ t: fc.constant('deleteFind' as const), f: fc.nat() }) },
  {
    weight: 3,
    arbitrary: fc.record({
      t: fc.constant('logStop' as const),
      find: fc.option(fc.nat(), { nil: null, freq: 6 }),
      event: fc.constantFrom(0, 1),
      day: fc.constantFrom(0, 1),
      minute: fc.integer({ min: 360, max: 1020 }),
      // 0 = still there (no leaving time yet).
      duration: fc.constantFrom(0, 15, 40, 95),
    }),
  },
  {
    weight: 1,
    arbitrary: fc.record({
      t: fc.constant('updateStop' as const),
      s: fc.nat(),
      duration: fc.constantFrom(10, 55),
      find: fc.option(fc.nat(), { nil: undefined }),
    }),
  },
  { weight: 1, arbitrary: fc.record({ t: fc.constant('deleteStop' as const), s: fc.nat() }) },
);
type Command = typeof commandArb extends fc.Arbitrary<infer T> ? T : never;

const hhmm = (minute: number) =>
  `${String(Math.floor(minute / 60)).padStart(2, '0')}:${String(minute % 60).padStart(2, '0')}`;

describe('projections: incremental = rebuild = recomputation from the journal (property-based)', () => {
  let app: INestApplication;
  let owner: ApiClient;
  let admin: ApiClient;

  beforeAll(async () => {
    app = await createTestApp();
    owner = await newUser(app, 'owner');
    admin = await newUser(app, 'admin');
    await makeAdmin(app, admin.userId);
  });
  afterAll(async () => {
    await app.close();
  });

  /** Run the commands through the real API; returns how many succeeded. */
  async function run(crewId: string, commands: Command[]): Promise<number> {
    const { lakeId, events } = await lakeWithEvents(owner, crewId);
    const finds: { id: string; version: number }[] = [];
    const catches: { id: string; version: number }[] = [];
    const stops: { id: string; version: number; minute: number }[] = [];
    const base = `/api/crews/${crewId}`;
    let ok = 0;
    for (const [i, cmd] of commands.entries()) {
      let res;
      if (cmd.t === 'addFind') {
        res = await owner.post(`${base}/finds`, {
          lakeId,
          eventId: cmd.event === null ? null : events[cmd.event]!.id,
          name: `Find ${i} "quoted" \\ it's?`,
          lat: 32.95 + i * 0.002,
          lon: -96.2 + i * 0.002,
          kind: cmd.kind,
          depthFt: cmd.depthFt,
          hardness: cmd.kind === 'hard-bottom' ? cmd.hardness : null,
          waterTempF: cmd.waterTempF,
        });
        if (res.status === 201) finds.push({ id: res.body.id, version: res.body.version });
      } else if (cmd.t === 'logCatch') {
        const ev = events[cmd.event]!;
        res = await owner.post(`${base}/catches`, {
          competitionDayId: ev.dayIds[cmd.day],
          caughtAt: hhmm(cmd.minute),
          findId: cmd.find === null || !finds.length ? null : finds[cmd.find % finds.length]!.id,
          species: 'largemouth',
          weightLb: cmd.weightLb,
          fate: cmd.fate,
        });
        if (res.status === 201) catches.push({ id: res.body.id, version: res.body.version });
      } else if (cmd.t === 'updateCatch' && catches.length) {
        const c = catches[cmd.c % catches.length]!;
        const body: Record<string, unknown> = { version: c.version };
        if (cmd.weightLb !== undefined) body.weightLb = cmd.weightLb;
        if (cmd.fate !== undefined) body.fate = cmd.fate;
        if (cmd.find !== undefined)
          body.findId = cmd.find === null || !finds.length ? null : finds[cmd.find % finds.length]!.id;
        res = await owner.patch(`${base}/catches/${c.id}`, body);
        if (res.status === 200) c.version = res.body.version;
      } else if (cmd.t === 'deleteCatch' && catches.length) {
        const [c] = catches.splice(cmd.c % catches.length, 1);
        res = await owner.delete(`${base}/catches/${c!.id}`);
      } else if (cmd.t === 'updateFind' && finds.length) {
        const f = finds[cmd.f % finds.length]!;
        res = await owner.patch(`${base}/finds/${f.id}`, {
          version: f.version,
          ...(cmd.kind ? { kind: cmd.kind, hardness: null } : {}),
          ...(cmd.depthFt ? { depthFt: cmd.depthFt } : {}),
        });
        if (res.status === 200) f.version = res.body.version;
      } else if (cmd.t === 'logStop') {
        const ev = events[cmd.event]!;
        res = await owner.post(`${base}/stops`, {
          competitionDayId: ev.dayIds[cmd.day],
          arrivedAt: hhmm(cmd.minute),
          leftAt: cmd.duration ? hhmm(cmd.minute + cmd.duration) : null,
          ...(cmd.find === null || !finds.length
            ? { findId: null, lat: 32.9, lon: -96.3 }
            : { findId: finds[cmd.find % finds.length]!.id }),
        });
        // Overlapping another stop is refused (400): that is part of the sequence too.
        if (res.status === 201) stops.push({ id: res.body.id, version: res.body.version, minute: cmd.minute });
      } else if (cmd.t === 'updateStop' && stops.length) {
        const st = stops[cmd.s % stops.length]!;
        res = await owner.patch(`${base}/stops/${st.id}`, {
          version: st.version,
          leftAt: hhmm(st.minute + cmd.duration),
          ...(cmd.find !== undefined && finds.length ? { findId: finds[cmd.find % finds.length]!.id } : {}),
        });
        if (res.status === 200) st.version = res.body.version;
      } else if (cmd.t === 'deleteStop' && stops.length) {
        const [st] = stops.splice(cmd.s % stops.length, 1);
        res = await owner.delete(`${base}/stops/${st!.id}`);
      } else if (cmd.t === 'deleteFind' && finds.length) {
        const [f] = finds.splice(cmd.f % finds.length, 1);
        res = await owner.delete(`${base}/finds/${f!.id}`);
        // Its catches and stops were detached (new versions): refresh theirs.
        for (const c of catches) {
          const got = await owner.get(`${base}/catches/${c.id}`);
          if (got.status === 200) c.version = got.body.version;
        }
        for (const st of stops) {
          const got = await owner.get(`${base}/stops/${st.id}`);
          if (got.status === 200) st.version = got.body.version;
        }
      }
      if (res && res.status < 300) ok++;
      else if (res && res.status >= 500) throw new Error(`${cmd.t}: ${res.status} ${JSON.stringify(res.body)}`);
    }
    return ok;
  }

  it('for random sequences of journal commands', async () => {
    let succeeded = 0;
    await fc.assert(
      fc.asyncProperty(fc.array(commandArb, { minLength: 3, maxLength: 14 }), async (commands) => {
        const crew = await owner.post('/api/crews', { name: 'Property Crew' });
        const crewId = crew.body.id as string;
        succeeded += await run(crewId, commands);
        await waitForProjection(app);
        const incremental = await readModelSnapshot(app, crewId);
        for (const by of FIND_GROUPINGS)
          expectSameFigures(
            await readModelFigures(app, crewId, by),
            await recomputeFromJournal(app, crewId, by),
            `incremental ${by}`,
          );

        const rebuilt = await admin.post('/api/admin/projections/rebuild');
        expect(rebuilt.status, JSON.stringify(rebuilt.body)).toBe(200);
        expect(rebuilt.body.events).toBeGreaterThan(0);
        await waitForProjection(app);
        expect(await readModelSnapshot(app, crewId)).toEqual(incremental);
      }),
      { numRuns: 8, seed: 20261220, endOnFailure: true },
    );
    expect(succeeded).toBeGreaterThan(20);
    // Eight runs of up to fourteen commands against the real database: room for a loaded machine, not a speed target.
  }, 180_000);

  it('the same event delivered twice (or a checkpoint replayed) changes nothing', async () => {
    const crew = await owner.post('/api/crews', { name: 'Replay Crew' });
    const crewId = crew.body.id as string;
    await run(crewId, [
      { t: 'addFind', kind: 'hard-bottom', event: 0, depthFt: 18, hardness: 4, waterTempF: 66 },
      { t: 'addFind', kind: 'vegetation', event: 0, depthFt: 9, hardness: null, waterTempF: 68 },
      { t: 'logCatch', find: 0, event: 0, day: 0, weightLb: 3.41, fate: 'weighed', minute: 420 },
      { t: 'logCatch', find: 1, event: 0, day: 1, weightLb: 2.2, fate: 'culled', minute: 600 },
      { t: 'updateCatch', c: 1, weightLb: 2.35, fate: 'weighed', find: undefined },
    ]);
    await waitForProjection(app);
    const before = await readModelSnapshot(app, crewId);

    // Wind the checkpoint back over the last events: they are applied a second time.
    await sqlEm(app).execute(
      "UPDATE projection_checkpoint SET last_seq = GREATEST(0, last_seq - 4) WHERE name = 'journal'",
    );
    const replay = await app.get(JournalProjector).requestCatchUp();
    expect(replay.applied).toBeGreaterThanOrEqual(4);
    // And the wake-up call delivered twice more.
    const bus = app.get(EventBus);
    bus.publish(new JournalEventsAppended(crewId, []));
    bus.publish(new JournalEventsAppended(crewId, []));
    await waitForProjection(app);
    expect(await readModelSnapshot(app, crewId)).toEqual(before);
  });
});
