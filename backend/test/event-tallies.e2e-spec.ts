import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { EventTally, WeighInsView } from '@shoalbook/shared';
import { crewWithMembers, type CrewFixture } from './utils/api-client';
import { createTestApp } from './utils/test-app';
import { competitionDays, createEvent, createLake, expectOk } from './journal-fixtures';

describe('event tallies: fish and weight of each event for the events list', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let base: string;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Tally Crew');
    base = `/api/crews/${crew.crewId}`;
  });
  afterAll(async () => {
    await app.close();
  });

  const logFish = async (dayId: string, time: string, weightLb: number) =>
    expectOk(
      await crew.angler.post(`${base}/catches`, {
        competitionDayId: dayId,
        caughtAt: time,
        species: 'largemouth',
        weightLb,
        lengthIn: 16,
        fate: 'weighed',
      }),
      201,
    );

  it('counts each event’s fish by the one bag rule and sums its weight, official where entered, as the weigh-in screen does', async () => {
    const lake = await createLake(crew.angler, crew.crewId);
    const other = await createLake(crew.angler, crew.crewId, { name: 'Other Tally Lake' });
    // Rules: 5 fish a day (common practice, set per event).
    const event = await createEvent(crew.angler, crew.crewId, lake.id, { rules: { fishPerDay: 5 } });
    const elsewhere = await createEvent(crew.angler, crew.crewId, other.id, { name: 'Elsewhere Open' });
    const [day1, day2] = await competitionDays(crew.angler, crew.crewId, event.id);
    // Day 1: six fish of 1–6 lb; the five heaviest count, 2+3+4+5+6 = 20 lb. Day 2: two fish, official 12.34 lb.
    for (const [i, w] of [1, 2, 3, 4, 5, 6].entries()) await logFish(day1!.id, `0${7 + (i % 3)}:${10 + i}`, w);
    await logFish(day2!.id, '08:00', 3);
    await logFish(day2!.id, '09:00', 4);
    expectOk(await crew.angler.send('put', `${base}/competition-days/${day2!.id}/weigh-in`, { officialLb: 12.34 }));

    const res = await crew.viewer.get(`${base}/event-tallies?lakeId=${lake.id}`);
    expectOk(res);
    expect(res.body as EventTally[]).toEqual([
      { eventId: event.id, fishCaught: 8, fishCounted: 7, totalLb: 32.34, allOfficial: false },
    ]);
    const screen = (await crew.viewer.get(`${base}/events/${event.id}/weigh-ins`)).body as WeighInsView;
    expect(screen.totals.officialLb).toBeCloseTo(32.34, 6);

    // Every lake: the other event is there with nothing caught, and no official figure.
    const all = (await crew.viewer.get(`${base}/event-tallies`)).body as EventTally[];
    expect(all.find((t) => t.eventId === elsewhere.id)).toEqual({
      eventId: elsewhere.id,
      fishCaught: 0,
      fishCounted: 0,
      totalLb: 0,
      allOfficial: false,
    });
    expect((await crew.viewer.get(`${base}/event-tallies?lakeId=not-a-uuid`)).status).toBe(400);
  });
});
