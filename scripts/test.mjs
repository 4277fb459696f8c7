// `npm test`: set everything up on the separate test profile (never the demo database) and run every suite.
// Ends with one line "N passed, N failed" and exits non-zero on any failure.
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { profile, ROOT } from './lib/profile.mjs';
import { stopMariadb } from './lib/mariadb.mjs';
import { buildAll, ensureNpmPackages, ensureSystemPackages } from './lib/setup.mjs';
import { log } from './lib/run.mjs';
import { spawnSync } from 'node:child_process';

// `unit` suites need no database, mail or browser (feedback in seconds); the others start what they need.
const SUITES = [
  { name: 'shared', unit: true, dir: 'shared', args: [] },
  { name: 'analytics', unit: true, dir: 'analytics', args: [] },
  { name: 'fixtures', unit: true, dir: 'fixtures', args: [] },
  { name: 'backend unit', unit: true, dir: 'backend', args: ['--config', 'vitest.unit.config.mts'] },
  { name: 'backend layers', dir: 'backend', args: ['--config', 'vitest.layers.config.mts'] },
  { name: 'backend database', dir: 'backend', args: [] },
  { name: 'frontend components', dir: 'frontend', args: [] },
  { name: 'browser', dir: 'frontend', args: ['--config', 'vitest.e2e.config.ts'] },
];

// `npm test -- unit` runs the unit suites; other words select suites by the start of their names.
const only = process.argv.slice(2);
const selected = SUITES.filter((s) => !only.length || only.some((o) => (o === 'unit' ? s.unit : s.name.startsWith(o))));
const started = Date.now();
ensureNpmPackages();
if (selected.some((s) => s.name === 'browser')) ensureSystemPackages({ chromium: true });
else if (selected.some((s) => !s.unit)) ensureSystemPackages();
const p = profile('test');
buildAll({ frontend: selected.some((s) => !s.unit) });

const resultsDir = join(p.dataDir, 'results');
rmSync(resultsDir, { recursive: true, force: true });
mkdirSync(resultsDir, { recursive: true });

const tally = [];
for (const s of selected) {
  const out = join(resultsDir, `${s.name.replace(/\s+/g, '-')}.json`);
  log(`suite: ${s.name}`);
  const t0 = Date.now();
  const r = spawnSync(
    process.execPath,
    [
      join(ROOT, 'node_modules', 'vitest', 'vitest.mjs'),
      'run',
      ...s.args,
      '--reporter=default',
      '--reporter=json',
      `--outputFile=${out}`,
    ],
    { cwd: join(ROOT, s.dir), stdio: 'inherit', env: { ...process.env, FORCE_COLOR: '1' } },
  );
  let passed = 0;
  let failed = 0;
  if (existsSync(out)) {
    const j = JSON.parse(readFileSync(out, 'utf8'));
    passed = j.numPassedTests;
    failed = j.numFailedTests + (j.numRuntimeErrorTestSuites ?? 0);
    if (j.numTotalTests === 0) failed += 1; // a suite that ran no test is a failure, not a pass
  }
  if (r.status !== 0 && failed === 0) failed = 1; // crashed before reporting, or failed outside a test
  tally.push({ name: s.name, passed, failed, secs: (Date.now() - t0) / 1000 });
}

await stopMariadb(p).catch(() => {});
const passed = tally.reduce((a, t) => a + t.passed, 0);
const failed = tally.reduce((a, t) => a + t.failed, 0);
log('summary:');
for (const t of tally)
  log(
    `  ${t.name.padEnd(20)} ${String(t.passed).padStart(4)} passed ${String(t.failed).padStart(3)} failed  (${t.secs.toFixed(1)} s)`,
  );
log(`total time ${((Date.now() - started) / 1000).toFixed(1)} s`);
process.stdout.write(`${passed} passed, ${failed} failed\n`);
process.exit(failed > 0 ? 1 : 0);
