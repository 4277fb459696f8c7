import type { StopView } from '@shoalbook/shared';
import { clockTime } from '@shoalbook/shared';

/** The select's value for "no find, a position". */
export const NO_FIND = '__none__';

/** Server field names shown beside each input of the stop forms. */
export const STOP_SERVER_FIELDS: Record<string, string[]> = {
  find: ['findId'],
  arrivedAt: ['arrivedAt', 'competitionDayId'],
  leftAt: ['leftAt'],
  lat: ['lat'],
  lon: ['lon'],
  waterTemp: ['waterTempF'],
  lure: ['lure'],
  technique: ['technique'],
};

/** A stop as people name it: the find, or "No find" with the position. */
export function stopPlace(stop: Pick<StopView, 'findName' | 'findId' | 'lat' | 'lon'>): string {
  if (stop.findId) return stop.findName ?? 'a find';
  return stop.lat !== null && stop.lon !== null
    ? `No find (${stop.lat.toFixed(5)}, ${stop.lon.toFixed(5)})`
    : 'No find';
}

/** "07:12–08:40 (88 min)" or "since 07:12" on the lake clock. */
export function stopSpan(stop: Pick<StopView, 'arrivedAt' | 'leftAt' | 'minutes'>, timeZone: string): string {
  const from = clockTime(stop.arrivedAt, timeZone);
  if (!stop.leftAt) return `since ${from}, still there`;
  return `${from}–${clockTime(stop.leftAt, timeZone)} (${stop.minutes} min)`;
}

/** "1 catch to check: 74 m from the find" for a stop's catches farther than the attribution radius. */
export function toCheckText(stop: Pick<StopView, 'catchesToCheck'>): string | null {
  const n = stop.catchesToCheck.length;
  if (!n) return null;
  const far = stop.catchesToCheck.map((c) => `${Math.round(c.distanceM)} m`).join(', ');
  return `${n} catch${n === 1 ? '' : 'es'} to check: logged ${far} from the stop's find (more than 50 m). Right stop, or a new find?`;
}
