import { assertFinite } from '../stats/validate.js';
import { standardWeightG, type BassSpecies } from './standard-weight.js';

/**
 * Relative weight Wr = 100 · W / Ws (Wege & Anderson 1978), against {@link standardWeightG}.
 *
 * @param species 'largemouth' | 'smallmouth' | 'spotted'
 * @param totalLengthMm total length in millimetres
 * @param weightG weight in grams (> 0)
 * @returns Wr (dimensionless, about 100 for a fish of standard weight), or `null` when the length
 *   is below the equation's minimum
 */
export function relativeWeight(species: BassSpecies, totalLengthMm: number, weightG: number): number | null {
  assertFinite('weightG', weightG);
  if (weightG <= 0) throw new RangeError(`weightG must be positive, got ${weightG}`);
  const ws = standardWeightG(species, totalLengthMm);
  return ws === null ? null : (100 * weightG) / ws;
}

/** Bounds of relative weight outside which the journal flags an entry for a second look. */
export interface PlausibleRelativeWeight {
  min: number;
  max: number;
}

/**
 * Default bounds: Wr below 60 or above 150. Healthy bass mostly sit within about 80–120 and the
 * management target is commonly quoted as 95–105; real thin or heavy fish (spent or gravid
 * females, fish in a poor year) reach roughly 70–130. Typing errors land much further out: kilograms
 * entered as pounds give Wr ≈ 45, pounds as kilograms ≈ 220, centimetres as inches ≈ 5. So 60 and 150
 * catch the mistakes while leaving genuine thin and fat fish alone. Our choice, documented here.
 */
export const DEFAULT_PLAUSIBLE_RELATIVE_WEIGHT: PlausibleRelativeWeight = Object.freeze({ min: 60, max: 150 });

/**
 * Whether a weight does not fit its length: relative weight outside `bounds`
 * (default {@link DEFAULT_PLAUSIBLE_RELATIVE_WEIGHT}, 60–150). The flag asks for a second look; it never
 * changes the entry.
 *
 * @returns `true`/`false`, or `null` when no standard weight exists at that length (cannot judge)
 */
export function weightLooksWrong(
  species: BassSpecies,
  totalLengthMm: number,
  weightG: number,
  bounds: PlausibleRelativeWeight = DEFAULT_PLAUSIBLE_RELATIVE_WEIGHT,
): boolean | null {
  if (!(bounds.min < bounds.max)) throw new RangeError('bounds.min must be below bounds.max');
  const wr = relativeWeight(species, totalLengthMm, weightG);
  if (wr === null) return null;
  return wr < bounds.min || wr > bounds.max;
}
