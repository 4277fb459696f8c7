import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Catch } from '../src/catches/catch.entity';
import { crewWithMembers, type CrewFixture } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';
import { competitionDays, createEvent, createLake, expectOk } from './journal-fixtures';

describe('journal privacy: crews, viewers and positions', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let rival: CrewFixture;
  let base: string;
  let lakeId: string;
  let eventId: string;
  let dayId: string;
  let findId: string;
  let rivalFindId: string;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Private Crew');
    rival = await crewWithMembers(app, 'Rival Crew');
    base = `/api/crews/${crew.crewId}`;
    lakeId = (await createLake(crew.angler, crew.crewId)).id;
    eventId = (await createEvent(crew.angler, crew.crewId, lakeId)).id;
    dayId = (await competitionDays(crew.angler, crew.crewId, eventId))[0]!.id;
    const find = await crew.angler.post(`${base}/finds`, {
      lakeId,
      name: 'Secret shell',
      lat: 32.91,
      lon: -96.21,
      kind: 'hard-bottom',
      subKind: 'shell',
    });
    findId = find.body.id;
    const rivalLake = await createLake(rival.owner, rival.crewId);
    // The rival's find sits on the very same coordinates: attribution must still never pick it.
    const rf = await rival.owner.post(`/api/crews/${rival.crewId}/finds`, {
      lakeId: rivalLake.id,
      name: 'Their spot',
      lat: 32.95,
      lon: -96.2,
      kind: 'bait',
    });
    rivalFindId = rf.body.id;
  });
  afterAll(async () => {
    await app.close();
  });

  it("refuses to attach another crew's find to a catch, without telling it exists", async () => {
    const before = await testEm(app).count(Catch, { crewId: crew.crewId });
    const res = await crew.angler.post(`${base}/catches`, {
      competitionDayId: dayId,
      caughtAt: '08:00',
      findId: rivalFindId,
      species: 'largemouth',
      weightLb: 3,
      fate: 'weighed',
    });
    const unknown = await crew.angler.post(`${base}/catches`, {
      competitionDayId: dayId,
      caughtAt: '08:00',
      findId: '6f1c2a4e-8b0d-4c3e-9a51-2b7e4d9c0f13',
      species: 'largemouth',
      weightLb: 3,
      fate: 'weighed',
    });
    expect(res.status).toBe(400);
    expect(res.body.fieldErrors).toEqual({ findId: ['No such find on this lake in this crew.'] });
    expect(unknown.body.fieldErrors).toEqual(res.body.fieldErrors);
    expect(JSON.stringify(res.body)).not.toContain('Their spot');
    const byCoords = await crew.angler.post(`${base}/catches`, {
      competitionDayId: dayId,
      caughtAt: '08:05',
      lat: 32.95,
      lon: -96.2,
      species: 'largemouth',
      weightLb: 3,
      fate: 'weighed',
    });
    expectOk(byCoords, 201);
    expect(byCoords.body.findId).toBeNull();
    expect(await testEm(app).count(Catch, { crewId: crew.crewId })).toBe(before + 1);
  });

  it("answers 404 for another crew's records by id, and for a non-member on any journal route", async () => {
    expect((await crew.angler.get(`${base}/finds/${rivalFindId}`)).status).toBe(404);
    expect((await crew.angler.patch(`${base}/finds/${rivalFindId}`, { name: 'mine now', version: 1 })).status).toBe(
      404,
    );
    expect((await crew.angler.delete(`${base}/finds/${rivalFindId}`)).status).toBe(404);
    const outsider = await rival.owner.get(`${base}/finds`);
    expect(outsider.status).toBe(404);
    expect(outsider.body.message).toBe('No such crew.');
    expect((await rival.owner.get(`${base}/export.json`)).status).toBe(404);
    expect((await crew.angler.get(`${base}/finds/not-a-uuid`)).status).toBe(404);
  });

  it('gives viewers 403 on every kind of write', async () => {
    const writes = [
      crew.viewer.post(`${base}/lakes`, { name: 'V', timeZone: 'UTC', lat: 0, lon: 0 }),
      crew.viewer.post(`${base}/events`, { lakeId, name: 'V', competitionDates: ['2024-06-01'] }),
      crew.viewer.post(`${base}/finds`, { lakeId, name: 'V', lat: 0, lon: 0, kind: 'other' }),
      crew.viewer.patch(`${base}/finds/${findId}`, { name: 'V', version: 1 }),
      crew.viewer.post(`${base}/catches`, {
        competitionDayId: dayId,
        caughtAt: '08:00',
        species: 'largemouth',
        weightLb: 3,
        fate: 'weighed',
      }),
      crew.viewer.send('put', `${base}/competition-days/${dayId}/weigh-in`, { officialLb: 10 }),
      crew.viewer.delete(`${base}/finds/${findId}`),
    ];
    for (const res of await Promise.all(writes)) {
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('forbidden');
    }
  });

  it('hides positions from viewers unless the crew allows them, and refuses viewers the exports', async () => {
    const hidden = await crew.viewer.get(`${base}/finds/${findId}`);
    expect(hidden.body).toMatchObject({ name: 'Secret shell', kind: 'hard-bottom', lat: null, lon: null });
    const list = await crew.viewer.get(`${base}/finds`);
    expect(list.body.every((f: { lat: unknown; lon: unknown }) => f.lat === null && f.lon === null)).toBe(true);
    const catches = await crew.viewer.get(`${base}/catches?eventId=${eventId}`);
    expect(catches.body.length).toBeGreaterThan(0);
    expect(catches.body.every((c: { lat: unknown }) => c.lat === null)).toBe(true);
    expect(JSON.stringify(list.body)).not.toContain('32.91');
    expect((await crew.viewer.get(`${base}/export.json`)).status).toBe(403);
    expect((await crew.viewer.get(`${base}/export.csv`)).status).toBe(403);

    expectOk(await crew.owner.patch(`${base}`, { viewersSeePositions: true }));
    const shown = await crew.viewer.get(`${base}/finds/${findId}`);
    expect(shown.body).toMatchObject({ lat: 32.91, lon: -96.21 });
    expect((await crew.viewer.get(`${base}/export.json`)).status).toBe(403);
    expectOk(await crew.owner.patch(`${base}`, { viewersSeePositions: false }));
    expect((await crew.angler.get(`${base}/finds/${findId}`)).body.lat).toBe(32.91);
  });
});
