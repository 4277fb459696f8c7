import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { MikroORM } from '@mikro-orm/mariadb';
import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS, DEMO_CREW_NAME, DEMO_PASSWORD, RIVAL_CREW_NAME } from '../src/database/seeders/demo-accounts';
import { ApiClient } from './utils/api-client';
import { createTestApp } from './utils/test-app';

const BACKEND = join(__dirname, '..');
// A scratch database beside the test one, so seeding an empty database can be tried for real.
const SCRATCH_DB = 'shoalbook_test_seed';

function runScript(script: 'migrate' | 'seed') {
  const r = spawnSync(process.execPath, [join(BACKEND, 'dist', 'database', `${script}.js`)], {
    cwd: BACKEND,
    env: { ...process.env, DB_NAME: SCRATCH_DB },
    encoding: 'utf8',
  });
  return { status: r.status, out: `${r.stdout}${r.stderr}` };
}

describe('migrations', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  it('leave no difference between the entities and the migrated schema', async () => {
    // Safe mode: tables of features whose entities are registered elsewhere are not counted as drift.
    const sql = await app
      .get(MikroORM)
      .getSchemaGenerator()
      .getUpdateSchemaSQL({ wrap: false, safe: true, dropTables: false });
    // Journal entities keep foreign ids as plain columns while their migration adds the foreign keys
    // (and MariaDB the index behind each): the generator would drop those, which is not drift.
    const drift = sql
      .split('\n')
      .map((l) => l.trim())
      .filter((l) => l && !/^alter table `\w+` drop (foreign key|index) `\w+_foreign`;$/.test(l));
    expect(drift).toEqual([]);
  });
});

describe('migrate and seed scripts on an empty database', () => {
  beforeAll(async () => {
    const { profile } = await import('../../scripts/lib/profile.mjs');
    const { dropDatabase, ensureDatabase } = await import('../../scripts/lib/mariadb.mjs');
    const p = profile('test');
    dropDatabase(p, SCRATCH_DB);
    await ensureDatabase(p, SCRATCH_DB);
  });
  afterAll(async () => {
    const { profile } = await import('../../scripts/lib/profile.mjs');
    const { dropDatabase } = await import('../../scripts/lib/mariadb.mjs');
    dropDatabase(profile('test'), SCRATCH_DB);
  });

  it('migrates, seeds the demo accounts once, and reports "already seeded" the second time', async () => {
    const first = runScript('migrate');
    expect(first.status, first.out).toBe(0);
    expect(first.out).toMatch(/applied \d+ migration/);
    const again = runScript('migrate');
    expect(again.out).toMatch(/up to date/);

    const seeded = runScript('seed');
    expect(seeded.status, seeded.out).toBe(0);
    expect(seeded.out).toMatch(/seeded the demo accounts/);
    expect(runScript('seed').out).toMatch(/already seeded/);

    const app = await createTestApp({ DB_NAME: SCRATCH_DB });
    try {
      const byEmail: Record<string, { role?: string; crew?: string }> = {};
      for (const account of DEMO_ACCOUNTS) {
        const client = new ApiClient(app);
        const res = await client.signIn(account.email, DEMO_PASSWORD);
        expect(res.status, account.email).toBe(200);
        expect(res.body.user.siteRole).toBe(account.siteRole);
        byEmail[account.email] = { role: res.body.crews[0]?.role, crew: res.body.crews[0]?.crewName };
      }
      expect(byEmail).toEqual({
        'owner@demo.test': { role: 'owner', crew: DEMO_CREW_NAME },
        'angler@demo.test': { role: 'angler', crew: DEMO_CREW_NAME },
        'viewer@demo.test': { role: 'viewer', crew: DEMO_CREW_NAME },
        'admin@demo.test': { role: undefined, crew: undefined },
        'rival@demo.test': { role: 'owner', crew: RIVAL_CREW_NAME },
      });
    } finally {
      await app.close();
    }
  });
});
