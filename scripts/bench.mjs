// `npm run bench`: the read-model benchmark, side by side in one run, on the separate bench profile (its own
// MariaDB, database and ports; loopback only). Seeded and bounded: a fixed generator seed, a fixed number of
// requests per latency series, autocannon runs capped in both time and request count.
//   BENCH_SCALE=0.1 npm run bench   runs on a tenth of the data (a quick look; the figures in reports use 1).
import { spawn, spawnSync } from 'node:child_process';
import { join } from 'node:path';
import autocannon from 'autocannon';
import mariadb from 'mariadb';
import { sqlAsRoot } from './lib/mariadb.mjs';
import { backendEnv, profile, ROOT } from './lib/profile.mjs';
import { log, waitFor } from './lib/run.mjs';
import { buildBackend, prepareDatabase, startFakeSmtp } from './lib/services.mjs';

const SCALE = Number(process.env.BENCH_SCALE ?? 1);
const LATENCY_REQUESTS = 100;
const AD_HOC_REQUESTS = 20;
const SERIES_TIME_LIMIT_MS = 60_000;
const LOAD = { connections: 10, duration: 10, amount: 15_000 };
const BENCH_DIST = join(ROOT, 'backend', 'bench', 'dist');

function node(script, args, env, { capture = false } = {}) {
  const r = spawnSync(process.execPath, [script, ...args], { cwd: join(ROOT, 'backend'), env, stdio: capture ? ['ignore', 'pipe', 'inherit'] : 'inherit', encoding: 'utf8', maxBuffer: 1 << 26 });
  if (r.status !== 0) throw new Error(`${script} exited with ${r.status}`);
  return capture ? r.stdout : '';
}

/** A tiny cookie-keeping HTTP client for the set-up calls. */
class Session {
  constructor(base) {
    this.base = base;
    this.cookies = new Map();
    this.csrf = '';
  }
  get cookie() {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }
  async request(method, path, body) {
    const headers = { cookie: this.cookie, 'x-csrf-token': this.csrf };
    if (body !== undefined) headers['content-type'] = 'application/json';
    const res = await fetch(this.base + path, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(';');
      const i = pair.indexOf('=');
      this.cookies.set(pair.slice(0, i), pair.slice(i + 1));
    }
    const text = await res.text();
    const json = text ? JSON.parse(text) : null;
    if (res.status >= 400) throw new Error(`${method} ${path}: ${res.status} ${text.slice(0, 300)}`);
    return json;
  }
  async refreshCsrf() {
    this.csrf = (await this.request('GET', '/api/auth/csrf')).csrfToken;
  }
}

function percentile(sorted, q) {
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
}

/** p50/p95 of sequential GETs (after a short warm-up), bounded in count and time. */
async function latency(session, path, count) {
  for (let i = 0; i < 3; i++) await session.request('GET', path);
  const times = [];
  const started = Date.now();
  while (times.length < count && Date.now() - started < SERIES_TIME_LIMIT_MS) {
    const t = process.hrtime.bigint();
    await session.request('GET', path);
    times.push(Number(process.hrtime.bigint() - t) / 1e6);
  }
  times.sort((a, b) => a - b);
  return { n: times.length, p50: percentile(times, 0.5), p95: percentile(times, 0.95) };
}

function load(url, session, body) {
  return new Promise((resolve, reject) => {
    autocannon(
      {
        url,
        method: 'POST',
        connections: LOAD.connections,
        duration: LOAD.duration,
        amount: LOAD.amount,
        headers: { cookie: session.cookie, 'x-csrf-token': session.csrf, 'content-type': 'application/json' },
        body: JSON.stringify(body),
      },
      (err, result) => (err ? reject(err) : resolve(result)),
    );
  });
}

const fmt = (x, digits = 1) => (x === undefined || x === null || Number.isNaN(x) ? '–' : x.toFixed(digits));

