import type { EntityManager } from '@mikro-orm/core';
import type { INestApplication } from '@nestjs/common';
import { demoJournal } from '@shoalbook/fixtures';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { WeighInsView } from '@shoalbook/shared';
import { Catch } from '../src/catches/catch.entity';
import { Crew } from '../src/crews/crew.entity';
import { DEMO_CREW_NAME } from '../src/database/seeders/demo-accounts';
import { JournalDemoSeeder } from '../src/database/seeders/journal-demo.seeder';
import { Find } from '../src/finds/find.entity';
import { JournalEvent } from '../src/journal-events/journal-event.entity';
import { Stop } from '../src/stops/stop.entity';
import { Lake } from '../src/lakes/lake.entity';
import { crewWithMembers, type CrewFixture } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';

describe('demo journal seeding', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, DEMO_CREW_NAME);
  });
  afterAll(async () => {
    await app.close();
  });

  it('loads the fixtures into the crew with a journal event per record, once', async () => {
    const demo = demoJournal();
    const em = testEm(app);
    const seed = () =>
      new JournalDemoSeeder().run(em as unknown as EntityManager, {
        crews: { [DEMO_CREW_NAME]: em.getReference(Crew, crew.crewId) },
        users: {},
      });
    await seed();
    const crewId = crew.crewId;
    expect(await em.count(Lake, { crewId })).toBe(demo.lakes.length);
    expect(await em.count(Find, { crewId })).toBe(demo.finds.length);
    expect(await em.count(Catch, { crewId })).toBe(demo.catches.length);
    const types = await em
      .getConnection()
      .execute<{ type: string; n: number }[]>(
        'select type, count(*) as n from journal_event where crew_id = ? group by type',
        [crewId],
      );
    const count = Object.fromEntries(types.map((t) => [t.type, Number(t.n)]));
    expect(count).toEqual({
      LakeCreated: demo.lakes.length,
      EventCreated: demo.events.length,
      FindAdded: demo.finds.length,
      CatchLogged: demo.catches.length,
      StopLogged: demo.stops.length,
      WeighInRecorded: demo.weighIns.length,
    });
    expect(await em.count(Stop, { crewId })).toBe(demo.stops.length);
    const event = await em.findOneOrFail(JournalEvent, { crewId, type: 'EventCreated' }, { orderBy: { seq: 'asc' } });
    expect((event.payload.competitionDays as unknown[]).length).toBeGreaterThan(0);

    await seed(); // the crew has lakes now: nothing more is loaded
    expect(await em.count(Find, { crewId })).toBe(demo.finds.length);

    // The seeded data reads back through the API: a weigh-in with the official figures beside the computed bag.
    const events = await crew.angler.get(`/api/crews/${crewId}/events`);
    expect(events.body).toHaveLength(demo.events.length);
    const withResults = demo.weighIns[0]!;
    const eventId = events.body.find(
      (e: { name: string }) => e.name === demo.events.find((d) => d.id === withResults.eventId)!.name,
    ).id;
    const w = (await crew.angler.get(`/api/crews/${crewId}/events/${eventId}/weigh-ins`)).body as WeighInsView;
    const day = w.days.find((d) => d.date === withResults.competitionDate)!;
    expect(day.official).toMatchObject({
      officialLb: withResults.officialLb,
      dayPlace: withResults.dayPlace,
      lateMinutes: withResults.lateMinutes,
    });
    expect(day.computed.counted.length).toBeGreaterThan(0);
  });
});
