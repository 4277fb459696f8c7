import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RecordChange } from '@shoalbook/shared';
import {
  addMember,
  ApiClient,
  crewWithMembers,
  GOOD_PASSWORD,
  uniqueEmail,
  type CrewFixture,
} from './utils/api-client';
import { JournalEvent } from '../src/journal-events/journal-event.entity';
import { createTestApp, testEm } from './utils/test-app';
import { competitionDays, createEvent, createLake, expectOk } from './journal-fixtures';

describe("a record's history: every change to a weight, a length or a weigh-in figure stays in the journal", () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let other: CrewFixture;
  let dana: ApiClient;
  let ray: ApiClient;
  let base: string;
  let dayId: string;

  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'History Crew');
    other = await crewWithMembers(app, 'Other Crew');
    // Two anglers of the same boat under their own (invented) names.
    dana = await new ApiClient(app).signUp(uniqueEmail('dana'), GOOD_PASSWORD, 'Dana Whitlock');
    ray = await new ApiClient(app).signUp(uniqueEmail('ray'), GOOD_PASSWORD, 'Ray Okafor');
    await addMember(app, crew.crewId, dana.userId, 'angler');
    await addMember(app, crew.crewId, ray.userId, 'angler');
    base = `/api/crews/${crew.crewId}`;
    const lake = await createLake(crew.owner, crew.crewId);
    const event = await createEvent(crew.owner, crew.crewId, lake.id);
    dayId = (await competitionDays(crew.owner, crew.crewId, event.id))[0]!.id;
  });
  afterAll(async () => {
    await app.close();
  });

  it("lists a catch's weight and length as logged, then each change with who made it and when", async () => {
    const logged = await dana.post(`${base}/catches`, {
      competitionDayId: dayId,
      caughtAt: '07:42',
      species: 'largemouth',
      weightLb: 3.45,
      fate: 'weighed',
    });
    expectOk(logged, 201);
    const id = logged.body.id as string;
    expectOk(await ray.patch(`${base}/catches/${id}`, { weightLb: 3.54, version: 1 }));
    expectOk(await ray.patch(`${base}/catches/${id}`, { lure: 'football jig', version: 2 })); // no figure changed
    expectOk(await dana.patch(`${base}/catches/${id}`, { lengthIn: 17.25, version: 3 }));

    const res = await crew.viewer.get(`${base}/catches/${id}/history`);
    expectOk(res);
    const changes = res.body as RecordChange[];
    expect(changes.map(({ field, from, to, byName, first }) => ({ field, from, to, byName, first }))).toEqual([
      { field: 'weightLb', from: null, to: 3.45, byName: 'Dana Whitlock', first: true },
      { field: 'weightLb', from: 3.45, to: 3.54, byName: 'Ray Okafor', first: false },
      { field: 'lengthIn', from: null, to: 17.25, byName: 'Dana Whitlock', first: false },
    ]);
    // Each entry carries the journal row's own time: the history is read from the journal, not kept beside it.
    const rows = await testEm(app).find(JournalEvent, { aggregateId: id }, { orderBy: { seq: 'asc' } });
    expect(rows).toHaveLength(4);
    expect(changes.map((c) => c.at)).toEqual([0, 1, 3].map((i) => rows[i]!.occurredAt.toISOString()));

    // A deleted catch keeps its history; the record itself is gone.
    expect((await dana.delete(`${base}/catches/${id}`)).status).toBe(204);
    expect((await crew.viewer.get(`${base}/catches/${id}`)).status).toBe(404);
    expect(((await crew.viewer.get(`${base}/catches/${id}/history`)).body as RecordChange[]).length).toBe(3);
  });

  it("keeps every change to a day's official figures, and shows none before the first recording", async () => {
    const none = await crew.viewer.get(`${base}/competition-days/${dayId}/weigh-in/history`);
    expectOk(none);
    expect(none.body).toEqual([]);

    const path = `${base}/competition-days/${dayId}/weigh-in`;
    expectOk(await dana.send('put', path, { grossLb: 17.75, officialLb: 17.75, dayPlace: 30 }));
    expectOk(await ray.send('put', path, { grossLb: 17.62, officialLb: 17.62, dayPlace: 26, version: 1 }));

    const res = await crew.viewer.get(`${base}/competition-days/${dayId}/weigh-in/history`);
    expectOk(res);
    expect(
      (res.body as RecordChange[]).map(({ field, from, to, byName, first }) => ({ field, from, to, byName, first })),
    ).toEqual([
      { field: 'grossLb', from: null, to: 17.75, byName: 'Dana Whitlock', first: true },
      { field: 'officialLb', from: null, to: 17.75, byName: 'Dana Whitlock', first: true },
      { field: 'dayPlace', from: null, to: 30, byName: 'Dana Whitlock', first: true },
      { field: 'grossLb', from: 17.75, to: 17.62, byName: 'Ray Okafor', first: false },
      { field: 'officialLb', from: 17.75, to: 17.62, byName: 'Ray Okafor', first: false },
      { field: 'dayPlace', from: 30, to: 26, byName: 'Ray Okafor', first: false },
    ]);
    // A refused figure writes nothing, so it adds nothing to the history.
    expect((await dana.send('put', path, { officialLb: '18,500', version: 2 })).status).toBe(400);
    expect(((await crew.viewer.get(`${base}/competition-days/${dayId}/weigh-in/history`)).body as []).length).toBe(6);
  });

  it("answers 404 for another crew's catch or day, and to a non-member, as for any record", async () => {
    const logged = await crew.angler.post(`${base}/catches`, {
      competitionDayId: dayId,
      caughtAt: '08:10',
      species: 'spotted',
      weightLb: 2.1,
      fate: 'released',
    });
    expectOk(logged, 201);
    const id = logged.body.id as string;
    const otherBase = `/api/crews/${other.crewId}`;
    // A member of another crew, asking through their own crew for this crew's records.
    expect((await other.owner.get(`${otherBase}/catches/${id}/history`)).status).toBe(404);
    expect((await other.owner.get(`${otherBase}/competition-days/${dayId}/weigh-in/history`)).status).toBe(404);
    // … and through this crew's address, of which they are no member.
    expect((await other.owner.get(`${base}/catches/${id}/history`)).status).toBe(404);
    expect((await other.owner.get(`${base}/competition-days/${dayId}/weigh-in/history`)).status).toBe(404);
    expect((await crew.viewer.get(`${base}/catches/not-an-id/history`)).status).toBe(404);
  });
});