async function main() {
  const p = profile('bench');
  log('building the back end and the bench code');
  buildBackend();
  const tsc = join(ROOT, 'node_modules', 'typescript', 'bin', 'tsc');
  const built = spawnSync(process.execPath, [tsc, '-p', join(ROOT, 'backend', 'bench', 'tsconfig.json')], { stdio: 'inherit' });
  if (built.status !== 0) throw new Error('the bench code did not compile');

  log(`bench database on port ${p.dbPort} (fresh)`);
  await prepareDatabase(p, { fresh: true });
  // The bench profile's own server: a buffer pool that holds the million-row tables (this machine has the memory).
  sqlAsRoot(p, 'SET GLOBAL innodb_buffer_pool_size = 3221225472');
  const smtp = await startFakeSmtp(p, { clearOutbox: true });
  const env = backendEnv(p, { NODE_ENV: 'development' });
  const server = spawn(process.execPath, [join(BENCH_DIST, 'bench', 'bench-server.js')], { cwd: join(ROOT, 'backend'), env, stdio: ['ignore', 'inherit', 'inherit'] });
  const base = `http://127.0.0.1:${p.port}`;
  const results = {};
  try {
    await waitFor(async () => (await fetch(`${base}/api/health`).catch(() => null))?.ok ?? false, { timeoutMs: 60_000, what: 'the bench server' });
    const owner = new Session(base);
    await owner.refreshCsrf();
    const me = await owner.request('POST', '/api/auth/sign-up', { email: 'bench-owner@example.test', password: 'bench passphrase for the crew', displayName: 'Bench Owner' });
    await owner.refreshCsrf();
    const crew = await owner.request('POST', '/api/crews', { name: 'Bench Crew' });

    log(`generating the bench crew (scale ${SCALE}: ${Math.round(200 * SCALE)} events, ${Math.round(20_000 * SCALE)} finds, ${Math.round(1_000_000 * SCALE)} catches)`);
    results.generated = JSON.parse(node(join(BENCH_DIST, 'bench', 'generate.js'), [crew.id, me.user.id, String(SCALE)], env, { capture: true }));
    log(`generated ${results.generated.journalEvents} journal events in ${results.generated.seconds.toFixed(0)} s`);

    log('rebuilding the read models (and a bulk INSERT of as many rows)');
    results.rebuild = JSON.parse(node(join(BENCH_DIST, 'bench', 'rebuild-bench.js'), [], env, { capture: true }));

    const lakes = await owner.request('GET', `/api/crews/${crew.id}/lakes`);
    const lakeId = lakes[0].id;
    const q = `lakeId=${lakeId}&by=kind`;
    log('report latency');
    results.latency = {
      hitRates: await latency(owner, `/api/crews/${crew.id}/reports/hit-rates?${q}`, LATENCY_REQUESTS),
      hitRatesAdHoc: await latency(owner, `/api/crews/${crew.id}/bench/ad-hoc/hit-rates?${q}`, AD_HOC_REQUESTS),
      comparison: await latency(owner, `/api/crews/${crew.id}/reports/lake-comparison?${q}`, LATENCY_REQUESTS),
      comparisonAdHoc: await latency(owner, `/api/crews/${crew.id}/bench/ad-hoc/lake-comparison?${q}`, AD_HOC_REQUESTS),
      bareSelect: await latency(owner, `/api/crews/${crew.id}/bench/bare-select?${q}`, LATENCY_REQUESTS),
    };

    log('log-catch throughput (autocannon, loopback)');
    const events = await owner.request('GET', `/api/crews/${crew.id}/events?lakeId=${lakeId}`);
    const event = events[events.length - 1];
    const days = await owner.request('GET', `/api/crews/${crew.id}/events/${event.id}/competition-days`);
    const finds = await owner.request('GET', `/api/crews/${crew.id}/finds?eventId=${event.id}&limit=5`);
    const catchBody = { competitionDayId: days[0].id, caughtAt: '10:30', findId: finds[0].id, species: 'largemouth', weightLb: 2.5, fate: 'released' };
    results.logCatch = await load(`${base}/api/crews/${crew.id}/catches`, owner, catchBody);
    const loadEnded = Date.now();
    const db = await mariadb.createConnection({ host: '127.0.0.1', port: p.dbPort, user: p.dbUser, password: p.secrets.dbPassword, database: p.dbName });
    await waitFor(
      async () => {
        const [row] = await db.query("SELECT (SELECT MAX(seq) FROM journal_event) - (SELECT last_seq FROM projection_checkpoint WHERE name = 'journal') AS behind");
        return Number(row.behind) <= 0;
      },
      { timeoutMs: 120_000, intervalMs: 20, what: 'the projection to catch up' },
    );
    results.projectionLagMs = Date.now() - loadEnded;
    await db.end();
    results.bare = await load(`${base}/api/crews/${crew.id}/bench/bare-write`, owner, {});
  } finally {
    server.kill('SIGTERM');
    smtp.kill('SIGTERM');
  }
  report(results);
}

