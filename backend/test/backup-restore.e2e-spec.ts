import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Find } from '../src/finds/find.entity';
import { JournalEvent } from '../src/journal-events/journal-event.entity';
import { Lake } from '../src/lakes/lake.entity';
import { User } from '../src/users/user.entity';
import { createLake, expectOk } from './journal-fixtures';
import { crewWithMembers, type CrewFixture } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';

const ROOT = resolve(__dirname, '..', '..');

/** Run the backup script on the test profile (SHOALBOOK_TEST_PROFILE passes through the environment). */
function backup(cmd: 'dump' | 'restore', file: string) {
  const r = spawnSync(process.execPath, [join(ROOT, 'scripts', 'backup.mjs'), cmd, 'test', file], { cwd: ROOT, encoding: 'utf8', env: process.env, timeout: 120_000 });
  return { status: r.status, output: `${r.stdout}\n${r.stderr}` };
}

describe('backup and restore round trip (mariadb-dump --single-transaction)', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let dir: string;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Backup Crew');
    dir = mkdtempSync(join(tmpdir(), 'shoalbook-backup-'));
  });
  afterAll(async () => {
    await app.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('restores exactly the data of the dump, undoing later changes', async () => {
    const base = `/api/crews/${crew.crewId}`;
    const lake = await createLake(crew.owner, crew.crewId, { name: 'Backup Lake' });
    const find = await crew.owner.post(`${base}/finds`, { lakeId: lake.id, name: 'Rock pile', lat: 32.9501, lon: -96.2002, kind: 'hard-bottom', subKind: 'rock', depthFt: 14 });
    expectOk(find, 201);
    const journalBefore = await testEm(app).count(JournalEvent, { crewId: crew.crewId });

    const file = join(dir, 'journal.sql');
    const dumped = backup('dump', file);
    expect(dumped.status, dumped.output).toBe(0);
    const sql = readFileSync(file, 'utf8');
    expect(sql).toContain('Backup Lake');
    expect(sql).toMatch(/-- Dump completed/);

    // Changes after the dump: a rename, a deletion, a new record, a new account.
    expectOk(await crew.owner.patch(`${base}/lakes/${lake.id}`, { name: 'Renamed Lake', version: lake.version }));
    expect((await crew.owner.delete(`${base}/finds/${find.body.id}`)).status).toBe(204);
    const extra = await createLake(crew.owner, crew.crewId, { name: 'Lake Added Later' });
    const later = await crewWithMembers(app, 'Crew Made Later');

    const restored = backup('restore', file);
    expect(restored.status, restored.output).toBe(0);

    const em = testEm(app);
    expect((await em.findOneOrFail(Lake, { id: lake.id })).name).toBe('Backup Lake');
    const back = await em.findOneOrFail(Find, { id: find.body.id });
    expect(back).toMatchObject({ name: 'Rock pile', lat: 32.9501, lon: -96.2002, depthFt: 14, kind: 'hard-bottom' });
    expect(await em.count(Lake, { id: extra.id })).toBe(0);
    expect(await em.count(User, { id: later.owner.userId })).toBe(0);
    expect(await em.count(JournalEvent, { crewId: crew.crewId })).toBe(journalBefore);
    // The app reads the restored data through the API as before.
    const lakes = await crew.owner.get(`${base}/lakes`);
    expectOk(lakes);
    expect((lakes.body as { name: string }[]).map((l) => l.name)).toEqual(['Backup Lake']);
  });

  it('refuses to restore a file that is not a complete dump, and changes nothing', async () => {
    const before = await testEm(app).count(Lake, {});
    const cut = join(dir, 'cut.sql');
    writeFileSync(cut, readFileSync(join(dir, 'journal.sql'), 'utf8').slice(0, 2000));
    const res = backup('restore', cut);
    expect(res.status).not.toBe(0);
    expect(res.output).toMatch(/not a complete mariadb-dump file/);
    const junk = join(dir, 'junk.sql');
    writeFileSync(junk, 'DROP TABLE lakes;\n');
    expect(backup('restore', junk).status).not.toBe(0);
    expect(await testEm(app).count(Lake, {})).toBe(before);
  });
});
