import Dexie, { type EntityTable } from 'dexie';

/** A write the angler made, kept on the device until the server has acknowledged it. */
export interface SendEntry {
  /** Order of entry (auto-increment): entries of a crew are sent in this order. */
  seq?: number;
  /** The Idempotency-Key sent with every attempt (UUID v7), so a repeat after a lost answer writes nothing. */
  key: string;
  /** The client-made id of the record the entry creates (UUID v7), when it creates one. */
  recordId?: string;
  userId: string;
  crewId: string;
  kind: SendKind;
  method: 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** API path below /api. */
  path: string;
  body?: unknown;
  /** How the screen names the entry, e.g. "3 lb 4 oz largemouth at 08:15". */
  label: string;
  /** What screens filter on, e.g. the competition day a catch belongs to. */
  scope?: string;
  state: 'waiting' | 'needs-you';
  attempts: number;
  /** Epoch ms before which a retry is not due. */
  nextAttemptAt: number;
  /** The server's refusal (needs-you) or the last transient failure (waiting). */
  lastError?: { statusCode: number; message: string; fieldErrors?: Record<string, string[]> };
  createdAt: number;
}

/** What a queued write does: 'find' marks a find or changes one, 'weigh-in' records a day's official figures. */
export type SendKind = 'log-catch' | 'edit-catch' | 'find' | 'weigh-in' | 'stop';

/** One GET answer kept for reading offline. */
export interface KeptRead {
  path: string;
  data: unknown;
  savedAt: number;
}

/**
 * The app's own IndexedDB database (through Dexie): the send queue and the last-read lists. The browser's
 * HTTP cache is not used for API answers (they are `no-store`).
 */
export class DeviceDb extends Dexie {
  sendQueue!: EntityTable<SendEntry, 'seq'>;
  keptReads!: EntityTable<KeptRead, 'path'>;

  constructor(name = 'shoalbook-device') {
    super(name);
    this.version(1).stores({
      sendQueue: '++seq, key, userId, [userId+crewId]',
      keptReads: 'path, savedAt',
    });
  }
}
