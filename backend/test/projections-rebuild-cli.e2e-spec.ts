import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { newUser } from './utils/api-client';
import { createTestApp } from './utils/test-app';
import { lakeWithEvents, readModelSnapshot, waitForProjection } from './reports-support';

describe('npm run projections:rebuild', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  it('rebuilds from the journal what the projector built, reporting the events replayed', async () => {
    const owner = await newUser(app, 'owner');
    const crewId = (await owner.post('/api/crews', { name: 'CLI Crew' })).body.id as string;
    const { lakeId, events } = await lakeWithEvents(owner, crewId);
    const find = await owner.post(`/api/crews/${crewId}/finds`, {
      lakeId,
      eventId: events[1]!.id,
      name: 'Channel swing',
      lat: 32.96,
      lon: -96.21,
      kind: 'contour',
      subKind: 'channel swing',
      depthFt: 22,
    });
    await owner.post(`/api/crews/${crewId}/catches`, {
      competitionDayId: events[1]!.dayIds[1],
      caughtAt: '14:05',
      findId: find.body.id,
      species: 'smallmouth',
      weightLb: 3.3,
      fate: 'weighed',
    });
    await waitForProjection(app);
    const before = await readModelSnapshot(app, crewId);
    expect(before.rm_catch_fact).toHaveLength(1);

    // The CLI reads DB_* from the environment (vitest's test env points at the test database).
    const cli = spawnSync(process.execPath, [join(__dirname, '..', 'dist', 'database', 'rebuild-read-models.js')], {
      env: process.env,
      encoding: 'utf8',
      timeout: 60_000,
    });
    expect(cli.status, cli.stderr).toBe(0);
    expect(cli.stdout).toMatch(/rebuilt the read models from \d+ journal events in \d+ ms/);
    expect(await readModelSnapshot(app, crewId)).toEqual(before);
  });
});
