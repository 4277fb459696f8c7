import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TimingView } from '@shoalbook/shared';
import { DateTime } from 'luxon';
import { MAX_TIMING_POINTS } from '../src/reports/queries/timing.handler';
import { crewWithMembers, type CrewFixture } from './utils/api-client';
import { createTestApp } from './utils/test-app';
import { createEvent, createLake, expectOk, TEST_LAKE, upload } from './journal-fixtures';
import { waitForProjection } from './reports-support';

// One fish a minute, round the clock from local midnight of the first competition day: a fish's place in
// time order is its minute number, so the test can tell which fish the thinned scatter kept.
const FISH = 5_500;
const DATES = ['2024-04-12', '2024-04-13', '2024-04-14', '2024-04-15'];
const FIRST_MINUTE = DateTime.fromISO(`${DATES[0]}T00:00`, { zone: TEST_LAKE.timeZone });

function catchCsv(): string {
  const rows = ['date,time,species,weight,fate'];
  for (let i = 0; i < FISH; i++) {
    const t = FIRST_MINUTE.plus({ minutes: i });
    rows.push(`${t.toISODate()},${t.toFormat('HH:mm')},largemouth,${(1 + (i % 40) / 10).toFixed(1)},released`);
  }
  return rows.join('\n');
}

describe('timing report scatter over the point cap', () => {
  let app: INestApplication;
  let crew: CrewFixture;

  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Thinning Crew');
    const lakeId = (await createLake(crew.angler, crew.crewId)).id;
    const event = await createEvent(crew.angler, crew.crewId, lakeId, { competitionDates: DATES });
    const res = await upload(
      crew.angler,
      `/api/crews/${crew.crewId}/catches/import?eventId=${event.id}`,
      catchCsv(),
      'round-the-clock.csv',
    );
    expectOk(res, 201);
    expect(res.body).toEqual({ imported: FISH, skipped: 0, errors: [] });
    await waitForProjection(app, 60_000);
  }, 120_000);
  afterAll(async () => {
    await app.close();
  });

  it('keeps the cap’s worth of fish spread evenly from the first fish to the last and says how many there are', async () => {
    const res = await crew.viewer.get(`/api/crews/${crew.crewId}/reports/timing`);
    expectOk(res);
    const view = res.body as TimingView;
    expect(view.totalCatches).toBe(FISH);
    expect(view.catches).toHaveLength(MAX_TIMING_POINTS);
    expect(view.byHour.reduce((n, h) => n + h.fishCount, 0)).toBe(FISH);

    const positions = view.catches.map((c) => DateTime.fromISO(c.caughtAt).diff(FIRST_MINUTE, 'minutes').as('minutes'));
    expect(positions[0]).toBe(0);
    expect(positions.at(-1)).toBe(FISH - 1);
    // Evenly: the gaps between kept fish are the two whole numbers either side of (FISH − 1)/(cap − 1).
    const step = (FISH - 1) / (MAX_TIMING_POINTS - 1);
    const gaps = positions.slice(1).map((p, i) => p - positions[i]!);
    expect(Math.min(...gaps)).toBe(Math.floor(step));
    expect(Math.max(...gaps)).toBe(Math.ceil(step));
    // Each tenth of the time range holds a tenth of the points (±1).
    for (let tenth = 0; tenth < 10; tenth++) {
      const from = (tenth * FISH) / 10;
      const inTenth = positions.filter((p) => p >= from && p < from + FISH / 10).length;
      expect(Math.abs(inTenth - MAX_TIMING_POINTS / 10), `tenth ${tenth}`).toBeLessThanOrEqual(1);
    }
  });

  it('thins the same way every time', async () => {
    const url = `/api/crews/${crew.crewId}/reports/timing`;
    const [a, b] = [await crew.owner.get(url), await crew.angler.get(url)];
    const ids = (v: TimingView) => v.catches.map((c) => c.catchId);
    expect(ids(a.body as TimingView)).toEqual(ids(b.body as TimingView));
  });
});
