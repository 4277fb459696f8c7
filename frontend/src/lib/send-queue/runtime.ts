import { IDEMPOTENCY_KEY_HEADER } from '@shoalbook/shared';
import { api } from '../api-client';
import { DeviceDb } from '../device-db';
import { deviceReadCache } from '../offline-reads';
import type { SendEntry } from '../device-db';
import { SendQueue, type NewEntry, type Transport } from './send-queue';

/** The app's one device database. */
export const deviceDb = new DeviceDb();

/** Each attempt carries the entry's key as the draft's sf-string: `Idempotency-Key: "…"`. */
const apiTransport: Transport = (entry) =>
  api.request(entry.method, entry.path, {
    body: entry.body,
    headers: { [IDEMPOTENCY_KEY_HEADER]: `"${entry.key}"` },
  });

/** The app's one send queue. */
export const sendQueue = new SendQueue(deviceDb, apiTransport);

api.useReadCache(deviceReadCache(deviceDb));

/** The tag the service worker's background sync wakes the app with (see public/sw-send-queue.js). */
export const BACKGROUND_SYNC_TAG = 'shoalbook-send-queue';

/** Ask the browser to wake us when it has a network again (Background Sync, where the browser has it). */
export function requestBackgroundSync(): void {
  const sw = globalThis.navigator?.serviceWorker;
  if (!sw) return;
  void sw.ready
    .then((reg) => (reg as ServiceWorkerRegistration & { sync?: { register(tag: string): Promise<void> } }).sync)
    .then((sync) => sync?.register(BACKGROUND_SYNC_TAG))
    .catch(() => undefined);
}

/** How long a form waits for the first attempt before it says "waiting to send" and clears for the next entry. */
export const FIRST_ATTEMPT_WAIT_MS = 4_000;

/**
 * Keep a write on the device, then try to send it at once. Resolves when it is safely stored, with the
 * outcome of that first attempt to come ('pending' if it takes longer than `waitMs`).
 */
export async function queueWrite(entry: NewEntry, waitMs = FIRST_ATTEMPT_WAIT_MS) {
  const stored = await sendQueue.enqueue(entry);
  const first = sendQueue.firstOutcome(stored.key, waitMs);
  void sendQueue.drain(entry.userId).catch(() => undefined);
  requestBackgroundSync();
  return { stored, first };
}

/** What a form learns from {@link sendFromForm}: the server's answer, or that the write waits on the phone. */
export type FormSendResult<T> = { kind: 'sent'; answer: T } | { kind: 'waiting'; entry: SendEntry };

/**
 * A write from a form that still shows what was typed: kept in the send queue and tried at once. Sent: the
 * server's answer. Refused: the entry leaves the queue and the refusal is thrown, for the form to show beside
 * the values it still holds (nothing typed is lost). No answer yet: 'waiting', and the queue sends it later.
 */
export async function sendFromForm<T>(entry: NewEntry, waitMs = FIRST_ATTEMPT_WAIT_MS): Promise<FormSendResult<T>> {
  const { stored, first } = await queueWrite(entry, waitMs);
  const outcome = await first;
  if (outcome.kind === 'sent') return { kind: 'sent', answer: outcome.answer as T };
  if (outcome.kind === 'refused') {
    await sendQueue.discard(stored.seq!);
    throw outcome.failure;
  }
  return { kind: 'waiting', entry: stored };
}
