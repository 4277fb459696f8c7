import {
  FIND_KIND_LABELS,
  FOUND_HOW_LABELS,
  type FindKind,
  type FoundHow,
  type VegetationDensity,
} from '@shoalbook/shared';

export const VEGETATION_LABELS: Record<VegetationDensity, string> = {
  none: 'None',
  sparse: 'Sparse',
  moderate: 'Moderate',
  dense: 'Dense',
};

/** What each hardness grade stands for: how strong and sharp the double echo looked. */
export const HARDNESS_LABELS: Record<number, string> = {
  1: '1 · soft: faint, fuzzy double echo',
  2: '2 · soft-firm: weak double echo',
  3: '3 · firm: clear double echo',
  4: '4 · hard: strong double echo',
  5: '5 · very hard: strong, sharp double echo',
};

export const kindLabel = (kind: FindKind) => FIND_KIND_LABELS[kind] ?? kind;
export const foundHowLabel = (how: FoundHow | null) => (how ? (FOUND_HOW_LABELS[how] ?? how) : '—');

/** Position for a table cell, or why it is missing. */
export function positionText(lat: number | null, lon: number | null): string {
  if (lat === null || lon === null) return 'Hidden';
  return `${lat.toFixed(5)}, ${lon.toFixed(5)}`;
}
