import type { SendEntry } from '../device-db';

/**
 * The version a record will have on the server once the writes to it still waiting on this phone are in, so a
 * further change made offline carries that one and is not refused as stale. Each sent write raises the version
 * by one (optimistic locking); a first write, sent without a version, creates the record at version 1.
 * `waiting` are the record's entries in the order they will be sent.
 */
export function versionOnceSent(serverVersion: number | undefined, waiting: SendEntry[]): number | undefined {
  const last = waiting.filter((e) => e.state === 'waiting').at(-1);
  if (!last) return serverVersion;
  const sentWith = (last.body as { version?: number } | undefined)?.version;
  return sentWith === undefined ? 1 : sentWith + 1;
}
