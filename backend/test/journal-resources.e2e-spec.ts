import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CatchView, FindView } from '@shoalbook/shared';
import { Catch } from '../src/catches/catch.entity';
import { Lake } from '../src/lakes/lake.entity';
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
} from './journal-fixtures';

describe('journal resources: CRUD, validation, versions and the journal_event rows', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let base: string;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Resources Crew');
    base = `/api/crews/${crew.crewId}`;
  });
  afterAll(async () => {
    await app.close();
  });

  describe('lakes', () => {
    it('creates, reads, lists, updates with the version and deletes, journaling each change', async () => {
      const lake = await createLake(crew.angler, crew.crewId, { areaAcres: 21400, notes: 'test lake' });
      expect(lake).toMatchObject({
        name: 'Lake Marrowind',
        timeZone: 'America/Chicago',
        lat: 32.95,
        lon: -96.2,
        areaAcres: 21400,
        version: 1,
      });
      const got = await crew.viewer.get(`${base}/lakes/${lake.id}`);
      expectOk(got);
      expect(got.body).toEqual(lake);
      const list = await crew.viewer.get(`${base}/lakes`);
      expect(list.body.map((l: { id: string }) => l.id)).toContain(lake.id);

      const patched = await crew.owner.patch(`${base}/lakes/${lake.id}`, { name: 'Lake Marrowind North', version: 1 });
      expectOk(patched);
      expect(patched.body).toMatchObject({ name: 'Lake Marrowind North', version: 2 });

      const stale = await crew.angler.patch(`${base}/lakes/${lake.id}`, { name: 'Lost edit', version: 1 });
      expect(stale.status).toBe(409);
      expect(stale.body.code).toBe('stale_version');
      expect((await testEm(app).findOneOrFail(Lake, { id: lake.id })).name).toBe('Lake Marrowind North');

      const del = await crew.owner.delete(`${base}/lakes/${lake.id}`);
      expect(del.status).toBe(204);
      expect((await crew.owner.get(`${base}/lakes/${lake.id}`)).status).toBe(404);

      const events = await journalOf(app, lake.id);
      expect(events.map((e) => e.type)).toEqual(['LakeCreated', 'LakeUpdated', 'LakeDeleted']);
      expect(events[1]!.payload).toMatchObject({
        id: lake.id,
        crewId: crew.crewId,
        name: 'Lake Marrowind North',
        version: 2,
        timeZone: 'America/Chicago',
      });
      expect(events[2]!.payload).toEqual({ id: lake.id });
      expect(events.every((e) => e.crewId === crew.crewId && e.actorId)).toBe(true);
    });

    it('refuses out-of-range coordinates, an unknown time zone and unknown fields, writing nothing', async () => {
      const before = await testEm(app).count(Lake, { crewId: crew.crewId });
      expectFieldError(
        await crew.angler.post(`${base}/lakes`, { name: 'X', timeZone: 'America/Chicago', lat: 91, lon: 0 }),
        'lat',
      );
      expectFieldError(
        await crew.angler.post(`${base}/lakes`, { name: 'X', timeZone: 'America/Chicago', lat: 0, lon: -181 }),
        'lon',
      );
      expectFieldError(
        await crew.angler.post(`${base}/lakes`, { name: 'X', timeZone: 'Mars/Olympus', lat: 0, lon: 0 }),
        'timeZone',
        /IANA/,
      );
      expectFieldError(
        await crew.angler.post(`${base}/lakes`, { name: 'X', timeZone: 'UTC', lat: 0, lon: 0, depthOfLake: 3 }),
        'depthOfLake',
        /not accepted/,
      );
      expectFieldError(
        await crew.angler.patch(`${base}/lakes/${(await createLake(crew.angler, crew.crewId)).id}`, {
          name: 'no version',
        }),
        'version',
      );
      expect(await testEm(app).count(Lake, { crewId: crew.crewId })).toBe(before + 1);
    });

    it('refuses to delete a lake that has events (409 in_use)', async () => {
      const lake = await createLake(crew.angler, crew.crewId);
      await createEvent(crew.angler, crew.crewId, lake.id);
      const res = await crew.owner.delete(`${base}/lakes/${lake.id}`);
      expect(res.status).toBe(409);
      expect(res.body.code).toBe('in_use');
    });
  });

  describe('events and their days', () => {
    it('creates the practice and competition days from the dates, with default rules (common practice: a team event, 5 fish, 12 in)', async () => {
      const lake = await createLake(crew.angler, crew.crewId);
      const event = await createEvent(crew.angler, crew.crewId, lake.id);
      expect(event.rules).toEqual({
        fishPerDay: 5,
        minLengthIn: 12,
        deadFishPenaltyLb: 0.25,
        shortFishPenaltyLb: 1,
        latePenaltyLbPerMinute: 1,
        format: 'team',
      });
      const practice = await crew.viewer.get(`${base}/events/${event.id}/practice-days`);
      expect(practice.body.map((d: { date: string }) => d.date)).toEqual(['2024-04-10', '2024-04-11']);
      const days = await competitionDays(crew.viewer, crew.crewId, event.id);
      expect(days.map((d) => d.date)).toEqual(['2024-04-12', '2024-04-13']);

      const listed = await crew.viewer.get(`${base}/events?lakeId=${lake.id}`);
      expect(listed.body).toHaveLength(1);

      const patched = await crew.angler.patch(`${base}/events/${event.id}`, {
        competitionDates: ['2024-04-12', '2024-04-14'],
        rules: { fishPerDay: 3 },
        version: 1,
      });
      expectOk(patched);
      expect(patched.body).toMatchObject({
        competitionDates: ['2024-04-12', '2024-04-14'],
        rules: { fishPerDay: 3, minLengthIn: 12 },
        version: 2,
      });
      expect((await competitionDays(crew.viewer, crew.crewId, event.id)).map((d) => d.date)).toEqual([
        '2024-04-12',
        '2024-04-14',
      ]);

      const day = (await competitionDays(crew.viewer, crew.crewId, event.id))[0]!;
      const dayPatch = await crew.angler.patch(`${base}/competition-days/${day.id}`, {
        startTime: '06:30',
        checkInTime: '15:00',
        waterTemp: { value: 18.5, unit: 'C' },
        version: day.version,
      });
      expectOk(dayPatch);
      expect(dayPatch.body).toMatchObject({
        startTime: '06:30',
        checkInTime: '15:00',
        entered: { waterTemp: { value: 18.5, unit: 'C' } },
      });
      expect(dayPatch.body.waterTempF).toBeCloseTo(65.3, 10); // 18.5 × 9/5 + 32 (NIST SP 811)
      expectFieldError(
        await crew.angler.patch(`${base}/competition-days/${day.id}`, { startTime: '25:00', version: 2 }),
        'startTime',
      );

      const created = (await journalOf(app, event.id))[0]!;
      expect(created.type).toBe('EventCreated');
      expect((created.payload.competitionDays as unknown[]).length).toBe(2);
    });

    it('keeps the launch ramp of an event (both coordinates), clears it with null and refuses half or out-of-range ones, writing nothing', async () => {
      const lake = await createLake(crew.angler, crew.crewId);
      const event = await createEvent(crew.angler, crew.crewId, lake.id);
      expect(event.ramp).toBeNull();
      const set = await crew.angler.patch(`${base}/events/${event.id}`, {
        ramp: { lat: 33.2104, lon: -96.0987 },
        version: event.version,
      });
      expectOk(set);
      expect(set.body.ramp).toEqual({ lat: 33.2104, lon: -96.0987 });
      expect((await crew.viewer.get(`${base}/events/${event.id}`)).body.ramp).toEqual({ lat: 33.2104, lon: -96.0987 });

      const before = await journalCount(app, crew.crewId);
      expectFieldError(
        await crew.angler.patch(`${base}/events/${event.id}`, { ramp: { lat: 33.2 }, version: set.body.version }),
        'ramp.lon',
      );
      expectFieldError(
        await crew.angler.patch(`${base}/events/${event.id}`, {
          ramp: { lat: 95, lon: -96.1 },
          version: set.body.version,
        }),
        'ramp.lat',
        /within -90 to 90/,
      );
      expectFieldError(
        await crew.angler.patch(`${base}/events/${event.id}`, { ramp: 'the north ramp', version: set.body.version }),
        'ramp',
      );
      expect(await journalCount(app, crew.crewId)).toBe(before);
      expect((await crew.viewer.get(`${base}/events/${event.id}`)).body.ramp).toEqual({ lat: 33.2104, lon: -96.0987 });

      const cleared = await crew.angler.patch(`${base}/events/${event.id}`, { ramp: null, version: set.body.version });
      expectOk(cleared);
      expect(cleared.body.ramp).toBeNull();
      const created = await crew.angler.post(`${base}/events`, {
        lakeId: lake.id,
        name: 'With a ramp',
        competitionDates: ['2024-05-02'],
        ramp: { lat: 33.2, lon: -96.1 },
      });
      expectOk(created, 201);
      expect(created.body.ramp).toEqual({ lat: 33.2, lon: -96.1 });
    });

    it('refuses impossible dates, a date both practice and competition, and another crew’s lake', async () => {
      const lake = await createLake(crew.angler, crew.crewId);
      expectFieldError(
        await crew.angler.post(`${base}/events`, { lakeId: lake.id, name: 'E', competitionDates: ['2023-02-29'] }),
        'competitionDates',
      );
      expectFieldError(
        await crew.angler.post(`${base}/events`, {
          lakeId: lake.id,
          name: 'E',
          practiceDates: ['2024-05-01'],
          competitionDates: ['2024-05-01'],
        }),
        'practiceDates',
      );
      const other = await crewWithMembers(app, 'Other Crew');
      const theirLake = await createLake(other.owner, other.crewId);
      const res = await crew.angler.post(`${base}/events`, {
        lakeId: theirLake.id,
        name: 'E',
        competitionDates: ['2024-05-01'],
      });
      expectFieldError(res, 'lakeId', /No such lake in this crew/);
    });
  });

  describe('finds and catches', () => {
    it('adds, reads, updates and deletes a find; units kept as typed; sky context in the lake time zone', async () => {
      const lake = await createLake(crew.angler, crew.crewId);
      const event = await createEvent(crew.angler, crew.crewId, lake.id);
      const res = await crew.angler.post(`${base}/finds`, {
        lakeId: lake.id,
        eventId: event.id,
        name: 'Shell hump',
        markedAt: '2024-04-10T15:20:00Z',
        lat: 32.951,
        lon: -96.201,
        depth: { value: 4.2, unit: 'm' },
        kind: 'hard-bottom',
        subKind: 'shell',
        hardness: 4,
        baitSeen: true,
        fishMarked: 3,
        frequencyKhz: 240,
        foundHow: 'on-plane',
      });
      expectOk(res, 201);
      const find = res.body as FindView;
      expect(find).toMatchObject({
        practiceDate: '2024-04-10',
        kind: 'hard-bottom',
        subKind: 'shell',
        hardness: 4,
        entered: { depth: { value: 4.2, unit: 'm' }, waterTemp: null },
        source: 'form',
        version: 1,
      });
      expect(find.depthFt).toBeCloseTo(4.2 / 0.3048, 12);
      expect(find.sky).toMatchObject({
        date: '2024-04-10',
        sunrise: expect.any(String),
        moonPhase: expect.any(Number),
      });

      expectFieldError(
        await crew.angler.post(`${base}/finds`, { lakeId: lake.id, name: 'x', lat: -91, lon: 0, kind: 'bait' }),
        'lat',
      );
      expectFieldError(
        await crew.angler.post(`${base}/finds`, {
          lakeId: lake.id,
          name: 'x',
          lat: 1,
          lon: 0,
          kind: 'bait',
          subKind: 'hydrilla',
        }),
        'subKind',
      );
      expectFieldError(
        await crew.angler.post(`${base}/finds`, {
          lakeId: lake.id,
          name: 'x',
          lat: 1,
          lon: 0,
          kind: 'bait',
          depthFt: -3,
        }),
        'depthFt',
      );
      // Any sonar frequency from 20 to 3000 kHz is taken (FREQUENCY_KHZ); a value in Hz typed for kHz is not.
      expectFieldError(
        await crew.angler.post(`${base}/finds`, {
          lakeId: lake.id,
          name: 'x',
          lat: 1,
          lon: 0,
          kind: 'bait',
          frequencyKhz: 15,
        }),
        'frequencyKhz',
      );
      expectFieldError(
        await crew.angler.post(`${base}/finds`, {
          lakeId: lake.id,
          name: 'x',
          lat: 1,
          lon: 0,
          kind: 'bait',
          frequencyKhz: 50_000,
        }),
        'frequencyKhz',
      );
      expectFieldError(
        await crew.angler.post(`${base}/finds`, {
          lakeId: lake.id,
          eventId: event.id,
          practiceDate: '2024-04-12',
          name: 'x',
          lat: 1,
          lon: 0,
          kind: 'bait',
        }),
        'practiceDate',
      );

      const upd = await crew.angler.patch(`${base}/finds/${find.id}`, {
        hardness: 5,
        notes: 'sharp double echo',
        version: 1,
      });
      expectOk(upd);
      expect(upd.body).toMatchObject({ hardness: 5, version: 2 });
      expect((await crew.angler.patch(`${base}/finds/${find.id}`, { hardness: 2, version: 1 })).body.code).toBe(
        'stale_version',
      );

      const del = await crew.owner.delete(`${base}/finds/${find.id}`);
      expect(del.status).toBe(204);
      expect((await journalOf(app, find.id)).map((e) => e.type)).toEqual(['FindAdded', 'FindUpdated', 'FindDeleted']);
    });

    it('logs a catch with entered units kept exactly, flags an implausible weight, and refuses bad values', async () => {
      const lake = await createLake(crew.angler, crew.crewId);
      const event = await createEvent(crew.angler, crew.crewId, lake.id);
      const [day] = await competitionDays(crew.angler, crew.crewId, event.id);
      const post = (body: object) =>
        crew.angler.post(`${base}/catches`, {
          competitionDayId: day!.id,
          species: 'largemouth',
          fate: 'weighed',
          ...body,
        });

      const lbOz = await post({
        caughtAt: '07:45',
        weight: { value: 3, unit: 'lb-oz', ounces: 4 },
        length: { value: 457.2, unit: 'mm' },
      });
      expectOk(lbOz, 201);
      const c1 = lbOz.body as CatchView;
      expect(c1.weightLb).toBe(3.25); // 3 lb + 4 oz / 16 (avoirdupois)
      expect(c1.entered).toMatchObject({
        weight: { value: 3, unit: 'lb-oz', ounces: 4 },
        length: { value: 457.2, unit: 'mm' },
      });
      expect(c1.lengthIn).toBeCloseTo(18, 12); // 457.2 mm / 25.4
      expect(c1.caughtAt).toBe('2024-04-12T12:45:00.000Z'); // 07:45 CDT = UTC−5
      expect(c1.weightFlagged).toBe(false);
      expect(c1.sky?.date).toBe('2024-04-12');

      const kg = await post({
        caughtAt: '2024-04-12T09:10:00-05:00',
        weight: { value: 1.42, unit: 'kg' },
        lengthIn: 17,
      });
      expectOk(kg, 201);
      expect(kg.body.entered.weight).toEqual({ value: 1.42, unit: 'kg' });
      expect(kg.body.weightLb).toBeCloseTo(1.42 / 0.45359237, 12);
      const reread = await crew.viewer.get(`${base}/catches/${kg.body.id}`);
      expect(reread.body.entered.weight.value).toBe(1.42);

      // A 12-inch largemouth of 9 lb: relative weight far above 150, accepted but flagged.
      const odd = await post({ caughtAt: '10:00', weightLb: 9, lengthIn: 12 });
      expectOk(odd, 201);
      expect(odd.body.weightFlagged).toBe(true);

      expectFieldError(await post({ caughtAt: 'quarter to eight', weightLb: 2 }), 'caughtAt', /HH:MM/);
      expectFieldError(
        await post({ caughtAt: '2024-04-13T14:00:00Z', weightLb: 2 }),
        'caughtAt',
        /not on the competition day 2024-04-12/,
      );
      expectFieldError(await post({ caughtAt: '08:00', weightLb: -1 }), 'weightLb');
      expectFieldError(await post({ caughtAt: '08:00', weightLb: 0 }), 'weightLb');
      expectFieldError(await post({ caughtAt: '08:00', weight: { value: 30, unit: 'kg' } }), 'weight', /at most 25 lb/);
      expectFieldError(await post({ caughtAt: '08:00', weightLb: 3, lengthIn: 40.5 }), 'lengthIn');
      expectFieldError(await post({ caughtAt: '08:00', weightLb: 3, length: { value: 0, unit: 'mm' } }), 'length');
      expectFieldError(await post({ caughtAt: '08:00', weightLb: 3, colour: 'green' }), 'colour');
      // An array where a measurement object belongs (once a 500, found by the request-body fuzzer).
      expectFieldError(await post({ caughtAt: '08:00', weight: [] }), 'weight', /object/);
      expectFieldError(await post({ caughtAt: '08:00', weightLb: 3, depth: [] }), 'depth', /object/);

      const upd = await crew.angler.patch(`${base}/catches/${c1.id}`, { fate: 'culled', version: 1 });
      expectOk(upd);
      expect(upd.body).toMatchObject({ fate: 'culled', version: 2, weightLb: 3.25 });
      expect((await crew.angler.delete(`${base}/catches/${c1.id}`)).status).toBe(204);
      expect((await journalOf(app, c1.id)).map((e) => e.type)).toEqual(['CatchLogged', 'CatchUpdated', 'CatchDeleted']);
    });

    it('takes a catch only between the day’s start and check-in on the lake clock, both ends included', async () => {
      const lake = await createLake(crew.angler, crew.crewId);
      const event = await createEvent(crew.angler, crew.crewId, lake.id);
      const [day] = await competitionDays(crew.angler, crew.crewId, event.id);
      const post = (caughtAt: string) =>
        crew.angler.post(`${base}/catches`, {
          competitionDayId: day!.id,
          caughtAt,
          species: 'spotted',
          weightLb: 2.1,
          fate: 'weighed',
        });
      const count = () => testEm(app).count(Catch, { competitionDayId: day!.id });

      // Before the day has times, only the date bounds a catch.
      const dawn = await post('05:10');
      expectOk(dawn, 201);
      const setTimes = (times: object) =>
        crew.angler.patch(`${base}/competition-days/${day!.id}`, { ...times, version: day!.version });
      // A window must run forwards, and must still hold the catches already logged: the 05:10 fish comes first.
      expectFieldError(
        await setTimes({ startTime: '15:00', checkInTime: '06:30' }),
        'checkInTime',
        /must come after the start \(15:00\)/,
      );
      expectFieldError(
        await setTimes({ startTime: '06:30', checkInTime: '15:00' }),
        'startTime',
        /1 catch\(es\) logged on this day fall outside the new window \(at 05:10, lake time\)/,
      );
      expect((await competitionDays(crew.viewer, crew.crewId, event.id))[0]).toMatchObject({
        startTime: null,
        checkInTime: null,
        version: day!.version,
      });
      expectOk(await crew.angler.patch(`${base}/catches/${dawn.body.id}`, { caughtAt: '06:45', version: 1 }));
      expectOk(await setTimes({ startTime: '06:30', checkInTime: '15:00' }), 200);

      const atStart = await post('06:30');
      expectOk(atStart, 201);
      expect(atStart.body.caughtAt).toBe('2024-04-12T11:30:00.000Z'); // 06:30 CDT = UTC−5 (IANA tz database)
      expectOk(await post('15:00'), 201);
      expectOk(await post('2024-04-12T14:59:59-05:00'), 201);

      const before = await count();
      const journalBefore = await journalCount(app, crew.crewId);
      const window =
        'Catches on 2024-04-12 count from the 06:30 start to the 15:00 check-in (lake time, America/Chicago)';
      const early = await post('06:29');
      expectFieldError(early, 'caughtAt');
      expect(early.body.fieldErrors.caughtAt).toEqual([`${window}; 06:29 is before the start.`]);
      expect(early.body.message).toMatch(/caughtAt/);
      expectFieldError(await post('15:01'), 'caughtAt', /15:01 is after check-in/);
      // An instant is read on the lake clock: 11:29 UTC is 06:29 in Chicago, 20:00:01 UTC is 15:00:01.
      expectFieldError(await post('2024-04-12T11:29:00Z'), 'caughtAt', /06:29 is before the start/);
      expectFieldError(await post('2024-04-12T20:00:01Z'), 'caughtAt', /15:00:01 is after check-in/);
      expect(await count()).toBe(before);
      expect(await journalCount(app, crew.crewId)).toBe(journalBefore);

      // Moving a catch out of the window is refused too, and leaves it as it was.
      const moved = await crew.angler.patch(`${base}/catches/${atStart.body.id}`, {
        caughtAt: '06:00',
        fate: 'released',
        version: 1,
      });
      expectFieldError(moved, 'caughtAt', /06:00 is before the start/);
      const kept = await crew.viewer.get(`${base}/catches/${atStart.body.id}`);
      expect(kept.body).toMatchObject({ caughtAt: '2024-04-12T11:30:00.000Z', fate: 'weighed', version: 1 });
      // A change that leaves the time alone goes through.
      expectOk(await crew.angler.patch(`${base}/catches/${dawn.body.id}`, { fate: 'released', version: 2 }));
    });
  });
});
