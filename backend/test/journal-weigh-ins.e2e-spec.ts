import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { EventRecapView, EventView, LakeComparisonView, WeighInsView } from '@shoalbook/shared';
import { waitForProjection } from './reports-support';
import { crewWithMembers, type CrewFixture } from './utils/api-client';
import { JournalEvent } from '../src/journal-events/journal-event.entity';
import { createTestApp, testEm } from './utils/test-app';
import { competitionDays, createEvent, createLake, expectOk, journalOf } from './journal-fixtures';

describe('weigh-ins: the counted bag under the event rules, and the official override', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Weigh-in Crew');
  });
  afterAll(async () => {
    await app.close();
  });

  it('counts the five heaviest legal fish of a day with seven catches, a short fish and a dead fish', async () => {
    const base = `/api/crews/${crew.crewId}`;
    const lake = await createLake(crew.angler, crew.crewId);
    // Rules (common practice, stated per event): 5 fish, 12 in minimum, 0.25 lb per dead fish counted, 1 lb per short fish.
    const event = await createEvent(crew.angler, crew.crewId, lake.id, {
      rules: { fishPerDay: 5, minLengthIn: 12, deadFishPenaltyLb: 0.25, shortFishPenaltyLb: 1 },
    });
    const [day1, day2] = await competitionDays(crew.angler, crew.crewId, event.id);
    const fish = [
      { t: '07:00', w: 4.1, l: 19, fate: 'weighed' },
      { t: '07:40', w: 3.6, l: 18, fate: 'weighed' },
      { t: '08:20', w: 2.2, l: 15, fate: 'culled' },
      { t: '09:00', w: 3.0, l: 17, fate: 'dead' },
      { t: '09:30', w: 2.9, l: 11.5, fate: 'weighed' }, // short: never counted, costs 1 lb
      { t: '10:15', w: 2.8, l: 16, fate: 'weighed' },
      { t: '11:00', w: 2.5, l: 15.5, fate: 'weighed' },
      { t: '12:00', w: 5.0, l: 20, fate: 'released' }, // released at once: never at the scale
    ];
    const ids: string[] = [];
    for (const f of fish) {
      const res = await crew.angler.post(`${base}/catches`, {
        competitionDayId: day1!.id,
        caughtAt: f.t,
        species: 'largemouth',
        weightLb: f.w,
        lengthIn: f.l,
        fate: f.fate,
      });
      expectOk(res, 201);
      ids.push(res.body.id);
    }
    const res = await crew.viewer.get(`${base}/events/${event.id}/weigh-ins`);
    expectOk(res);
    const view = res.body as WeighInsView;
    const d1 = view.days[0]!;
    // Worked by hand: legal candidates 4.1, 3.6, 3.0 dead (2.75 net), 2.8, 2.5, 2.2 → top five by net value:
    // 4.1, 3.6, 2.8, 3.0 (dead, 2.75), 2.5; gross 16.0; penalties 0.25 (dead) + 1 (short) = 1.25; net 14.75.
    expect(new Set(d1.computed.counted)).toEqual(new Set([ids[0], ids[1], ids[5], ids[3], ids[6]]));
    // Every fish's state by the one bag rule: the culled short-free 2.2 and the released 5.0 never reached the
    // scale; the dead 3.0 was counted, so it was weighed and charged; the short 2.9 was brought in and charged.
    expect(d1.computed.fish.map((f) => [f.catchId, f.state, f.counted, f.weighed, f.penaltyLb])).toEqual([
      [ids[0], 'counted', true, true, 0],
      [ids[1], 'counted', true, true, 0],
      [ids[2], 'culled', false, false, 0],
      [ids[3], 'dead', true, true, 0.25],
      [ids[4], 'short', false, true, 1],
      [ids[5], 'counted', true, true, 0],
      [ids[6], 'counted', true, true, 0],
      [ids[7], 'released', false, false, 0],
    ]);
    expect(d1.computed.penalties).toEqual([
      { kind: 'dead', catchId: ids[3], lb: 0.25 },
      { kind: 'short', catchId: ids[4], lb: 1 },
    ]);
    expect(d1.computed.format).toBe('team');
    expect(d1.computed.bags).toHaveLength(1);
    expect(d1.computed.bags[0]).toMatchObject({ nextToCull: ids[6], mustBeatLb: 2.5 });
    expect(d1.difference).toEqual({ grossLb: null, penaltyLb: null, netLb: null });
    expect(d1.computed.grossLb).toBeCloseTo(16.0, 6);
    expect(d1.computed.penaltyLb).toBeCloseTo(1.25, 6);
    expect(d1.computed.netLb).toBeCloseTo(14.75, 6);
    expect(d1.official).toBeNull();
    expect(d1.catches).toHaveLength(8);
    expect(view.days[1]!.computed).toMatchObject({ counted: [], grossLb: 0, netLb: 0 });
    expect(view.totals.computedNetLb).toBeCloseTo(14.75, 6);
    expect(view.totals.officialLb).toBeCloseTo(14.75, 6);

    // The official figures override in the totals; a late check-in adds its penalty to the computed bag.
    const put = await crew.angler.send('put', `${base}/competition-days/${day1!.id}/weigh-in`, {
      grossLb: 16.02,
      penaltyLb: 3.25,
      officialLb: 12.77,
      dayPlace: 4,
      lateMinutes: 2,
    });
    expectOk(put);
    expect(put.body).toMatchObject({ competitionDayId: day1!.id, officialLb: 12.77, dayPlace: 4 });
    const bad = await crew.angler.send('put', `${base}/competition-days/${day2!.id}/weigh-in`, { officialLb: -1 });
    expect(bad.status).toBe(400);
    const after = (await crew.viewer.get(`${base}/events/${event.id}/weigh-ins`)).body as WeighInsView;
    expect(after.days[0]!.official).toEqual({
      grossLb: 16.02,
      penaltyLb: 3.25,
      officialLb: 12.77,
      dayPlace: 4,
      lateMinutes: 2,
      fieldSize: null,
      winningLb: null,
      cutLb: null,
      version: 1,
    });
    expect(after.days[0]!.computed.penaltyLb).toBeCloseTo(3.25, 6); // 1.25 + 2 min × 1 lb/min
    expect(after.days[0]!.computed.penalties.at(-1)).toEqual({ kind: 'late', catchId: null, lb: 2, minutes: 2 });
    // Official figures win in the totals, with the difference beside them; neither is overwritten.
    expect(after.days[0]!.computed.grossLb).toBeCloseTo(16.0, 6);
    expect(after.days[0]!.difference).toEqual({ grossLb: 0.02, penaltyLb: 0, netLb: 0.02 });
    expect(after.totals.differenceLb).toBeCloseTo(0.02, 6);
    expect(after.totals.officialLb).toBeCloseTo(12.77, 6);
    expect(after.totals.computedNetLb).toBeCloseTo(12.75, 6);
    const recorded = await testEm(app).find(JournalEvent, { crewId: crew.crewId, type: 'WeighInRecorded' });
    expect(recorded).toHaveLength(1); // the refused PUT wrote nothing
    expect(recorded[0]!.payload).toMatchObject({
      competitionDayId: day1!.id,
      eventId: event.id,
      officialLb: 12.77,
      lateMinutes: 2,
      version: 1,
    });
    expect((await journalOf(app, ids[0]!)).map((e) => e.type)).toEqual(['CatchLogged']);
  });

  it('refuses a weigh-in PUT based on a stale version (409 stale_version) and changes nothing', async () => {
    const base = `/api/crews/${crew.crewId}`;
    const lake = await createLake(crew.angler, crew.crewId, { name: 'Version Lake' });
    const event = await createEvent(crew.angler, crew.crewId, lake.id);
    const [day] = await competitionDays(crew.angler, crew.crewId, event.id);
    const path = `${base}/competition-days/${day!.id}/weigh-in`;

    // The first recording carries no version (nothing is recorded yet) and answers version 1.
    const first = await crew.angler.send('put', path, { officialLb: 11.5 });
    expectOk(first);
    expect(first.body).toMatchObject({ officialLb: 11.5, version: 1 });

    // Two people loaded version 1: the first change wins, the second is refused.
    const owner = await crew.owner.send('put', path, { officialLb: 12.25, version: 1 });
    expectOk(owner);
    expect(owner.body).toMatchObject({ officialLb: 12.25, version: 2 });
    const stale = await crew.angler.send('put', path, { officialLb: 9, dayPlace: 3, version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({ statusCode: 409, code: 'stale_version' });
    expect(stale.body.message).toMatch(/version 2/);

    // A client that thinks nothing is recorded yet (no version) is refused too, as is a version for a day without one.
    const blind = await crew.angler.send('put', path, { officialLb: 9 });
    expect(blind.status).toBe(409);
    expect(blind.body.code).toBe('stale_version');
    const [, emptyDay] = await competitionDays(crew.angler, crew.crewId, event.id);
    const phantom = await crew.angler.send('put', `${base}/competition-days/${emptyDay!.id}/weigh-in`, {
      officialLb: 9,
      version: 3,
    });
    expect(phantom.status).toBe(409);
    expect(phantom.body.code).toBe('stale_version');

    const view = (await crew.viewer.get(`${base}/events/${event.id}/weigh-ins`)).body as WeighInsView;
    expect(view.days[0]!.official).toMatchObject({ officialLb: 12.25, dayPlace: null, version: 2 });
    expect(view.days[1]!.official).toBeNull();
    const recorded = await testEm(app).find(
      JournalEvent,
      { crewId: crew.crewId, type: 'WeighInRecorded' },
      { orderBy: { seq: 'asc' } },
    );
    const forDay = recorded.filter((e) => (e.payload as { competitionDayId?: string }).competitionDayId === day!.id);
    expect(forDay.map((e) => (e.payload as { version: number }).version)).toEqual([1, 2]); // the refused PUTs wrote nothing

    // The current version is accepted.
    const fresh = await crew.angler.send('put', path, { dayPlace: 3, version: 2 });
    expectOk(fresh);
    expect(fresh.body).toMatchObject({ officialLb: 12.25, dayPlace: 3, version: 3 });
  });

  it('stores field context and an individual format, refuses bad figures naming the field, and the recap agrees with the weigh-in screen', async () => {
    const base = `/api/crews/${crew.crewId}`;
    const lake = await createLake(crew.angler, crew.crewId, { name: 'Field Lake' });
    // Invented figures; the rules are common practice (5 fish, 12 in, 0.25 lb dead, 1 lb short), set per event.
    const event = await createEvent(crew.angler, crew.crewId, lake.id, {
      rules: { fishPerDay: 5, minLengthIn: 12, deadFishPenaltyLb: 0.25, shortFishPenaltyLb: 1, format: 'team' },
      field: { fieldSize: 180, winningLb: 31.4, cutLb: 22.1 },
      finalPlace: 26,
    });
    expect(event.rules.format).toBe('team');
    expect(event.field).toEqual({ fieldSize: 180, winningLb: 31.4, cutLb: 22.1 });

    // Bad input: 400 naming the field, and nothing written.
    const journalBefore = await testEm(app).count(JournalEvent, { crewId: crew.crewId });
    for (const [body, field] of [
      [{ field: { fieldSize: 0 } }, 'field.fieldSize'],
      [{ field: { fieldSize: 12.5 } }, 'field.fieldSize'],
      [{ field: { winningLb: 151 } }, 'field.winningLb'],
      [{ rules: { format: 'pairs' } }, 'rules.format'],
    ] as const) {
      const bad = await crew.angler.patch(`${base}/events/${event.id}`, { ...body, version: event.version });
      expect(bad.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys(bad.body.fieldErrors)).toContain(field);
    }
    const [day1, day2] = await competitionDays(crew.angler, crew.crewId, event.id);
    const badDay = await crew.angler.send('put', `${base}/competition-days/${day1!.id}/weigh-in`, {
      fieldSize: -3,
      cutLb: 200,
    });
    expect(badDay.status).toBe(400);
    expect(Object.keys(badDay.body.fieldErrors).sort()).toEqual(['cutLb', 'fieldSize']);
    expect(await testEm(app).count(JournalEvent, { crewId: crew.crewId })).toBe(journalBefore);
    expect((await crew.viewer.get(`${base}/events/${event.id}`)).body.field).toEqual(event.field);

    // Two anglers' fish; who logged each comes from the session.
    const log = async (client: typeof crew.angler, dayId: string, caughtAt: string, weightLb: number, fate: string) => {
      const res = await client.post(`${base}/catches`, {
        competitionDayId: dayId,
        caughtAt,
        species: 'largemouth',
        weightLb,
        lengthIn: 16,
        fate,
      });
      expectOk(res, 201);
      return res.body as { id: string; loggedBy: { userId: string; name: string } | null };
    };
    const a1 = await log(crew.angler, day1!.id, '07:00', 4.2, 'weighed');
    const o1 = await log(crew.owner, day1!.id, '08:00', 3.1, 'weighed');
    await log(crew.owner, day1!.id, '09:00', 2.4, 'dead');
    await log(crew.angler, day2!.id, '07:30', 5.05, 'weighed');
    await log(crew.owner, day2!.id, '08:10', 1.2, 'released'); // never reaches the scale: no weight, no penalty
    expect(a1.loggedBy?.userId).toEqual(expect.any(String));
    expect(o1.loggedBy?.userId).toEqual(expect.any(String));
    expect(o1.loggedBy!.userId).not.toBe(a1.loggedBy!.userId);

    // Official figures with a small difference from the log: both kept, the difference beside them.
    expectOk(
      await crew.angler.send('put', `${base}/competition-days/${day1!.id}/weigh-in`, {
        grossLb: 9.62,
        penaltyLb: 0.25,
        officialLb: 9.37,
        dayPlace: 30,
        fieldSize: 180,
        winningLb: 17.9,
        cutLb: 11.2,
      }),
    );
    const team = (await crew.viewer.get(`${base}/events/${event.id}/weigh-ins`)).body as WeighInsView;
    expect(team.days[0]!.computed).toMatchObject({ format: 'team', grossLb: 9.7, penaltyLb: 0.25, netLb: 9.45 });
    expect(team.days[0]!.difference).toEqual({ grossLb: -0.08, penaltyLb: 0, netLb: -0.08 });
    expect(team.days[0]!.official).toMatchObject({ officialLb: 9.37, fieldSize: 180, winningLb: 17.9, cutLb: 11.2 });
    expect(team.totals).toMatchObject({ computedNetLb: 14.5, officialLb: 14.42, differenceLb: -0.08 });
    expect(team.totals.field).toEqual({ fieldSize: 180, winningLb: 31.4, cutLb: 22.1 });

    // The recap computes the same bags and totals as the weigh-in screen, and reads the place against the field.
    await waitForProjection(app);
    const recap = (await crew.viewer.get(`${base}/reports/events/${event.id}/recap`)).body as EventRecapView;
    for (const d of recap.days) {
      const w = team.days.find((x) => x.competitionDayId === d.competitionDayId)!;
      expect([d.grossLb, d.penaltyLb, d.netLb]).toEqual([w.computed.grossLb, w.computed.penaltyLb, w.computed.netLb]);
      expect(d.fish.map((f) => [f.catchId, f.state])).toEqual(w.computed.fish.map((f) => [f.catchId, f.state]));
      expect(d.difference).toEqual(w.difference);
    }
    expect(recap.totals).toMatchObject({ netLb: team.totals.computedNetLb, officialLb: team.totals.officialLb });
    expect(recap.days[0]!.standing.place).toBe('30th of 180 (top 17 %)'); // 30/180 = 16.7 %, rounded up
    expect(recap.days[0]!.standing.behindWinnerLb).toBe(8.53); // 17.9 − 9.37 official
    expect(recap.totals.standing.place).toBe('26th of 180 (top 15 %)');
    // The lake comparison puts each event's bags and place against its field beside the rates: the recap's totals.
    const comparison = async () =>
      (await crew.viewer.get(`${base}/reports/lake-comparison?lakeId=${lake.id}&by=kind`)).body as LakeComparisonView;
    expect((await comparison()).results[event.id]).toEqual(recap.totals);
    expect(recap.totals.standing.behindWinnerLb).toBe(16.98); // 31.4 − 14.42 (day 1 official 9.37 + day 2 5.05)

    // Individual format: a bag per angler (the event's own rules).
    const updated = await crew.angler.patch(`${base}/events/${event.id}`, {
      rules: { format: 'individual' },
      version: event.version,
    });
    expectOk(updated);
    expect((updated.body as EventView).rules.format).toBe('individual');
    const solo = (await crew.viewer.get(`${base}/events/${event.id}/weigh-ins`)).body as WeighInsView;
    expect(solo.days[0]!.computed.bags.map((b) => [b.anglerId === a1.loggedBy!.userId, b.netLb]).sort()).toEqual([
      [false, 5.25], // owner: 3.1 + 2.4 dead − 0.25
      [true, 4.2],
    ]);
    await waitForProjection(app);
    const soloRecap = (await crew.viewer.get(`${base}/reports/events/${event.id}/recap`)).body as EventRecapView;
    expect((await comparison()).results[event.id]).toEqual(soloRecap.totals);
  });
});
