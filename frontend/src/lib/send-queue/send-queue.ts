import { v7 as uuidv7 } from 'uuid';
import type { DeviceDb, SendEntry } from '../device-db';
import { retryDelay } from './backoff';

/** What the caller gives; the queue adds the key, order and state. */
export type NewEntry = Omit<SendEntry, 'seq' | 'key' | 'state' | 'attempts' | 'nextAttemptAt' | 'createdAt'>;

/** An answer other than 2xx as the transport reports it (statusCode 0: no answer at all). */
export interface SendFailure {
  statusCode: number;
  message: string;
  code?: string;
  fieldErrors?: Record<string, string[]>;
}

export type SendOutcome =
  | { kind: 'sent'; answer: unknown }
  | { kind: 'refused'; failure: SendFailure }
  | { kind: 'retry'; failure: SendFailure };

/** Sends one entry with its Idempotency-Key; resolves with the server's answer or throws a SendFailure. */
export type Transport = (entry: SendEntry) => Promise<unknown>;

export interface SendQueueOptions {
  now?: () => number;
  random?: () => number;
  /** Schedules the retry timer (window.setTimeout unless a test replaces it). */
  setTimer?: (run: () => void, ms: number) => () => void;
  /** The Web Locks API, so that one tab drains the queue; absent in some browsers and in tests. */
  locks?: Pick<LockManager, 'request'> | null;
}

/** Thrown by enqueue when the device refuses to store more: the old entries stay, the new one is refused. */
export class DeviceStorageFullError extends Error {
  constructor() {
    super(
      'This phone’s storage is full, so this entry was not kept. Free some space (photos, other apps’ data), then try again. Entries already waiting are safe.',
    );
    this.name = 'DeviceStorageFullError';
  }
}

/**
 * Statuses worth trying again unchanged: no answer, the server busy or down, rate limits, a request with the
 * same key still running (409 idempotency_key_in_use) and an expired session (401: waits for sign-in).
 * Every other refusal needs the angler.
 */
export function isTransient(failure: SendFailure): boolean {
  const s = failure.statusCode;
  return (
    s === 0 ||
    s >= 500 ||
    s === 408 ||
    s === 429 ||
    s === 401 ||
    (s === 409 && failure.code === 'idempotency_key_in_use')
  );
}

const LOCK_NAME = 'shoalbook-send-queue';

/**
 * The send queue: every write made on the water goes into IndexedDB first, then to the server, in order,
 * one entry at a time per crew. An entry leaves the queue only when the server has answered 2xx; a crash or
 * a lost answer in between sends it again with the same Idempotency-Key, which the server answers without
 * writing twice. A refusal (4xx) stays on the device as "needs you" with the server's message.
 */
export class SendQueue {
  private readonly now: () => number;
  private readonly random: () => number;
  private readonly setTimer: NonNullable<SendQueueOptions['setTimer']>;
  private readonly locks: SendQueueOptions['locks'];
  private running: Promise<void> | null = null;
  private rerun = false;
  private cancelTimer: (() => void) | null = null;
  private readonly listeners = new Set<(entry: SendEntry, outcome: SendOutcome) => void>();
  private forceNext = false;

  constructor(
    private readonly db: DeviceDb,
    private readonly transport: Transport,
    options: SendQueueOptions = {},
  ) {
    this.now = options.now ?? Date.now;
    this.random = options.random ?? Math.random;
    this.setTimer =
      options.setTimer ??
      ((run, ms) => {
        const id = setTimeout(run, ms);
        return () => clearTimeout(id);
      });
    this.locks = options.locks === undefined ? (globalThis.navigator?.locks ?? null) : options.locks;
  }

  /** Keep a new entry; it is waiting to send from this moment on. */
  async enqueue(input: NewEntry): Promise<SendEntry> {
    const entry: SendEntry = {
      ...input,
      key: uuidv7(),
      state: 'waiting',
      attempts: 0,
      nextAttemptAt: 0,
      createdAt: this.now(),
    };
    try {
      entry.seq = await this.db.sendQueue.add(entry);
    } catch (error) {
      if (isQuotaError(error)) throw new DeviceStorageFullError();
      throw error;
    }
    return entry;
  }

  /** The user's entries in order of entry. */
  entries(userId: string): Promise<SendEntry[]> {
    return this.db.sendQueue.where('userId').equals(userId).sortBy('seq');
  }

