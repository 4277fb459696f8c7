import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { StopView } from '@shoalbook/shared';
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
import { sqlEm, waitForProjection } from './reports-support';

describe('stops: visits on a competition day', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let other: CrewFixture;
  let base: string;
  let dayId: string;
  let day2Id: string;
  let eventId: string;
  let findA: string;
  let findB: string;
  let findPracticed: string;
  let otherCrewFind: string;

  const addFind = async (c: CrewFixture, lakeId: string, name: string, lat: number, evId: string | null = null) => {
    const res = await c.owner.post(`/api/crews/${c.crewId}/finds`, {
      lakeId,
      eventId: evId,
      name,
      lat,
      lon: TEST_LAKE.lon,
      kind: 'hard-bottom',
      depthFt: 14,
      hardness: 4,
    });
    expectOk(res, 201);
    return res.body.id as string;
  };

  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Stops Crew');
    other = await crewWithMembers(app, 'Other Crew');
    base = `/api/crews/${crew.crewId}`;
    const lake = await createLake(crew.owner, crew.crewId);
    const event = await createEvent(crew.owner, crew.crewId, lake.id);
    eventId = event.id;
    const days = await competitionDays(crew.owner, crew.crewId, event.id);
    dayId = days[0]!.id;
    day2Id = days[1]!.id;
    // Take-off 06:30, check-in 15:00 (lake time).
    expectOk(
      await crew.owner.patch(`${base}/competition-days/${dayId}`, {
        startTime: '06:30',
        checkInTime: '15:00',
        version: days[0]!.version,
      }),
    );
    findA = await addFind(crew, lake.id, 'Rock point', TEST_LAKE.lat, event.id);
    findB = await addFind(crew, lake.id, 'Channel swing', TEST_LAKE.lat + 0.01, event.id);
    findPracticed = await addFind(crew, lake.id, 'Marked, never visited', TEST_LAKE.lat + 0.02, event.id);
    const otherLake = await createLake(other.owner, other.crewId);
    otherCrewFind = await addFind(other, otherLake.id, 'Not yours', TEST_LAKE.lat);
  });
  afterAll(async () => {
    await app.close();
  });

  const stopCount = () => testEm(app).count(Stop, { crewId: crew.crewId });

  it('logs a stop in lake time, records who logged it and journals it', async () => {
    const res = await crew.angler.post(`${base}/stops`, {
      competitionDayId: dayId,
      findId: findA,
      arrivedAt: '07:00',
      leftAt: '08:15',
      waterTempF: 64,
      lure: 'jig',
      technique: 'dragging',
    });
    expectOk(res, 201);
    const stop = res.body as StopView;
    // America/Chicago is UTC−5 in April (daylight time): 07:00 local = 12:00Z.
    expect(stop.arrivedAt).toBe('2024-04-12T12:00:00.000Z');
    expect(stop.minutes).toBe(75);
    expect(stop.findName).toBe('Rock point');
    expect(stop.loggedBy).toEqual({ userId: crew.angler.userId, displayName: expect.any(String) });
    const journal = await journalOf(app, stop.id);
    expect(journal.map((j) => j.type)).toEqual(['StopLogged']);
    expect(journal[0]!.payload.loggedById).toBe(crew.angler.userId);
  });

  it('refuses bad stops with 400 naming the field, and writes nothing', async () => {
    const before = { stops: await stopCount(), journal: await journalCount(app, crew.crewId) };
    const post = (body: object) =>
      crew.angler.post(`${base}/stops`, { competitionDayId: dayId, findId: findB, ...body });
    expectFieldError(await post({ arrivedAt: '10:00', leftAt: '09:30' }), 'leftAt', /end after it starts/);
    expectFieldError(await post({ arrivedAt: '10:00', leftAt: '10:00' }), 'leftAt', /end after it starts/);
    // Overlaps the angler's 07:00–08:15 stop.
    expectFieldError(await post({ arrivedAt: '08:00', leftAt: '09:00' }), 'arrivedAt', /overlaps .* 07:00 to 08:15/);
    expectFieldError(await post({ arrivedAt: '06:45', leftAt: '09:00' }), 'arrivedAt', /overlaps/);
    // Before take-off, after check-in.
    expectFieldError(await post({ arrivedAt: '06:00', leftAt: '06:40' }), 'arrivedAt', /outside the competition day/);
    expectFieldError(await post({ arrivedAt: '14:30', leftAt: '15:30' }), 'leftAt', /outside the competition day/);
    // Another day's date given as an instant.
    expectFieldError(await post({ arrivedAt: '2024-04-13T09:00:00-05:00' }), 'arrivedAt', /outside/);
    expectFieldError(await post({ findId: otherCrewFind, arrivedAt: '11:00' }), 'findId', /No such find/);
    expectFieldError(await post({ findId: null, arrivedAt: '11:00' }), 'lat', /position/);
    const badDay = await crew.angler.post(`${base}/stops`, {
      competitionDayId: other.crewId,
      arrivedAt: '11:00',
      findId: findB,
    });
    expect(badDay.status).toBe(400);
    expect(await stopCount()).toBe(before.stops);
    expect(await journalCount(app, crew.crewId)).toBe(before.journal);
  });

  it('lets another angler of the crew be elsewhere at the same time, and viewers only read', async () => {
    const owners = await crew.owner.post(`${base}/stops`, {
      competitionDayId: dayId,
      findId: findB,
      arrivedAt: '07:30',
      leftAt: '08:00',
    });
    expectOk(owners, 201);
    const viewer = await crew.viewer.post(`${base}/stops`, {
      competitionDayId: dayId,
      findId: findB,
      arrivedAt: '12:00',
    });
    expect(viewer.status).toBe(403);
    expectOk(await crew.owner.delete(`${base}/stops/${owners.body.id}`));
  });

  it('attributes catches by time, flags one far from the find, and keeps catches when the stop is deleted', async () => {
    const open = await crew.angler.post(`${base}/stops`, {
      competitionDayId: dayId,
      findId: findB,
      arrivedAt: '09:00',
    });
    expectOk(open, 201);
    expect(open.body.leftAt).toBeNull();
    const log = async (caughtAt: string, lat?: number) => {
      const res = await crew.angler.post(`${base}/catches`, {
        competitionDayId: dayId,
        caughtAt,
        findId: findB,
        species: 'largemouth',
        weightLb: 3.2,
        fate: 'weighed',
        ...(lat !== undefined ? { lat, lon: TEST_LAKE.lon } : {}),
      });
      expectOk(res, 201);
      return res.body.id as string;
    };
    const inside = await log('09:20');
    // 0.001° of latitude ≈ 111 m (mean Earth radius 6,371,008.8 m): beyond the 50 m radius.
    const far = await log('09:40', TEST_LAKE.lat + 0.01 + 0.001);
    const left = await crew.angler.patch(`${base}/stops/${open.body.id}`, {
      leftAt: '10:30',
      version: open.body.version,
    });
    expectOk(left);
    expect(left.body.minutes).toBe(90);
    expect(left.body.catchIds).toEqual([inside, far]);
    expect(left.body.catchesToCheck.map((c: { catchId: string }) => c.catchId)).toEqual([far]);
    // Stale version.
    expect((await crew.angler.patch(`${base}/stops/${open.body.id}`, { leftAt: '10:40', version: 1 })).status).toBe(
      409,
    );
    // Leaving before arriving, on update.
    expectFieldError(
      await crew.angler.patch(`${base}/stops/${open.body.id}`, { leftAt: '08:59', version: left.body.version }),
      'leftAt',
    );

    const list = await crew.viewer.get(`${base}/stops?competitionDayId=${dayId}&limit=1`);
    expectOk(list);
    expect(list.headers['x-total-count']).toBe('2');
    expect(list.body).toHaveLength(1);

    const del = await crew.angler.delete(`${base}/stops/${open.body.id}`);
    expectOk(del);
    expect(del.body.unattachedCatchIds).toEqual([inside, far]);
    expect(del.body.message).toMatch(/2 catches are kept and now in no stop/);
    expectOk(await crew.angler.get(`${base}/catches/${inside}`));
    expect((await crew.angler.get(`${base}/stops/${open.body.id}`)).status).toBe(404);
  });

  it('counts a find with stops and no fish as fished, and a find only marked in practice as not', async () => {
    // A second stop on find B with no bite, on day 2.
    expectOk(
      await crew.angler.post(`${base}/stops`, {
        competitionDayId: day2Id,
        findId: findB,
        arrivedAt: '08:00',
        leftAt: '08:45',
      }),
      201,
    );
    await waitForProjection(app);
    const rows = (await sqlEm(app).execute(
      'SELECT find_id, practiced, fished, fish_count, stop_count, seconds_fished FROM rm_find_outcome WHERE crew_id = ? AND event_id = ?',
      [crew.crewId, eventId],
    )) as Record<string, unknown>[];
    const of = (id: string) => rows.find((r) => r.find_id === id)!;
    // Find A: one stop 07:00–08:15 and no fish — fished, 75 minutes.
    expect(of(findA)).toMatchObject({ fished: 1, fish_count: 0, stop_count: 1 });
    expect(Number(of(findA).seconds_fished)).toBe(75 * 60);
    // Find B: two catches from the deleted stop (still on the find), and the 45-minute stop on day 2.
    expect(of(findB)).toMatchObject({ fished: 1, fish_count: 2, stop_count: 1 });
    expect(Number(of(findB).seconds_fished)).toBe(45 * 60);
    // Marked in practice, never visited: in the table as a find, not fished.
    expect(of(findPracticed)).toMatchObject({ practiced: 1, fished: 0, stop_count: 0 });

    const stats = (await sqlEm(app).execute(
      "SELECT finds, finds_fished, finds_producing, seconds_fished FROM rm_group_stats WHERE crew_id = ? AND event_id = ? AND grouping = 'kind'",
      [crew.crewId, eventId],
    )) as Record<string, unknown>[];
    expect(stats).toEqual([{ finds: 3, finds_fished: 2, finds_producing: 1, seconds_fished: expect.anything() }]);
    expect(Number(stats[0]!.seconds_fished)).toBe(120 * 60);
  });

  it('times the fish per hour by clock band over every stop, split at the band edges', async () => {
    // A stop at no find, 10:30–11:30 on day 2 (half morning, half midday from 11:00), with a fish at 11:10.
    const noFind = await crew.angler.post(`${base}/stops`, {
      competitionDayId: day2Id,
      findId: null,
      lat: TEST_LAKE.lat + 0.03,
      lon: TEST_LAKE.lon,
      arrivedAt: '10:30',
      leftAt: '11:30',
    });
    expectOk(noFind, 201);
    expectOk(
      await crew.angler.post(`${base}/catches`, {
        competitionDayId: day2Id,
        caughtAt: '11:10',
        species: 'largemouth',
        weightLb: 2.5,
        fate: 'weighed',
      }),
      201,
    );
    await waitForProjection(app);
    const view = (await crew.viewer.get(`${base}/reports/hit-rates?by=timeOfDay&eventId=${eventId}`)).body as {
      groups: { key: string; fishCount: number; secondsFished: number; fishPerHour: number | null }[];
      overall: { fishCount: number; secondsFished: number; fishPerHour: number | null };
    };
    const band = (key: string) => view.groups.find((g) => g.key === key)!;
    // Stops: find A 07:00–08:15 (day 1), find B 08:00–08:45 (day 2), no find 10:30–11:30 (day 2).
    // Early (before 08:00): 60 min, no fish — a row of its own, 0 fish per hour.
    expect(band('early')).toMatchObject({ fishCount: 0, secondsFished: 3600, fishPerHour: 0 });
    // Morning: 15 + 45 + 30 min = 90 min; the two fish of 09:20 and 09:40 on day 1.
    expect(band('morning')).toMatchObject({ fishCount: 2, secondsFished: 5400 });
    expect(band('morning').fishPerHour).toBeCloseTo(2 / 1.5, 10);
    // Midday: 30 min and the fish of 11:10.
    expect(band('midday')).toMatchObject({ fishCount: 1, secondsFished: 1800, fishPerHour: 2 });
    // The headline is the sum of the rows.
    expect(view.overall).toMatchObject({ fishCount: 3, secondsFished: 10_800, fishPerHour: 1 });
  });
});
