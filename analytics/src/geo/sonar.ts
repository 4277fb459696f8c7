import { assertFinite, assertNonNegative } from '../stats/validate.js';

/** Square feet in an international acre (43,560 ft² by definition, NIST Handbook 44 Appendix C). */
export const SQ_FT_PER_ACRE = 43_560;
/** Feet in a statute mile (exactly 5,280 ft). */
export const FT_PER_MILE = 5_280;

function assertBeamAngle(beamAngleDeg: number): void {
  assertFinite('beamAngleDeg', beamAngleDeg);
  if (!(beamAngleDeg > 0 && beamAngleDeg < 180))
    throw new RangeError(`beamAngleDeg must be within (0°, 180°), got ${beamAngleDeg}`);
}

/**
 * Diameter of the sonar cone on the bottom: 2 · depth · tan(angle / 2) (plane trigonometry of a
 * cone of full apex angle `beamAngleDeg`). Same length unit out as in.
 *
 * @param depthM depth (any length unit; metres by name)
 * @param beamAngleDeg full cone angle in degrees; a lower sonar frequency gives a wider cone, a higher one a
 *   narrower cone (the angle depends on the transducer, so take it from its data sheet)
 */
export function beamFootprintM(depthM: number, beamAngleDeg: number): number {
  assertNonNegative('depthM', depthM);
  assertBeamAngle(beamAngleDeg);
  return 2 * depthM * Math.tan(((beamAngleDeg / 2) * Math.PI) / 180);
}

/**
 * Depth at which the second bottom return (the double echo) shows: twice the true depth, since the
 * sound goes bottom → surface → bottom again (common practice: in 20 ft the double echo sits at
 * 40 ft, so the display range must reach at least that). Same unit out as in.
 */
export function doubleEchoDepth(depth: number): number {
  assertNonNegative('depth', depth);
  return 2 * depth;
}

/**
 * Hours to sweep an area with parallel, non-overlapping passes whose width is the beam footprint
 * at the given depth: area / (footprint · speed). Assumes a uniform depth and no turns, so it is
 * a lower bound on the real time.
 *
 * @param areaAcres area to cover in acres (1 acre = 43,560 ft²)
 * @param depthFt depth in feet (> 0)
 * @param beamAngleDeg full cone angle in degrees
 * @param speedMph boat speed in statute miles per hour (> 0), e.g. 25–35 on plane
 * @returns hours
 */
export function coverage(areaAcres: number, depthFt: number, beamAngleDeg: number, speedMph: number): number {
  assertNonNegative('areaAcres', areaAcres);
  assertFinite('depthFt', depthFt);
  if (!(depthFt > 0)) throw new RangeError(`depthFt must be positive, got ${depthFt}`);
  assertFinite('speedMph', speedMph);
  if (!(speedMph > 0)) throw new RangeError(`speedMph must be positive, got ${speedMph}`);
  const swathFt = beamFootprintM(depthFt, beamAngleDeg);
  const pathFt = (areaAcres * SQ_FT_PER_ACRE) / swathFt;
  return pathFt / (speedMph * FT_PER_MILE);
}
