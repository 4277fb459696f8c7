import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { DeviceDb, type SendEntry } from '../device-db';
import { BACKOFF_BASE_MS, BACKOFF_CAP_MS, retryDelay } from './backoff';
import { SendQueue, type SendFailure, type Transport } from './send-queue';

/*
 * The queue runs on fake-indexeddb (a complete in-memory IndexedDB, the W3C API the browser provides) and a
 * stand-in server that honours Idempotency-Key as the real API does (same key: the first answer, no new row).
 */
function fakeServer() {
  const rows: { key: string; body: unknown }[] = [];
  const answers = new Map<string, unknown>();
  const sent: string[] = [];
  let failNext: SendFailure | null = null;
  let loseNextAnswer = false;
  const transport: Transport = async (entry: SendEntry) => {
    sent.push(entry.key);
    if (failNext) {
      const f = failNext;
      failNext = null;
      throw f;
    }
    let answer = answers.get(entry.key);
    if (answer === undefined) {
      rows.push({ key: entry.key, body: entry.body });
      answer = { id: entry.recordId, n: rows.length };
      answers.set(entry.key, answer);
    }
    if (loseNextAnswer) {
      loseNextAnswer = false;
      // The write committed, but the answer never reached the phone (signal dropped, tab killed).
      throw { statusCode: 0, message: 'network lost' } satisfies SendFailure;
    }
    return answer;
  };
  return {
    rows,
    sent,
    transport,
    failOnce: (f: SendFailure) => (failNext = f),
    loseNextAnswer: () => (loseNextAnswer = true),
  };
}

const entry = (n: number, crewId = 'crew-a') => ({
  userId: 'user-1',
  crewId,
  kind: 'log-catch' as const,
  method: 'POST' as const,
  path: `/crews/${crewId}/catches`,
  body: { n },
  recordId: `rec-${n}`,
  label: `catch ${n}`,
});

