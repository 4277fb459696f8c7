// `npm start`: set everything up and run Shoalbook with its demo data on http://127.0.0.1:${PORT:-3000}.
// Reuses what is already there, so a second run is ready in seconds. Ctrl-C stops everything cleanly.
import { profile } from './lib/profile.mjs';
import { ourPid, stopMariadb } from './lib/mariadb.mjs';
import { portOpen, prepareDatabase, seed, startBackend, startFakeSmtp } from './lib/services.mjs';
import { buildAll, ensureNpmPackages, ensureSystemPackages } from './lib/setup.mjs';
import { fail, isRunning, log, stopChild } from './lib/run.mjs';

const DEMO_ACCOUNTS = [
  ['owner@demo.test', 'crew owner'],
  ['angler@demo.test', 'angler in the crew'],
  ['viewer@demo.test', "viewer (the crew's coach)"],
  ['admin@demo.test', 'site admin'],
  ['rival@demo.test', 'owner of a second, separate crew'],
];

const started = Date.now();
const children = [];
let p;
let stopping = false;
// Only a database this run started is stopped on exit; one that was already running is left alone.
let ownsDatabase = false;

async function stopAll(code = 0) {
  if (stopping) return stopNow();
  stopping = true;
  log('stopping …');
  for (const c of [...children].reverse()) await stopChild(c);
  if (p && ownsDatabase) await stopMariadb(p).catch(() => {});
  log(`stopped; your data is kept in .data/${p?.name ?? 'demo'}`);
  process.exit(code);
}

// A second Ctrl-C or SIGTERM while stopping: kill the children and leave MariaDB finishing its own shutdown.
function stopNow() {
  log('stopping at once …');
  for (const c of children) if (isRunning(c)) c.kill('SIGKILL');
  const dbPid = p && ownsDatabase ? ourPid(p) : null;
  if (dbPid) process.kill(dbPid, 'SIGTERM');
  process.exit(1);
}
process.on('SIGINT', () => stopAll(0));
process.on('SIGTERM', () => stopAll(0));

try {
  ensureNpmPackages();
  ensureSystemPackages();
  // SHOALBOOK_START_PROFILE lets the `npm start` test run this on its own profile (see profile.mjs).
  p = profile(process.env.SHOALBOOK_START_PROFILE || 'demo');
  if (await portOpen(p.port)) {
    fail(
      `port ${p.port} is already in use: is Shoalbook already running? Stop it with Ctrl-C, or set PORT to a free port.`,
    );
  }
  buildAll();
  log('starting MariaDB and running migrations …');
  ownsDatabase = !ourPid(p); // known before the start-up ends, so a Ctrl-C during it stops this database too
  ownsDatabase = !(await prepareDatabase(p)).reused;
  seed(p);
  const track = (c) => children.push(c);
  await startFakeSmtp(p, { onSpawn: track });
  const server = await startBackend(p, {}, 'inherit', track);
  server.once('exit', (code, signal) => {
    if (!stopping) {
      log(`the server stopped unexpectedly (${signal ?? `code ${code}`})`);
      stopAll(1);
    }
  });
  const secs = ((Date.now() - started) / 1000).toFixed(1);
  log(`Shoalbook is running on http://127.0.0.1:${p.port}  (ready in ${secs} s)`);
  log(
    `API docs: http://127.0.0.1:${p.port}/api/docs   e-mail outbox (sign in as admin@demo.test): http://127.0.0.1:${p.port}/dev/outbox`,
  );
  log('Demo accounts (password: shoalbook-demo):');
  for (const [email, what] of DEMO_ACCOUNTS) log(`  ${email.padEnd(18)} ${what}`);
  log('Press Ctrl-C to stop.');
} catch (e) {
  process.stderr.write(`\n${e.stack ?? e}\n`);
  if (children.length || p) await stopAll(1);
  fail(e.message);
}
