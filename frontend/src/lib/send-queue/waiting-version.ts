import type { SendKind } from '../device-db';
import { sendQueue } from './runtime';

/**
 * The version a record will have on the server once this user's writes to it still waiting on the phone are in,
 * so a further change made offline carries that one and is not refused as stale. Each sent write raises the
 * version by one (optimistic locking); a first write, sent without a version, creates the record at version 1.
 * Read from the queue when the write is made, not from what a screen last showed.
 */
export async function versionOnceSent(
  record: { userId: string; kind: SendKind; recordId: string },
  serverVersion: number | undefined,
): Promise<number | undefined> {
  const last = (await sendQueue.entries(record.userId))
    .filter((e) => e.state === 'waiting' && e.kind === record.kind && e.recordId === record.recordId)
    .at(-1);
  if (!last) return serverVersion;
  const sentWith = (last.body as { version?: number } | undefined)?.version;
  return sentWith === undefined ? 1 : sentWith + 1;
}
