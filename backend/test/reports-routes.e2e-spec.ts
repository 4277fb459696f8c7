import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { compareProportions, distanceM, solunarPeriodAt, wilsonInterval } from '@shoalbook/analytics';
import type {
  EventFindsView,
  EventRecapView,
  FindMapView,
  HitRatesView,
  LakeComparisonView,
  TimingView,
} from '@shoalbook/shared';
import { DateTime } from 'luxon';
import { type ApiClient, crewWithMembers, type CrewFixture, newUser } from './utils/api-client';
import { messagesTo, waitForMail } from './utils/outbox';
import { createTestApp } from './utils/test-app';
import { lakeWithEvents, recomputeFromJournal, waitForProjection } from './reports-support';

const LAKE = { lat: 32.95, lon: -96.2, timeZone: 'America/Chicago' };

describe('report routes', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let outsider: ApiClient;
  let lakeId: string;
  let events: { id: string; dayIds: string[]; dates: string[] }[];
  const findIds: Record<string, string> = {};

  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Report Crew');
    outsider = await newUser(app, 'outsider');
    ({ lakeId, events } = await lakeWithEvents(crew.owner, crew.crewId));
    const base = `/api/crews/${crew.crewId}`;
    // Event 0: 4 hard-bottom finds, 2 produce; 3 vegetation finds, 0 produce. Event 1: vegetation comes good.
    const plan: [string, string, number, number, number][] = [
      ['hb1', 'hard-bottom', 0, 18, 4],
      ['hb2', 'hard-bottom', 0, 21, 5],
      ['hb3', 'hard-bottom', 0, 24, 3],
      ['hb4', 'hard-bottom', 0, 12, 2],
      ['v1', 'vegetation', 0, 8, 0],
      ['v2', 'vegetation', 0, 9, 0],
      ['v3', 'vegetation', 0, 11, 0],
      ['v4', 'vegetation', 1, 8, 0],
      ['v5', 'vegetation', 1, 7, 0],
      ['hb5', 'hard-bottom', 1, 19, 4],
    ];
    for (const [i, [name, kind, ev, depthFt, hardness]] of plan.entries()) {
      const res = await crew.angler.post(`${base}/finds`, {
        lakeId,
        eventId: events[ev]!.id,
        name,
        lat: LAKE.lat + 0.004 * (i + 1),
        lon: LAKE.lon - 0.003 * i,
        kind,
        depthFt,
        hardness: hardness || null,
        waterTempF: 64 + i,
      });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      findIds[name] = res.body.id;
    }
    const catches: [string | null, number, number, string, number, string][] = [
      ['hb1', 0, 0, '06:40', 3.25, 'weighed'],
      ['hb1', 0, 0, '07:10', 2.5, 'weighed'],
      ['hb2', 0, 1, '09:05', 4.75, 'weighed'],
      ['hb2', 0, 1, '09:30', 1.1, 'released'],
      [null, 0, 1, '13:15', 2.0, 'culled'],
      ['v4', 1, 0, '08:00', 3.0, 'weighed'],
      ['v5', 1, 0, '10:20', 2.2, 'weighed'],
      ['hb5', 1, 1, '15:45', 5.6, 'dead'],
    ];
    for (const [find, ev, day, time, weightLb, fate] of catches) {
      const res = await crew.angler.post(`${base}/catches`, {
        competitionDayId: events[ev]!.dayIds[day],
        caughtAt: time,
        findId: find ? findIds[find] : null,
        species: 'largemouth',
        weightLb,
        fate,
      });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
    }
    // The blanks of event 0 were visited without a bite: a stop each on day 1, none on its catches' finds.
    for (const [i, name] of ['hb3', 'hb4', 'v1', 'v2', 'v3'].entries()) {
      const res = await crew.angler.post(`${base}/stops`, {
        competitionDayId: events[0]!.dayIds[0],
        findId: findIds[name],
        arrivedAt: `${10 + i}:00`,
        leftAt: `${10 + i}:30`,
      });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
    }
    await waitForProjection(app);
  });
  afterAll(async () => {
    await app.close();
  });

  const get = <T>(client: ApiClient, path: string) =>
    client.get(`/api/crews/${crew.crewId}/reports/${path}`).then((r) => ({ status: r.status, body: r.body as T }));

  it('hit rates by kind equal analytics hitRates over the raw journal, with Wilson intervals and readings', async () => {
    const { status, body } = await get<HitRatesView>(crew.viewer, 'hit-rates?by=kind');
    expect(status).toBe(200);
    const reference = await recomputeFromJournal(app, crew.crewId, 'kind');
    for (const g of body.groups) {
      const r = reference.get(g.key ?? '')!;
      expect({ fished: g.findsFished, producing: g.findsProducing, fish: g.fishCount }).toEqual({
        fished: r.findsFished,
        producing: r.findsProducing,
        fish: r.fishCount,
      });
      const w = wilsonInterval(g.findsProducing, g.findsFished);
      expect(g.producing.lower).toBeCloseTo(w.lower, 12);
      expect(g.producing.upper).toBeCloseTo(w.upper, 12);
    }
    const hard = body.groups.find((g) => g.key === 'hard-bottom')!;
    expect(hard).toMatchObject({ findsFished: 5, findsProducing: 3, fishCount: 5 });
    expect(body.overall).toMatchObject({ findsFished: 10, findsProducing: 5, fishCount: 7 });
    // The "no spread" reading is said exactly when the adjusted rates of the fished groups sit within one point.
    for (const by of ['kind', 'subKind', 'depthBand', 'hardness', 'temperatureBand']) {
      const view = (await get<HitRatesView>(crew.viewer, `hit-rates?by=${by}`)).body;
      const adjusted = view.groups.filter((g) => g.findsFished > 0).map((g) => g.producing.shrunk!);
      const flat = adjusted.length > 1 && Math.max(...adjusted) - Math.min(...adjusted) < 0.01;
      expect(view.readings.some((r) => r.includes('no bigger than chance'))).toBe(flat);
    }
    expect(body.readings).toContain(
      `Hard bottom produced on 3 of 5 finds fished (60 %, ${Math.round(wilsonInterval(3, 5).lower * 100)}–${Math.round(wilsonInterval(3, 5).upper * 100)} %).`,
    );
  });

  it('hit rates filter by event and season, and group catches by solunar period and time of day', async () => {
    const first = await get<HitRatesView>(crew.owner, `hit-rates?by=kind&eventId=${events[0]!.id}`);
    expect(first.body.groups.find((g) => g.key === 'vegetation')).toMatchObject({ findsFished: 3, findsProducing: 0 });
    const fall2026 = await get<HitRatesView>(crew.owner, 'hit-rates?by=kind&season=fall&year=2026');
    expect(fall2026.body.eventCount).toBe(1);
    expect(fall2026.body.overall.fishCount).toBe(3);
    const spring = await get<HitRatesView>(crew.owner, 'hit-rates?by=kind&season=spring');
    expect(spring.body.overall.findsFished).toBe(0);
    expect(spring.body.readings[0]).toMatch(/add practice finds/);

    const solunar = await get<HitRatesView>(crew.owner, 'hit-rates?by=solunarPeriod');
    expect(solunar.body.unit).toBe('catch');
    // The reference: analytics solunarPeriodAt for each catch, in the lake's zone at its reference point.
    const timing = await get<TimingView>(crew.owner, 'timing');
    expect(timing.body.totalCatches).toBe(8);
    expect(timing.body.catches).toHaveLength(8);
    const counts: Record<string, number> = {};
    for (const c of timing.body.catches) {
      const p = solunarPeriodAt(c.caughtAt, LAKE.lat, LAKE.lon, LAKE.timeZone);
      counts[p ? p.kind : 'none'] = (counts[p ? p.kind : 'none'] ?? 0) + 1;
      expect(c.solunarPeriod).toBe(p ? p.kind : null);
      const local = DateTime.fromISO(c.caughtAt, { zone: LAKE.timeZone });
      expect(c.localMinutes).toBe(local.hour * 60 + local.minute);
    }
    for (const g of solunar.body.groups) expect(g.fishCount).toBe(counts[g.key!]);
    // Headline = sum of the table's rows for every grouping (the 13:15 catch with no find included by time).
    for (const by of ['kind', 'subKind', 'depthBand', 'hardness', 'temperatureBand', 'solunarPeriod', 'timeOfDay']) {
      const view = (await get<HitRatesView>(crew.owner, `hit-rates?by=${by}`)).body;
      const rows = view.groups.reduce((n, g) => n + g.fishCount, 0);
      expect(view.overall.fishCount, by).toBe(rows);
      expect(view.overall.fishCount, by).toBe(by === 'solunarPeriod' || by === 'timeOfDay' ? 8 : 7);
    }
    const byTime = await get<HitRatesView>(crew.owner, 'hit-rates?by=timeOfDay');
    // 06:40 and 07:10 fall before 08:00; 08:00 itself is morning.
    expect(byTime.body.groups.find((g) => g.key === 'early')?.fishCount).toBe(2);
    expect(timing.body.byHour.find((h) => h.hour === 9)).toMatchObject({ fishCount: 2, weightLb: 5.85 });
  });

  it('compares the events on the lake with compareProportions, in plain words', async () => {
    const { status, body } = await get<LakeComparisonView>(crew.owner, `lake-comparison?lakeId=${lakeId}&by=kind`);
    expect(status).toBe(200);
    expect(body.events.map((e) => e.id)).toEqual(events.map((e) => e.id));
    const veg = body.comparisons.find((c) => c.key === 'vegetation')!;
    const expected = compareProportions({ successes: 2, trials: 2 }, { successes: 0, trials: 3 });
    expect(veg).toMatchObject({ a: events[1]!.id, b: events[0]!.id });
    expect(veg.difference).toBeCloseTo(expected.difference, 12);
    expect(veg.pValue).toBeCloseTo(expected.pValue, 12);
    expect(veg.moreThanChance).toBe(expected.pValue < 0.05 && expected.lower > 0);
    expect(veg.reading).toMatch(
      /^Vegetation did better in Fall 2026 than in Fall 2025: 100 % against 0 % of finds fished/,
    );
    const [lo, hi] = [Math.round(expected.lower * 100), Math.round(expected.upper * 100)];
    expect(veg.reading).toContain(
      lo < 0
        ? `(100 points higher, likely from ${-lo} points lower to ${hi} higher)`
        : `(100 points higher, likely ${lo} to ${hi})`,
    );
    expect(body.groups.find((g) => g.key === 'hard-bottom')!.perEvent[events[0]!.id]).toMatchObject({
      successes: 2,
      trials: 4,
      findsFished: 4,
    });
    const missing = await get(crew.owner, 'lake-comparison?by=kind');
    expect(missing.status).toBe(400);
  });

  it('recaps an event with the same bags as the weigh-in computation', async () => {
    const { status, body } = await get<EventRecapView>(crew.viewer, `events/${events[0]!.id}/recap`);
    expect(status).toBe(200);
    const weighIns = await crew.owner.get(`/api/crews/${crew.crewId}/events/${events[0]!.id}/weigh-ins`);
    expect(weighIns.status).toBe(200);
    for (const [i, d] of body.days.entries()) {
      const computed = weighIns.body.days.find((w: { date: string }) => w.date === d.date).computed;
      expect(d.netLb).toBeCloseTo(computed.netLb, 6);
      expect(d.counted.map((f) => f.catchId).sort()).toEqual([...computed.counted].sort());
      expect(i === 0 ? d.counted.length : d.counted.length).toBeGreaterThan(0);
    }
    expect(body.bigFish?.weightLb).toBe(4.75);
    expect(body.findsPracticed).toBe(7);
    expect(body.shareOfPracticePaidOff).toMatchObject({ successes: 2, trials: 7 });
    expect(body.producingFinds.map((f) => f.name)).toEqual(['hb2', 'hb1']);
    // The culled 2.0 of day 2 never reached the scale (one bag rule), so the bag stays at 4.75.
    expect(body.timeline.map((t) => t.cumulativeBagLb)).toEqual([3.25, 5.75, 4.75, 4.75, 4.75]);
  });

  it('lists the paid-off finds with outcomes', async () => {
    const { body } = await get<EventFindsView>(crew.owner, `events/${events[0]!.id}/finds`);
    expect(body.finds).toHaveLength(7);
    expect(body.finds.find((f) => f.name === 'hb2')).toMatchObject({
      outcome: 'weighed',
      fishCount: 2,
      weighedCount: 1,
      weightLb: 5.85,
    });
    expect(body.finds.find((f) => f.name === 'v1')).toMatchObject({ outcome: 'fished-blank', fishCount: 0 });
    expect(body.paidOff).toMatchObject({ successes: 2, trials: 7 });
  });

  it('maps finds in metres from the lake point, and hides positions from viewers', async () => {
    const owner = await get<FindMapView>(crew.owner, `find-map?lakeId=${lakeId}`);
    const hb1 = owner.body.finds.find((f) => f.name === 'hb1')!;
    const reference = distanceM({ lat: LAKE.lat, lon: LAKE.lon }, { lat: LAKE.lat + 0.004, lon: LAKE.lon });
    expect(Math.hypot(hb1.xM!, hb1.yM!) / reference).toBeCloseTo(1, 3);
    expect(owner.body.catches.filter((c) => c.findId === findIds.hb1).every((c) => c.xM === hb1.xM)).toBe(true);
    const viewer = await get<FindMapView>(crew.viewer, `find-map?lakeId=${lakeId}`);
    expect(viewer.body.positionsHidden).toBe(true);
    expect(viewer.body.finds.every((f) => f.xM === null && f.yM === null)).toBe(true);
    expect(viewer.body.catches.every((c) => c.xM === null)).toBe(true);
  });

  it('shows a write in the reports soon after it is made', async () => {
    const res = await crew.angler.post(`/api/crews/${crew.crewId}/catches`, {
      competitionDayId: events[0]!.dayIds[0],
      caughtAt: '11:30',
      findId: findIds.v1,
      species: 'spotted',
      weightLb: 1.9,
      fate: 'weighed',
    });
    expect(res.status).toBe(201);
    await expect
      .poll(
        async () =>
          (await get<HitRatesView>(crew.owner, 'hit-rates?by=kind')).body.groups.find((g) => g.key === 'vegetation')
            ?.findsProducing,
        { timeout: 5000, interval: 50 },
      )
      .toBe(3);
  });

  it('keeps every report route private to its crew', async () => {
    const paths = [
      'hit-rates',
      `lake-comparison?lakeId=${lakeId}`,
      `events/${events[0]!.id}/recap`,
      `events/${events[0]!.id}/finds`,
      'timing',
      `find-map?lakeId=${lakeId}`,
    ];
    for (const p of paths) {
      expect((await get(outsider, p)).status, p).toBe(404);
      expect((await get(crew.viewer, p)).status, p).toBe(200);
    }
    // Another crew's ids under one's own crew find nothing either.
    const other = await crewWithMembers(app, 'Other Crew');
    expect((await other.owner.get(`/api/crews/${other.crewId}/reports/events/${events[0]!.id}/recap`)).status).toBe(
      404,
    );
    expect((await other.owner.get(`/api/crews/${other.crewId}/reports/find-map?lakeId=${lakeId}`)).status).toBe(404);
    const otherHits = await other.owner.get(`/api/crews/${other.crewId}/reports/hit-rates?lakeId=${lakeId}`);
    expect(otherHits.body.overall.findsFished).toBe(0);
  });

  it('mails the recap to chosen members only, without positions', async () => {
    const path = `/api/crews/${crew.crewId}/reports/events/${events[0]!.id}/recap-email`;
    expect((await crew.viewer.post(path, { userIds: [crew.angler.userId] })).status).toBe(403);
    const refused = await crew.owner.post(path, { userIds: [outsider.userId] });
    expect(refused.status).toBe(400);
    expect(messagesTo(outsider.email, /recap|Recap/)).toHaveLength(0);
    expect((await crew.owner.post(path, { userIds: [] })).status).toBe(400);
    const sent = await crew.owner.post(path, { userIds: [crew.viewer.userId] });
    expect(sent.status, JSON.stringify(sent.body)).toBe(202);
    expect(sent.body).toEqual({ sent: 1 });
    const mail = await waitForMail(crew.viewer.email, 1, /recap|Recap/);
    expect(mail.text).toContain(`/crews/${crew.crewId}/reports/events/${events[0]!.id}`);
    const recap = (await get<EventRecapView>(crew.owner, `events/${events[0]!.id}/recap`)).body;
    expect(mail.text).toContain(
      `Practice finds that paid off: ${recap.shareOfPracticePaidOff.successes} of ${recap.findsPracticed}`,
    );
    // No coordinates and no find names (which can name landmarks) in the message.
    for (const body of [mail.text, mail.html]) {
      expect(body).not.toMatch(/32\.9|-96\.[12]/);
      expect(body).not.toMatch(/\bhb1\b|\bhb2\b/);
    }
  });
});
