import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Catch } from '../src/catches/catch.entity';
import { Find } from '../src/finds/find.entity';
import { Stop } from '../src/stops/stop.entity';
import { crewWithMembers, type CrewFixture } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';
import {
  competitionDays,
  createEvent,
  createLake,
  expectFieldError,
  expectOk,
  journalCount,
  journalOf,
  TEST_LAKE,
} from './journal-fixtures';

describe('finds in bulk: set the kind or event of many, delete many', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let other: CrewFixture;
  let base: string;
  let lakeId: string;
  let otherLakeId: string;
  let eventId: string;

  const addFind = async (lake: string, name: string, i: number, extra: object = {}) => {
    const res = await crew.angler.post(`${base}/finds`, {
      lakeId: lake,
      name,
      lat: TEST_LAKE.lat + i * 0.001,
      lon: TEST_LAKE.lon,
      kind: 'other',
      ...extra,
    });
    expectOk(res, 201);
    return res.body.id as string;
  };

  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Bulk Crew');
    other = await crewWithMembers(app, 'Bulk Rival');
    base = `/api/crews/${crew.crewId}`;
    lakeId = (await createLake(crew.angler, crew.crewId)).id;
    otherLakeId = (await createLake(crew.angler, crew.crewId, { name: 'Second Lake' })).id;
    eventId = (await createEvent(crew.angler, crew.crewId, lakeId)).id;
  });
  afterAll(async () => {
    await app.close();
  });

  it('sets kind, sub-kind and event of many finds in one go, each journaled, practice day from the marking date', async () => {
    const ids = await Promise.all(
      ['One', 'Two', 'Three'].map((n, i) =>
        // 2024-04-10 is the first practice day of the test event (lake time, America/Chicago).
        addFind(lakeId, n, i, { markedAt: '2024-04-10T15:00:00Z', subKind: '' }),
      ),
    );
    const before = await journalCount(app, crew.crewId);
    const res = await crew.angler.post(`${base}/finds/bulk-update`, {
      findIds: ids,
      kind: 'hard-bottom',
      subKind: 'gravel',
      eventId,
    });
    expectOk(res);
    expect(res.body).toEqual({ updated: 3 });
    const rows = await testEm(app).find(Find, { id: { $in: ids } });
    for (const f of rows) expect(f).toMatchObject({ kind: 'hard-bottom', subKind: 'gravel', eventId, version: 2 });
    expect(rows.every((f) => f.practiceDayId !== null)).toBe(true);
    expect(await journalCount(app, crew.crewId)).toBe(before + 3);
    expect((await journalOf(app, ids[0]!)).map((e) => e.type)).toEqual(['FindAdded', 'FindUpdated']);

    // The kind alone keeps a sub-kind that still fits and drops one that does not.
    expectOk(await crew.angler.post(`${base}/finds/bulk-update`, { findIds: ids, kind: 'vegetation' }));
    expect((await testEm(app).find(Find, { id: { $in: ids } })).map((f) => f.subKind)).toEqual(['', '', '']);
    // The event taken away: no event, no practice day.
    expectOk(await crew.angler.post(`${base}/finds/bulk-update`, { findIds: ids, eventId: null }));
    for (const f of await testEm(app).find(Find, { id: { $in: ids } }))
      expect(f).toMatchObject({ eventId: null, practiceDayId: null });
  });

  it('refuses the whole request, naming the field, when one find is not the crew’s or the change does not fit', async () => {
    const mine = await addFind(lakeId, 'Mine', 10);
    const elsewhere = await addFind(otherLakeId, 'Elsewhere', 11);
    const otherLake = await createLake(other.owner, other.crewId);
    const theirs = await other.owner.post(`/api/crews/${other.crewId}/finds`, {
      lakeId: otherLake.id,
      name: 'Theirs',
      lat: TEST_LAKE.lat,
      lon: TEST_LAKE.lon,
      kind: 'other',
    });
    expectOk(theirs, 201);
    const before = await journalCount(app, crew.crewId);
    const post = (body: object) => crew.angler.post(`${base}/finds/bulk-update`, body);
    expectFieldError(
      await post({ findIds: [mine, theirs.body.id], kind: 'bait' }),
      'findIds',
      /1 of the 2 finds are not in this crew/,
    );
    expectFieldError(
      await post({ findIds: [mine, elsewhere], eventId }),
      'eventId',
      /1 of the finds are on another lake/,
    );
    expectFieldError(
      await post({ findIds: [mine], kind: 'bait', subKind: 'rock' }),
      'subKind',
      /not a sub-kind of bait/,
    );
    expectFieldError(await post({ findIds: [mine], subKind: 'rock' }), 'subKind', /together with its kind/);
    expectFieldError(await post({ findIds: [mine] }), 'kind', /Say what to set/);
    expectFieldError(await post({ findIds: [], kind: 'bait' }), 'findIds');
    expectFieldError(await post({ findIds: [mine, mine], kind: 'bait' }), 'findIds');
    expectFieldError(await post({ findIds: ['not-a-uuid'], kind: 'bait' }), 'findIds');
    expect((await crew.viewer.post(`${base}/finds/bulk-update`, { findIds: [mine], kind: 'bait' })).status).toBe(403);
    expect((await testEm(app).findOneOrFail(Find, { id: mine })).kind).toBe('other');
    expect(await journalCount(app, crew.crewId)).toBe(before);
  });

  it('deletes many finds at once; their catches and stops stay, with no find', async () => {
    const lake = await createLake(crew.angler, crew.crewId, { name: 'Emptied Lake' });
    const event = await createEvent(crew.angler, crew.crewId, lake.id, { name: 'Emptied Open' });
    const [day] = await competitionDays(crew.angler, crew.crewId, event.id);
    const ids: string[] = [];
    for (let i = 0; i < 30; i++) ids.push(await addFind(lake.id, `Waypoint ${i + 1}`, i));
    const fish = await crew.angler.post(`${base}/catches`, {
      competitionDayId: day!.id,
      caughtAt: '08:00',
      species: 'largemouth',
      weightLb: 3.1,
      fate: 'weighed',
      findId: ids[0],
    });
    expectOk(fish, 201);
    const stop = await crew.angler.post(`${base}/stops`, {
      competitionDayId: day!.id,
      findId: ids[1],
      arrivedAt: '09:00',
    });
    expectOk(stop, 201);

    const refused = await crew.angler.delete(`${base}/lakes/${lake.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.message).toMatch(/30 find\(s\).*deletes many at once/);

    const res = await crew.angler.post(`${base}/finds/bulk-delete`, { findIds: ids });
    expectOk(res);
    expect(res.body).toEqual({ deleted: 30, catchesUnattached: 1, stopsUnattached: 1 });
    expect(await testEm(app).count(Find, { lakeId: lake.id })).toBe(0);
    expect(await testEm(app).findOneOrFail(Catch, { id: fish.body.id })).toMatchObject({ findId: null, weightLb: 3.1 });
    const kept = await testEm(app).findOneOrFail(Stop, { id: stop.body.id });
    expect(kept).toMatchObject({ findId: null, lat: TEST_LAKE.lat + 0.001, lon: TEST_LAKE.lon });
    expect((await journalOf(app, ids[29]!)).map((e) => e.type)).toEqual(['FindAdded', 'FindDeleted']);

    // A second try names the finds that are gone, and deletes nothing.
    const survivor = await addFind(lake.id, 'Survivor', 40);
    expectFieldError(
      await crew.angler.post(`${base}/finds/bulk-delete`, { findIds: [survivor, ids[0]] }),
      'findIds',
      /1 of the 2 finds are not in this crew/,
    );
    expect(await testEm(app).count(Find, { id: survivor })).toBe(1);
  });
});
