// Bring up what the back end needs for a profile: its MariaDB, a migrated database and the fake SMTP server.
// Used by `npm start`, by the vitest global setups of the back end and the browser tests, and by the bench.
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { dropDatabase, ensureDatabase, startMariadb } from './mariadb.mjs';
import { backendEnv, ROOT } from './profile.mjs';
import { run, waitFor } from './run.mjs';
import { createConnection } from 'node:net';

export const BACKEND_DIST = join(ROOT, 'backend', 'dist');

/** Compile the libraries and the back end (tsc; incremental builds are quick). */
export function buildBackend() {
  for (const ws of ['@shoalbook/shared', '@shoalbook/analytics', '@shoalbook/fixtures', '@shoalbook/backend']) {
    run('npm', ['run', 'build', '--silent', '-w', ws], { cwd: ROOT });
  }
}

/** Run the MikroORM migrations (never schema sync) with the compiled migrate script. */
export function migrate(p) {
  run(process.execPath, [join(BACKEND_DIST, 'database', 'migrate.js')], {
    cwd: join(ROOT, 'backend'),
    env: backendEnv(p),
  });
}

/** Seed the demo data if the database is empty (the seeder checks). */
export function seed(p, args = []) {
  run(process.execPath, [join(BACKEND_DIST, 'database', 'seed.js'), ...args], {
    cwd: join(ROOT, 'backend'),
    env: backendEnv(p),
  });
}

/** Start MariaDB (or reuse a running one: `{ reused }`); with `fresh`, drop and recreate the database first. Then migrate. */
export async function prepareDatabase(p, { fresh = false } = {}) {
  const started = await startMariadb(p);
  if (fresh) {
    dropDatabase(p);
    await ensureDatabase(p);
  }
  migrate(p);
  return started;
}

export function portOpen(port) {
  return new Promise((resolve) => {
    const s = createConnection({ host: '127.0.0.1', port });
    s.once('connect', () => (s.destroy(), resolve(true)));
    s.once('error', () => resolve(false));
  });
}

/** Start the fake SMTP server; resolves with the child once it listens (`onSpawn` gets it at once). */
export async function startFakeSmtp(p, { clearOutbox = false, onSpawn } = {}) {
  if (clearOutbox) rmSync(p.outboxDir, { recursive: true, force: true });
  mkdirSync(p.outboxDir, { recursive: true });
  if (await portOpen(p.smtpPort))
    throw new Error(`port ${p.smtpPort} (fake SMTP) is already taken; stop the other program first`);
  const child = spawn(process.execPath, [join(ROOT, 'scripts', 'fake-smtp.mjs'), String(p.smtpPort), p.outboxDir], {
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  onSpawn?.(child);
  await waitFor(() => portOpen(p.smtpPort), { timeoutMs: 15000, what: 'the fake SMTP server' });
  return child;
}

/**
 * Start the built back end (serving the API and the built front end); resolves once /api/health answers.
 * `onSpawn` gets the child at once, so a caller stopping during the start-up can stop it too.
 */
export async function startBackend(p, extraEnv = {}, stdio = 'inherit', onSpawn) {
  if (await portOpen(p.port)) throw new Error(`port ${p.port} is already taken; set PORT to a free port`);
  if (!existsSync(join(BACKEND_DIST, 'main.js'))) throw new Error('the back end is not built');
  const child = spawn(process.execPath, [join(BACKEND_DIST, 'main.js')], {
    cwd: join(ROOT, 'backend'),
    env: backendEnv(p, extraEnv),
    stdio: ['ignore', stdio, stdio],
  });
  onSpawn?.(child);
  let exited = null;
  // A server killed by a signal exits with code null and the signal's name.
  child.once('exit', (code, signal) => (exited = signal ?? `code ${code}`));
  await waitFor(
    async () => {
      if (exited !== null) throw new Error(`the server exited during start-up (${exited})`);
      try {
        const r = await fetch(`http://127.0.0.1:${p.port}/api/health`);
        return r.ok;
      } catch {
        return false;
      }
    },
    { timeoutMs: 60000, what: 'the server to answer /api/health' },
  );
  return child;
}
