// Once per `vitest run`: a fresh, migrated test database and the fake SMTP server with an empty outbox.
// The migrations run from dist/, so build first: `npm run build -w @shoalbook/backend`.
import type { ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';

let smtp: ChildProcess | undefined;

export async function setup(): Promise<void> {
  const { profile } = await import('../../scripts/lib/profile.mjs');
  const { prepareDatabase, startFakeSmtp, BACKEND_DIST } = await import('../../scripts/lib/services.mjs');
  if (!existsSync(join(BACKEND_DIST, 'database', 'migrate.js'))) {
    throw new Error('backend/dist is missing: run `npm run build -w @shoalbook/backend` before the tests');
  }
  // vitest's test.env does not reach globalSetup: the profile is named here, so this is always the test database.
  const p = profile('test');
  // The fake SMTP server first: its port check fails fast when another run (e.g. the browser tests)
  // uses the test profile, before this run drops the database under it.
  smtp = await startFakeSmtp(p, { clearOutbox: true });
  try {
    await prepareDatabase(p, { fresh: true });
  } catch (e) {
    await teardown();
    throw e;
  }
}

export async function teardown(): Promise<void> {
  if (smtp && smtp.exitCode === null) {
    const exited = new Promise((resolve) => smtp!.once('exit', resolve));
    smtp.kill('SIGTERM');
    await exited;
  }
}