  /** Called after every attempt with its outcome (sent with the server's answer, refused, or to retry). */
  onOutcome(listener: (entry: SendEntry, outcome: SendOutcome) => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  /** Called with each entry the server has acknowledged, and its answer. */
  onSent(listener: (entry: SendEntry, answer: unknown) => void): () => void {
    return this.onOutcome((entry, outcome) => {
      if (outcome.kind === 'sent') listener(entry, outcome.answer);
    });
  }

  /**
   * The outcome of the first attempt at `key`, or 'pending' if none comes within `ms` (a weak signal can
   * hold a request for a long time; the entry stays queued either way).
   */
  firstOutcome(key: string, ms: number): Promise<SendOutcome | { kind: 'pending' }> {
    return new Promise((resolve) => {
      const cancel = this.setTimer(() => {
        stop();
        resolve({ kind: 'pending' });
      }, ms);
      const stop = this.onOutcome((entry, outcome) => {
        if (entry.key !== key) return;
        stop();
        cancel();
        resolve(outcome);
      });
    });
  }

  /** Put a refused entry back in line (after the angler changed what it depends on), due at once. */
  async resend(seq: number, body?: unknown): Promise<void> {
    await this.db.sendQueue.update(seq, {
      state: 'waiting',
      attempts: 0,
      nextAttemptAt: 0,
      lastError: undefined,
      ...(body === undefined ? {} : { body }),
    });
  }

  /** Drop an entry on the angler's word. */
  async discard(seq: number): Promise<void> {
    await this.db.sendQueue.delete(seq);
  }

  /** Remove all of a user's entries (sign-out after the angler agreed). */
  async discardAll(userId: string): Promise<void> {
    await this.db.sendQueue.where('userId').equals(userId).delete();
  }

  /**
   * Send what is due, crew by crew, in order. `now: true` ignores the backoff (the network just came back).
   * Concurrent calls share one run; one tab at a time drains when the browser has Web Locks.
   */
  drain(userId: string, { now = false }: { now?: boolean } = {}): Promise<void> {
    if (this.running) {
      this.rerun = true;
      if (now) this.forceNext = true;
      return this.running;
    }
    this.forceNext = now;
    const run = async () => {
      do {
        this.rerun = false;
        const force = this.forceNext;
        this.forceNext = false;
        await this.withLock(() => this.drainOnce(userId, force));
      } while (this.rerun);
    };
    this.running = run().finally(() => {
      this.running = null;
    });
    return this.running;
  }

  /** Stop the retry timer (sign-out, tests). */
  stop(): void {
    this.cancelTimer?.();
    this.cancelTimer = null;
  }

  private async withLock(work: () => Promise<void>): Promise<void> {
    if (!this.locks) return work();
    // Another tab holding the lock is draining the same queue: nothing to do here.
    await this.locks.request(LOCK_NAME, { ifAvailable: true }, async (lock) => {
      if (lock) await work();
    });
  }

  private async drainOnce(userId: string, force: boolean): Promise<void> {
    const entries = await this.entries(userId);
    const crews = [...new Set(entries.map((e) => e.crewId))];
    let nextDue = Infinity;
    for (const crewId of crews) {
      for (const entry of entries.filter((e) => e.crewId === crewId && e.state === 'waiting')) {
        if (!force && entry.nextAttemptAt > this.now()) {
          nextDue = Math.min(nextDue, entry.nextAttemptAt);
          break;
        }
        const outcome = await this.sendOne(entry);
        if (outcome === 'retry') {
          nextDue = Math.min(nextDue, entry.nextAttemptAt);
          break; // keep this crew's order: nothing after it goes first
        }
      }
    }
    this.schedule(userId, nextDue);
  }

  private async sendOne(entry: SendEntry): Promise<'sent' | 'retry' | 'refused'> {
    try {
      const answer = await this.transport(entry);
      await this.db.sendQueue.delete(entry.seq!);
      this.tell(entry, { kind: 'sent', answer });
      return 'sent';
    } catch (error) {
      const failure = asFailure(error);
      const lastError = { statusCode: failure.statusCode, message: failure.message, fieldErrors: failure.fieldErrors };
      if (isTransient(failure)) {
        entry.attempts += 1;
        entry.nextAttemptAt = this.now() + retryDelay(entry.attempts, this.random);
        await this.db.sendQueue.update(entry.seq!, {
          attempts: entry.attempts,
          nextAttemptAt: entry.nextAttemptAt,
          lastError,
        });
        this.tell(entry, { kind: 'retry', failure });
        return 'retry';
      }
      await this.db.sendQueue.update(entry.seq!, { state: 'needs-you', lastError });
      this.tell(entry, { kind: 'refused', failure });
      return 'refused';
    }
  }

  private tell(entry: SendEntry, outcome: SendOutcome): void {
    for (const listener of [...this.listeners]) listener(entry, outcome);
  }

  private schedule(userId: string, due: number): void {
    this.stop();
    if (due === Infinity) return;
    this.cancelTimer = this.setTimer(
      () => {
        this.cancelTimer = null;
        void this.drain(userId).catch(() => undefined);
      },
      Math.max(0, due - this.now()),
    );
  }
}

function asFailure(error: unknown): SendFailure {
  if (error && typeof error === 'object' && typeof (error as SendFailure).statusCode === 'number')
    return error as SendFailure;
  return { statusCode: 0, message: error instanceof Error ? error.message : String(error) };
}

function isQuotaError(error: unknown): boolean {
  const e = error as { name?: string; inner?: { name?: string } } | null;
  return e?.name === 'QuotaExceededError' || e?.inner?.name === 'QuotaExceededError';
}
