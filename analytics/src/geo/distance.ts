import { assertFinite } from '../stats/validate.js';

/** A position in decimal degrees (WGS 84 latitude and longitude). */
export interface LatLon {
  lat: number;
  lon: number;
}

/** Mean Earth radius in metres: R1 = (2a + b)/3 of the WGS 84 ellipsoid, rounded to 0.1 m. */
export const MEAN_EARTH_RADIUS_M = 6_371_008.8;

/** Checks a position in decimal degrees, throwing a RangeError that names the bad field. */
export function assertLatLon(name: string, p: LatLon): void {
  assertFinite(`${name}.lat`, p.lat);
  assertFinite(`${name}.lon`, p.lon);
  if (p.lat < -90 || p.lat > 90) throw new RangeError(`${name}.lat must be within ±90°, got ${p.lat}`);
  if (p.lon < -180 || p.lon > 360) throw new RangeError(`${name}.lon must be within −180°…360°, got ${p.lon}`);
}

/**
 * Great-circle distance in metres between two positions (haversine on a sphere of the mean
 * Earth radius 6,371,008.8 m). Within 0.5 % of the WGS 84 ellipsoid distance between 20° and 60°
 * latitude and 0.6 % anywhere (checked against geographiclib-geodesic); ample for a lake.
 */
export function distanceM(a: LatLon, b: LatLon): number {
  assertLatLon('a', a);
  assertLatLon('b', b);
  return haversineM(a, b);
}

/** distanceM without argument checks, for inner loops over already checked points. */
export function haversineM(a: LatLon, b: LatLon): number {
  const rad = Math.PI / 180;
  const dLat = (b.lat - a.lat) * rad;
  const dLon = (b.lon - a.lon) * rad;
  const h = Math.sin(dLat / 2) ** 2 + Math.cos(a.lat * rad) * Math.cos(b.lat * rad) * Math.sin(dLon / 2) ** 2;
  return 2 * MEAN_EARTH_RADIUS_M * Math.asin(Math.min(1, Math.sqrt(h)));
}
