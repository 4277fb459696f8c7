// Brings up the real stack for the browser tests: the test profile's MariaDB (fresh database, migrated and
// seeded with the demo accounts), the fake SMTP server and the built back end serving frontend/dist.
import type { ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { profile, ROOT } from '../../scripts/lib/profile.mjs';
import { prepareDatabase, seed, startBackend, startFakeSmtp } from '../../scripts/lib/services.mjs';

function stop(child: ChildProcess | undefined): Promise<void> {
  if (!child || child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
    child.once('exit', () => {
      clearTimeout(timer);
      resolve();
    });
    child.kill('SIGTERM');
  });
}

export default async function setup() {
  if (!existsSync(join(ROOT, 'frontend', 'dist', 'index.html'))) {
    throw new Error('frontend/dist is missing: run `npm run build -w @shoalbook/frontend` first');
  }
  const p = profile('test');
  await prepareDatabase(p, { fresh: true });
  seed(p);
  const smtp = await startFakeSmtp(p, { clearOutbox: true });
  let backend: ChildProcess | undefined;
  try {
    // Sign-in limits are the back end's own tests' business; here many sign-ins follow each other quickly.
    backend = await startBackend(p, { THROTTLE_AUTH_LIMIT: '1000', THROTTLE_ACCOUNT_LIMIT: '1000' }, 'ignore');
  } catch (error) {
    await stop(smtp);
    throw error;
  }
  return async () => {
    await stop(backend);
    await stop(smtp);
  };
}
