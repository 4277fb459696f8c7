import type { ReadCache } from './api-client';
import type { DeviceDb } from './device-db';

/**
 * GET routes kept for reading on the water without signal: who is signed in, the crews, and each crew's
 * lakes, events (with their days and weigh-ins), finds, catches and stops. Reports, exports and photos are
 * not kept: they are large and not needed in the boat.
 */
const KEPT_ROUTES = [
  /^\/auth\/me$/,
  /^\/crews$/,
  /^\/crews\/[^/?]+$/,
  /^\/crews\/[^/?]+\/(lakes|events|finds|catches|stops|competition-days|practice-days)([/?].*)?$/,
];

/** How many answers stay on the device; the oldest go first. */
export const KEPT_READS_LIMIT = 300;

export function deviceReadCache(db: DeviceDb, now: () => number = Date.now): ReadCache {
  return {
    keeps: (path) => KEPT_ROUTES.some((r) => r.test(path)),
    async save(path, data) {
      await db.keptReads.put({ path, data, savedAt: now() });
      const count = await db.keptReads.count();
      if (count > KEPT_READS_LIMIT) {
        const oldest = await db.keptReads
          .orderBy('savedAt')
          .limit(count - KEPT_READS_LIMIT)
          .primaryKeys();
        await db.keptReads.bulkDelete(oldest);
      }
    },
    async load(path) {
      return (await db.keptReads.get(path))?.data;
    },
  };
}

/** Forget every kept answer (sign-out, or someone else signs in on this device). */
export async function forgetKeptReads(db: DeviceDb): Promise<void> {
  await db.keptReads.clear();
}
