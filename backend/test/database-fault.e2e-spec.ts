import type { INestApplication } from '@nestjs/common';
import { afterAll, describe, expect, it } from 'vitest';
import { Find } from '../src/finds/find.entity';
import { JournalProjector } from '../src/projections/journal-projector.service';
import { ProjectionRebuildService } from '../src/projections/rebuild.service';
import { ApiClient, newUser } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';
import { readModelSnapshot } from './reports-support';
import { createLake } from './journal-fixtures';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * MariaDB dies with SIGKILL (no clean shutdown) in the middle of a write load and is started again. The write
 * load goes through a server whose projector is off, so only the other server's projector can bring the read
 * models up to date: it fails while the database is away and must catch up by itself once it is back.
 */
describe('database fault: MariaDB killed during writes', () => {
  const apps: INestApplication[] = [];
  afterAll(async () => {
    for (const app of apps) await app.close();
  });

  it('keeps every acknowledged write once, answers 503 with Retry-After while down, and the projector catches up', async () => {
    const { profile } = await import('../../scripts/lib/profile.mjs');
    const { ourPid, startMariadb } = (await import('../../scripts/lib/mariadb.mjs')) as {
      ourPid: (p: unknown) => number | null;
      startMariadb: (p: unknown) => Promise<unknown>;
    };
    const p = profile('test');
    // Explicit values: @nestjs/config copies the first app's variables into process.env.
    const reader = await createTestApp({ PROJECTOR_ENABLED: 'true' });
    apps.push(reader);
    const writerApp = await createTestApp({ PROJECTOR_ENABLED: 'false' });
    apps.push(writerApp);
    const owner = await newUser(writerApp, 'fault');
    const crewId = (await owner.post('/api/crews', { name: 'Fault Crew' })).body.id as string;
    const lake = await createLake(owner, crewId);

    const acknowledged: string[] = [];
    const statuses = new Map<number, number>();
    const retryAfter = new Set<string>();
    let stop = false;
    const writer = async (w: number) => {
      for (let i = 0; !stop; i++) {
        const name = `w${w}-${i}`;
        const res = await owner.post(`/api/crews/${crewId}/finds`, {
          lakeId: lake.id,
          name,
          lat: 32.95,
          lon: -96.2,
          kind: 'contour',
          depthFt: 5 + (i % 30),
        });
        statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
        if (res.status === 201) acknowledged.push(name);
        if (res.status === 503) {
          retryAfter.add(String(res.headers['retry-after']));
          await sleep(100);
        }
      }
    };
    const load = Promise.all([0, 1, 2, 3].map(writer));
    await sleep(1500);
    const pid = ourPid(p);
    expect(pid).toBeGreaterThan(0);
    process.kill(pid!, 'SIGKILL');

    // While it is down: 503 with Retry-After (RFC 9110 §10.2.3), from the health check and from the routes.
    const until = Date.now() + 15_000;
    let health = await new ApiClient(reader).get('/api/health');
    while (health.status !== 503 && Date.now() < until) health = await new ApiClient(reader).get('/api/health');
    expect(health.status).toBe(503);
    expect(health.headers['retry-after']).toMatch(/^\d+$/);
    await expect(reader.get(JournalProjector).requestCatchUp()).rejects.toThrow();
    await sleep(1000);
    stop = true;
    await load;

    await startMariadb(p);
    // Back: the reader's projector retries by itself (no write happens from here on).
    const back = Date.now() + 30_000;
    let lag = { events: -1, failedRuns: -1 };
    while (Date.now() < back) {
      const res = await new ApiClient(reader).get('/api/health');
      if (res.status === 200) {
        lag = res.body.projection;
        if (lag.events === 0 && lag.failedRuns === 0) break;
      }
      await sleep(200);
    }
    expect(lag).toEqual({ events: 0, failedRuns: 0 });

    // Every answer was an acknowledgement or a 503; nothing else (no 500).
    expect([...statuses.keys()].filter((s) => s !== 201 && s !== 503)).toEqual([]);
    expect(statuses.get(503)).toBeGreaterThan(0);
    expect([...retryAfter].every((v) => /^\d+$/.test(v))).toBe(true);
    expect(acknowledged.length).toBeGreaterThan(10);

    // Every acknowledged write is there exactly once.
    const rows = await testEm(reader).find(Find, { crewId }, { fields: ['name'] });
    const counts = new Map<string, number>();
    for (const r of rows) counts.set(r.name, (counts.get(r.name) ?? 0) + 1);
    expect(acknowledged.filter((n) => counts.get(n) !== 1)).toEqual([]);
    expect([...counts.values()].every((n) => n === 1)).toBe(true);

    // The read models the retries built equal a rebuild from the journal.
    const incremental = await readModelSnapshot(reader, crewId);
    expect(incremental.rm_find!.length).toBe(rows.length);
    await reader.get(ProjectionRebuildService).rebuild();
    expect(await readModelSnapshot(reader, crewId)).toEqual(incremental);
  }, 120_000);
});
