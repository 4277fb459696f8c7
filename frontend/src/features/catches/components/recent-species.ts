import { SPECIES, type Species } from '@shoalbook/shared';
import { readDeviceSetting, writeDeviceSetting } from '../../../lib/device-setting';

// A choice of this device (the boat's phone), not of the account: most recently logged first.
const RECENT_KEY = 'shoalbook.recentSpecies';
// The single species remembered before the list: read once so an updated phone keeps its choice.
const LAST_KEY = 'shoalbook.lastSpecies';

const isSpecies = (value: unknown): value is Species =>
  typeof value === 'string' && (SPECIES as readonly string[]).includes(value);

/** The species logged on this device, most recent first (empty when none, or storage is off). */
export function recentSpecies(): Species[] {
  const list = readDeviceSetting<unknown[] | null>(RECENT_KEY, Array.isArray, null);
  if (list) return [...new Set(list.filter(isSpecies))];
  return lastSpeciesBeforeTheList();
}

/** The single species as it was kept before the list: a bare string, not JSON. */
function lastSpeciesBeforeTheList(): Species[] {
  try {
    const last = localStorage.getItem(LAST_KEY);
    return isSpecies(last) ? [last] : [];
  } catch {
    return []; // storage off (private mode): the usual order is fine
  }
}

/** Put the species just logged at the front of the device's list. */
export function rememberSpecies(species: Species): void {
  writeDeviceSetting(RECENT_KEY, [species, ...recentSpecies().filter((s) => s !== species)]);
}

/** Every species once: the recently logged first, then the rest in the usual order. */
export function speciesByRecentUse(recent: readonly Species[]): Species[] {
  return [...recent, ...SPECIES.filter((s) => !recent.includes(s))];
}