function report(r) {
  const l = r.latency;
  const rebuildRate = (r.rebuild.events / r.rebuild.rebuildMs) * 1000;
  const bulkRate = (r.rebuild.bulkRows / r.rebuild.bulkMs) * 1000;
  const rows = [
    ['hit rates (read model)', `p50 ${fmt(l.hitRates.p50)} ms, p95 ${fmt(l.hitRates.p95)} ms (n=${l.hitRates.n})`, `ad hoc GROUP BY p50 ${fmt(l.hitRatesAdHoc.p50)} ms, p95 ${fmt(l.hitRatesAdHoc.p95)} ms (n=${l.hitRatesAdHoc.n})`, `${fmt(l.hitRatesAdHoc.p50 / l.hitRates.p50)}× faster`, '≥ 20×'],
    ['hit rates vs bare SELECT', `p50 ${fmt(l.hitRates.p50)} ms`, `bare SELECT p50 ${fmt(l.bareSelect.p50)} ms, p95 ${fmt(l.bareSelect.p95)} ms`, `${fmt(l.hitRates.p50 / l.bareSelect.p50, 2)}× the bare SELECT`, '≤ 1.5×'],
    ['lake comparison (read model)', `p50 ${fmt(l.comparison.p50)} ms, p95 ${fmt(l.comparison.p95)} ms (n=${l.comparison.n})`, `ad hoc GROUP BY p50 ${fmt(l.comparisonAdHoc.p50)} ms, p95 ${fmt(l.comparisonAdHoc.p95)} ms (n=${l.comparisonAdHoc.n})`, `${fmt(l.comparisonAdHoc.p50 / l.comparison.p50)}× faster`, '≥ 20×'],
    ['lake comparison vs bare SELECT', `p50 ${fmt(l.comparison.p50)} ms`, `bare SELECT p50 ${fmt(l.bareSelect.p50)} ms`, `${fmt(l.comparison.p50 / l.bareSelect.p50, 2)}× the bare SELECT`, '≤ 1.5×'],
    ['projection rebuild', `${r.rebuild.events} events in ${fmt(r.rebuild.rebuildMs / 1000, 2)} s = ${fmt(rebuildRate, 0)} events/s`, `bulk INSERT of ${r.rebuild.bulkRows} rows: ${fmt(bulkRate, 0)} rows/s`, `${fmt(rebuildRate / bulkRate, 2)}× the bulk INSERT rate`, '≥ 100,000 events/s'],
    ['log catch (incl. projection)', `${fmt(r.logCatch.requests.average, 0)} req/s, p50 ${r.logCatch.latency.p50} ms, p99 ${r.logCatch.latency.p99} ms, ${r.logCatch['2xx']} ok / ${r.logCatch.non2xx} not`, `bare Nest route: ${fmt(r.bare.requests.average, 0)} req/s, p99 ${r.bare.latency.p99} ms`, `${fmt(r.logCatch.requests.average / r.bare.requests.average, 2)}× the bare route; projection caught up ${r.projectionLagMs} ms after the load`, '≥ 800 req/s, p99 ≤ 50 ms'],
  ];
  const head = ['measure', 'Shoalbook', 'side by side', 'ratio', 'target'];
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((row) => row[i].length)));
  const line = (cells) => `| ${cells.map((c, i) => c.padEnd(widths[i])).join(' | ')} |`;
  const out = [
    `bench crew: ${r.generated.events} events, ${r.generated.finds} finds, ${r.generated.catches} catches, ${r.generated.journalEvents} journal events (generated in ${fmt(r.generated.seconds, 0)} s, seed fixed)`,
    line(head),
    `|${widths.map((w) => '-'.repeat(w + 2)).join('|')}|`,
    ...rows.map(line),
  ];
  process.stdout.write(`\n${out.join('\n')}\n`);
}

main().then(
  () => process.exit(0),
  (e) => {
    process.stderr.write(`bench failed: ${e instanceof Error ? `${e.stack}${e.cause ? `\ncause: ${e.cause.stack ?? e.cause}` : ''}` : String(e)}\n`);
    process.exit(1);
  },
);
