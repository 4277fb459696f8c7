// The send-queue rows of `npm run bench`: the front end's own SendQueue (frontend/src/lib/send-queue), run in
// Node on fake-indexeddb (the in-memory W3C IndexedDB the unit tests use) with a fetch transport, against the
// bench's API server; and a replayed Idempotency-Key against its first request. Loopback only, bounded counts.
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import ts from 'typescript';
import { v7 as uuidv7 } from 'uuid';
import { ROOT } from './profile.mjs';
import { mark, median, msSince } from './timing.mjs';

const QUEUE_SOURCES = ['send-queue/send-queue.ts', 'send-queue/backoff.ts', 'device-db.ts'];
const OUT = join(ROOT, 'backend', 'bench', 'dist', 'send-queue');

/** The queue's TypeScript as ES modules in the bench's build folder (type-only imports vanish, as in Vite). */
async function loadSendQueue() {
  mkdirSync(OUT, { recursive: true });
  for (const source of QUEUE_SOURCES) {
    const text = readFileSync(join(ROOT, 'frontend', 'src', 'lib', source), 'utf8');
    const { outputText } = ts.transpileModule(text, {
      compilerOptions: { module: ts.ModuleKind.ESNext, target: ts.ScriptTarget.ES2022 },
    });
    // Relative imports get the file's extension, as Node's ESM loader wants.
    const js = outputText.replace(/from '\.\/([\w-]+)'/g, "from './$1.mjs'");
    writeFileSync(join(OUT, `${source.split('/').pop().replace(/\.ts$/, '')}.mjs`), js);
  }
  // Dexie finds the IndexedDB global when its database is opened: install the fake first.
  await import('fake-indexeddb/auto');
  const { SendQueue } = await import(pathToFileURL(join(OUT, 'send-queue.mjs')).href);
  const { DeviceDb } = await import(pathToFileURL(join(OUT, 'device-db.mjs')).href);
  return { SendQueue, DeviceDb };
}

/**
 * `session` is the bench's signed-in Session (cookies, CSRF token). Every request, queued or direct, carries an
 * Idempotency-Key and a client-made id, so the drain ratio is what the device side adds: IndexedDB writes and
 * reads, the order and state keeping.
 */
export async function sendQueueRows({ base, session, crewId, catchBody, count = 500, replays = 100, settle }) {
  const { SendQueue, DeviceDb } = await loadSendQueue();
  const path = `/crews/${crewId}/catches`;
  const post = async (body, key) => {
    const res = await fetch(`${base}/api${path}`, {
      method: 'POST',
      headers: {
        cookie: session.cookie,
        'x-csrf-token': session.csrf,
        'content-type': 'application/json',
        'Idempotency-Key': `"${key}"`,
      },
      body: JSON.stringify(body),
    });
    const text = await res.text();
    if (!res.ok) throw Object.assign(new Error(text.slice(0, 200)), { statusCode: res.status, message: text });
    return { answer: text ? JSON.parse(text) : null, replayed: res.headers.get('idempotent-replayed') === 'true' };
  };
  const bodies = (n) => Array.from({ length: n }, () => ({ ...catchBody, id: uuidv7() }));

  // Warm the route (JIT, connection pool) before either series.
  for (const body of bodies(20)) await post(body, uuidv7());
  await settle();

  let t = mark();
  for (const body of bodies(count)) await post(body, uuidv7());
  const directMs = msSince(t);
  await settle();

  const db = new DeviceDb(`bench-send-queue-${Date.now()}`);
  const queue = new SendQueue(db, async (entry) => (await post(entry.body, entry.key)).answer, { locks: null });
  for (const body of bodies(count)) {
    await queue.enqueue({
      userId: 'bench',
      crewId,
      kind: 'log-catch',
      method: 'POST',
      path,
      body,
      recordId: body.id,
      label: 'bench catch',
    });
  }
  let sent = 0;
  queue.onSent(() => (sent += 1));
  t = mark();
  await queue.drain('bench', { now: true });
  const queueMs = msSince(t);
  queue.stop();
  const left = (await queue.entries('bench')).length;
  db.close();
  await db.delete();
  if (sent !== count || left !== 0)
    throw new Error(`the send queue sent ${sent} of ${count}; ${left} left on the device`);
  await settle();

  const firsts = [];
  const again = [];
  for (const body of bodies(replays)) {
    const key = uuidv7();
    t = mark();
    const first = await post(body, key);
    firsts.push(msSince(t));
    t = mark();
    const replay = await post(body, key);
    again.push(msSince(t));
    if (first.replayed || !replay.replayed || replay.answer.id !== first.answer.id)
      throw new Error('a replay with a stored Idempotency-Key was not answered from the store');
  }
  return {
    drain: { count, directMs, queueMs },
    replay: { n: replays, firstP50: median(firsts), replayP50: median(again) },
  };
}
