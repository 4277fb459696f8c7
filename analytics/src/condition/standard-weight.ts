import { assertFinite } from '../stats/validate.js';

/** Black-bass species with a published standard-weight equation here. */
export type BassSpecies = 'largemouth' | 'smallmouth' | 'spotted';

/** A standard-weight equation log10 Ws = intercept + slope · log10 TL (TL in mm, Ws in g). */
export interface StandardWeightEquation {
  intercept: number;
  slope: number;
  /** Minimum total length (mm) the equation applies to. */
  minTotalLengthMm: number;
  source: string;
}

/**
 * Standard-weight (Ws) equations, metric form, as compiled by Neumann, Guy & Willis (2012),
 * "Length, weight, and associated indices", in Zale, Parrish & Sutton (eds.), Fisheries Techniques,
 * 3rd ed., American Fisheries Society. Coefficients recalled from memory; verify against the publication.
 */
export const STANDARD_WEIGHT_EQUATIONS: Readonly<Record<BassSpecies, StandardWeightEquation>> = Object.freeze({
  largemouth: { intercept: -5.528, slope: 3.273, minTotalLengthMm: 150, source: 'Henson (1991)' },
  smallmouth: { intercept: -5.329, slope: 3.2, minTotalLengthMm: 150, source: 'Kolander et al. (1993)' },
  spotted: { intercept: -5.392, slope: 3.215, minTotalLengthMm: 100, source: 'Wiens et al. (1996)' },
});

function equationFor(species: BassSpecies): StandardWeightEquation {
  const equation = (STANDARD_WEIGHT_EQUATIONS as Record<string, StandardWeightEquation | undefined>)[species];
  if (!equation) throw new RangeError(`no standard-weight equation for species '${String(species)}'`);
  return equation;
}

/**
 * Standard weight Ws in grams at a total length, from log10 Ws = a + b·log10 TL.
 * Sources: largemouth Henson (1991), smallmouth Kolander et al. (1993), spotted Wiens et al. (1996),
 * as compiled by Neumann, Guy & Willis (2012), Fisheries Techniques, 3rd ed.
 *
 * @param species 'largemouth' | 'smallmouth' | 'spotted'
 * @param totalLengthMm total length in millimetres
 * @returns Ws in grams, or `null` below the equation's minimum length
 */
export function standardWeightG(species: BassSpecies, totalLengthMm: number): number | null {
  const equation = equationFor(species);
  assertFinite('totalLengthMm', totalLengthMm);
  if (totalLengthMm < equation.minTotalLengthMm) return null;
  return 10 ** (equation.intercept + equation.slope * Math.log10(totalLengthMm));
}