describe('send queue', () => {
  let db: DeviceDb;
  let clock: number;
  let timers: { run: () => void; at: number }[];
  const options = () => ({
    now: () => clock,
    random: () => 0.5,
    setTimer: (run: () => void, ms: number) => {
      const t = { run, at: clock + ms };
      timers.push(t);
      return () => (timers = timers.filter((x) => x !== t));
    },
    locks: null,
  });

  beforeEach(() => {
    db = new DeviceDb(`test-${Math.random()}`);
    clock = 1_000_000;
    timers = [];
  });
  afterEach(async () => {
    await db.delete();
  });

  it('keeps entries across a reopened database and sends them in order, each once', async () => {
    const server = fakeServer();
    const first = new SendQueue(db, server.transport, options());
    for (const n of [1, 2, 3]) await first.enqueue(entry(n));
    // The tab is closed before anything is sent: a new queue on a new connection finds all three.
    db.close();
    db = new DeviceDb(db.name);
    const queue = new SendQueue(db, server.transport, options());
    expect((await queue.entries('user-1')).map((e) => e.label)).toEqual(['catch 1', 'catch 2', 'catch 3']);
    await queue.drain('user-1');
    expect(server.rows.map((r) => r.body)).toEqual([{ n: 1 }, { n: 2 }, { n: 3 }]);
    expect(await queue.entries('user-1')).toEqual([]);
  });

  it('gives every entry its own UUID v7 Idempotency-Key (RFC 9562 §5.7: version nibble 7, variant 10)', async () => {
    const queue = new SendQueue(db, fakeServer().transport, options());
    const a = await queue.enqueue(entry(1));
    const b = await queue.enqueue(entry(2));
    for (const k of [a.key, b.key])
      expect(k).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-7[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect(a.key).not.toBe(b.key);
  });

  it('on no network keeps the order: the first entry waits with a backoff and nothing after it goes first', async () => {
    const server = fakeServer();
    const queue = new SendQueue(db, server.transport, options());
    await queue.enqueue(entry(1));
    await queue.enqueue(entry(2));
    server.failOnce({ statusCode: 0, message: 'offline' });
    await queue.drain('user-1');
    expect(server.rows).toEqual([]);
    const [waiting] = await queue.entries('user-1');
    expect(waiting).toMatchObject({ state: 'waiting', attempts: 1, lastError: { statusCode: 0 } });
    // random() = 0.5 of the first ceiling (the base delay).
    expect(waiting!.nextAttemptAt).toBe(clock + BACKOFF_BASE_MS / 2);
    expect(timers).toHaveLength(1);
    // Not due yet: a drain sends nothing.
    await queue.drain('user-1');
    expect(server.rows).toEqual([]);
    // The timer fires when due.
    clock = timers[0]!.at;
    timers[0]!.run();
    await queue.drain('user-1');
    expect(server.rows.map((r) => r.body)).toEqual([{ n: 1 }, { n: 2 }]);
  });

  it('sends at once when the network returns, whatever the backoff', async () => {
    const server = fakeServer();
    const queue = new SendQueue(db, server.transport, options());
    await queue.enqueue(entry(1));
    server.failOnce({ statusCode: 503, message: 'down' });
    await queue.drain('user-1');
    expect(server.rows).toHaveLength(0);
    await queue.drain('user-1', { now: true });
    expect(server.rows).toHaveLength(1);
  });

  it('moves a refusal to "needs you" with the server message and goes on with the rest; nothing is dropped', async () => {
    const server = fakeServer();
    const queue = new SendQueue(db, server.transport, options());
    await queue.enqueue(entry(1));
    await queue.enqueue(entry(2));
    const refusal = {
      statusCode: 400,
      message: 'Check the field "caughtAt": outside the day',
      fieldErrors: { caughtAt: ['outside the day'] },
    };
    server.failOnce(refusal);
    await queue.drain('user-1');
    expect(server.rows.map((r) => r.body)).toEqual([{ n: 2 }]);
    const left = await queue.entries('user-1');
    expect(left).toHaveLength(1);
    expect(left[0]).toMatchObject({ state: 'needs-you', body: { n: 1 }, lastError: refusal });
    // Later drains leave it alone until the angler acts.
    await queue.drain('user-1', { now: true });
    expect(server.rows).toHaveLength(1);
    await queue.resend(left[0]!.seq!, { n: 1, fixed: true });
    await queue.drain('user-1');
    expect(server.rows.map((r) => r.body)).toEqual([{ n: 2 }, { n: 1, fixed: true }]);
  });

  it('treats 401, 429 and a 409 "key still in use" as passing trouble, and 403 (left the crew) as needing the angler', async () => {
    const server = fakeServer();
    const queue = new SendQueue(db, server.transport, options());
    await queue.enqueue(entry(1));
    for (const f of [
      { statusCode: 401, message: 'Sign in first.' },
      { statusCode: 429, message: 'Slow down.' },
      { statusCode: 409, message: 'still running', code: 'idempotency_key_in_use' },
    ]) {
      server.failOnce(f);
      await queue.drain('user-1', { now: true });
      expect((await queue.entries('user-1'))[0]!.state).toBe('waiting');
    }
    server.failOnce({ statusCode: 403, message: 'Viewers can read this crew’s journal but not change it.' });
    await queue.drain('user-1', { now: true });
    expect((await queue.entries('user-1'))[0]!.state).toBe('needs-you');
  });

  it('after a crash between "sent" and "acknowledged" sends again with the same key: the server writes once', async () => {
    const server = fakeServer();
    const queue = new SendQueue(db, server.transport, options());
    const queued = await queue.enqueue(entry(7));
    server.loseNextAnswer();
    await queue.drain('user-1');
    expect(server.rows).toHaveLength(1);
    expect(await queue.entries('user-1')).toHaveLength(1);
    const acked: unknown[] = [];
    queue.onSent((_e, answer) => acked.push(answer));
    await queue.drain('user-1', { now: true });
    expect(server.sent).toEqual([queued.key, queued.key]);
    expect(server.rows).toHaveLength(1);
    expect(acked).toEqual([{ id: 'rec-7', n: 1 }]);
    expect(await queue.entries('user-1')).toEqual([]);
  });

  it('drains crews independently: one crew waiting on a failure does not hold up another', async () => {
    const server = fakeServer();
    const queue = new SendQueue(db, server.transport, options());
    await queue.enqueue(entry(1, 'crew-a'));
    await queue.enqueue(entry(2, 'crew-a'));
    await queue.enqueue(entry(3, 'crew-b'));
    server.failOnce({ statusCode: 0, message: 'offline' });
    await queue.drain('user-1');
    expect(server.rows.map((r) => r.body)).toEqual([{ n: 3 }]);
  });

  it('sends only the signed-in user’s entries', async () => {
    const server = fakeServer();
    const queue = new SendQueue(db, server.transport, options());
    await queue.enqueue({ ...entry(1), userId: 'someone-else' });
    await queue.drain('user-1');
    expect(server.rows).toEqual([]);
    expect(await queue.entries('someone-else')).toHaveLength(1);
  });

  it('with Web Locks, a second tab finds the lock taken and sends nothing', async () => {
    const server = fakeServer();
    let held = false;
    const locks = {
      request: (async (_name: string, opts: LockOptions, cb: (lock: Lock | null) => Promise<void>) => {
        if (held && opts.ifAvailable) return cb(null);
        held = true;
        try {
          return await cb({ name: 'x', mode: 'exclusive' } as Lock);
        } finally {
          held = false;
        }
      }) as unknown as LockManager['request'],
    };
    let release!: () => void;
    const slow: Transport = (e) => new Promise((r) => (release = () => r(server.transport(e))));
    const tabA = new SendQueue(db, slow, { ...options(), locks });
    const tabB = new SendQueue(db, server.transport, { ...options(), locks });
    await tabA.enqueue(entry(1));
    const a = tabA.drain('user-1');
    await new Promise((r) => setTimeout(r, 20));
    await tabB.drain('user-1');
    expect(server.sent).toEqual([]);
    release();
    await a;
    expect(server.rows).toHaveLength(1);
  });
});

describe('retryDelay (exponential backoff with full jitter)', () => {
  it('stays between 0 and min(cap, base·2^(n−1))', () => {
    expect(retryDelay(1, () => 0.999)).toBe(Math.floor(0.999 * BACKOFF_BASE_MS));
    expect(retryDelay(3, () => 0.5)).toBe(BACKOFF_BASE_MS * 2);
    expect(retryDelay(1, () => 0)).toBe(0);
    expect(retryDelay(40, () => 0.999)).toBeLessThan(BACKOFF_CAP_MS);
    expect(retryDelay(40, () => 0.5)).toBe(BACKOFF_CAP_MS / 2);
  });
});
