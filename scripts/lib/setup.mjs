// The set-up steps that `npm start`, `npm test` and `npm run bench` share: npm packages, Debian packages, builds.
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync, utimesSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { aptInstall, ensureMariadbInstalled } from './mariadb.mjs';
import { ROOT } from './profile.mjs';
import { log, run } from './run.mjs';

const STAMP = join(ROOT, 'node_modules', '.shoalbook-lock-hash');

/** Install the npm packages when node_modules is missing or older than package-lock.json. */
export function ensureNpmPackages() {
  const lock = readFileSync(join(ROOT, 'package-lock.json'));
  const hash = createHash('sha256').update(lock).digest('hex');
  if (existsSync(STAMP) && readFileSync(STAMP, 'utf8') === hash) return;
  log('installing npm packages (npm ci) …');
  run('npm', ['ci', '--no-audit', '--no-fund'], { cwd: ROOT });
  writeFileSync(STAMP, hash);
}

/** Debian's chromium for the browser tests (never a browser download). */
export function ensureChromium() {
  if (existsSync('/usr/bin/chromium')) return;
  aptInstall(['chromium'], 'Chromium (for the browser tests)');
}

export function ensureSystemPackages({ chromium = false } = {}) {
  ensureMariadbInstalled();
  if (chromium) ensureChromium();
}

const BUILDS = [
  { ws: 'shared', inputs: ['shared/src', 'shared/tsconfig.json'], output: 'shared/dist/index.js' },
  { ws: 'analytics', inputs: ['analytics/src', 'shared/dist'], output: 'analytics/dist/index.js' },
  { ws: 'fixtures', inputs: ['fixtures/src', 'fixtures/files', 'shared/dist'], output: 'fixtures/dist/index.js' },
  {
    ws: 'backend',
    inputs: ['backend/src', 'shared/dist', 'analytics/dist', 'fixtures/dist'],
    output: 'backend/dist/main.js',
  },
  {
    ws: 'frontend',
    inputs: ['frontend/src', 'frontend/index.html', 'frontend/vite.config.ts', 'shared/dist', 'analytics/dist'],
    output: 'frontend/dist/index.html',
  },
];

function newestMtime(path) {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const e of readdirSync(path)) newest = Math.max(newest, newestMtime(join(path, e)));
  return newest;
}

/** Build every workspace in dependency order, skipping those whose output is newer than all their inputs. */
export function buildAll({ frontend = true, force = false } = {}) {
  for (const b of BUILDS) {
    if (b.ws === 'frontend' && !frontend) continue;
    const out = join(ROOT, b.output);
    const outTime = existsSync(out) ? statSync(out).mtimeMs : 0;
    const inTime = Math.max(...b.inputs.map((i) => newestMtime(join(ROOT, i))));
    if (!force && outTime > inTime) continue;
    log(`building ${b.ws} …`);
    run('npm', ['run', 'build', '--silent', '-w', `@shoalbook/${b.ws}`], { cwd: ROOT });
    // tsc leaves an unchanged file's mtime alone: mark the build as done explicitly.
    if (existsSync(out)) utimesSync(out, new Date(), new Date());
  }
}
