import { assertNonNegative } from '../stats/validate.js';
import { assertLatLon, haversineM, type LatLon } from './distance.js';

/** The nearest find and its distance in metres. */
export interface NearestFind<T extends LatLon> {
  find: T;
  distanceM: number;
}

/**
 * The find nearest to `point` within `maxM` metres (great-circle, see {@link distanceM}), used to
 * attribute a catch logged by GPS to a find. Ties go to the earlier find in the list.
 *
 * @param point the catch position (decimal degrees)
 * @param finds candidate finds with `lat`/`lon`
 * @param maxM attribution radius in metres (≥ 0), inclusive
 * @returns `{ find, distanceM }`, or `null` when no find lies within `maxM`
 */
export function nearestFind<T extends LatLon>(point: LatLon, finds: readonly T[], maxM: number): NearestFind<T> | null {
  assertLatLon('point', point);
  assertNonNegative('maxM', maxM);
  let best: NearestFind<T> | null = null;
  finds.forEach((find, i) => {
    assertLatLon(`finds[${i}]`, find);
    const d = haversineM(point, find);
    if (d <= maxM && (best === null || d < best.distanceM)) best = { find, distanceM: d };
  });
  return best;
}
