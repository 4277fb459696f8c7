import type { INestApplication } from '@nestjs/common';
import { afterAll, describe, expect, it } from 'vitest';
import { JournalProjector } from '../src/projections/journal-projector.service';
import { ApiClient, newUser } from './utils/api-client';
import { createTestApp } from './utils/test-app';
import {
  expectSameFigures,
  FIND_GROUPINGS,
  lakeWithEvents,
  readModelFigures,
  recomputeFromJournal,
  sqlEm,
  waitForProjection,
} from './reports-support';

/**
 * A crash between the write and the projection: the first server writes with its projector switched off (as if
 * it died after each commit, before projecting), then stops. The next server's start-up catch-up applies it all.
 */
describe('projections: a crash between write and projection loses nothing', () => {
  const apps: INestApplication[] = [];
  afterAll(async () => {
    for (const app of apps) await app.close();
  });

  it('applies on start-up what was written but never projected', async () => {
    const writer = await createTestApp({ PROJECTOR_ENABLED: 'false' });
    apps.push(writer);
    const owner = await newUser(writer, 'owner');
    const crewId = (await owner.post('/api/crews', { name: 'Crash Crew' })).body.id as string;
    const { lakeId, events } = await lakeWithEvents(owner, crewId);
    const find = await owner.post(`/api/crews/${crewId}/finds`, {
      lakeId,
      eventId: events[0]!.id,
      name: 'Shell bar',
      lat: 32.951,
      lon: -96.201,
      kind: 'hard-bottom',
      hardness: 4,
      depthFt: 19,
    });
    expect(find.status).toBe(201);
    const grass = await owner.post(`/api/crews/${crewId}/finds`, {
      lakeId,
      eventId: events[0]!.id,
      name: 'Grass edge',
      lat: 32.953,
      lon: -96.203,
      kind: 'vegetation',
      depthFt: 8,
    });
    // Fished without a bite: a stop, no catch.
    const stop = await owner.post(`/api/crews/${crewId}/stops`, {
      competitionDayId: events[0]!.dayIds[0],
      findId: grass.body.id,
      arrivedAt: '06:40',
      leftAt: '07:20',
    });
    expect(stop.status).toBe(201);
    const caught = await owner.post(`/api/crews/${crewId}/catches`, {
      competitionDayId: events[0]!.dayIds[0],
      caughtAt: '07:45',
      findId: find.body.id,
      species: 'largemouth',
      weightLb: 4.12,
      fate: 'weighed',
    });
    expect(caught.status).toBe(201);

    const em = sqlEm(writer);
    const [{ n }] = (await em.execute('SELECT COUNT(*) AS n FROM rm_find_outcome WHERE crew_id = ?', [crewId])) as {
      n: unknown;
    }[];
    expect(Number(n)).toBe(0);
    const hits = await owner.get(`/api/crews/${crewId}/reports/hit-rates?by=kind`);
    expect(hits.body.overall.findsFished).toBe(0);
    await writer.close();
    apps.pop();

    // Explicitly on: @nestjs/config copies the first app's variables into process.env.
    const next = await createTestApp({ PROJECTOR_ENABLED: 'true' });
    apps.push(next);
    await waitForProjection(next);
    const reader = new ApiClient(next);
    await reader.signIn(owner.email, owner.password);
    const after = await reader.get(`/api/crews/${crewId}/reports/hit-rates?by=kind`);
    expect(after.body.overall).toMatchObject({ findsFished: 2, findsProducing: 1, fishCount: 1 });
    for (const by of FIND_GROUPINGS)
      expectSameFigures(
        await readModelFigures(next, crewId, by),
        await recomputeFromJournal(next, crewId, by),
        `after restart ${by}`,
      );
    expect(next.get(JournalProjector).enabled).toBe(true);
  });
});
