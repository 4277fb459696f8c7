import { assertFinite } from '../stats/validate.js';
import { cleanLb } from './units.js';

/** English ordinal: 1st, 2nd, 3rd, 4th, 11th, 12th, 13th, 21st, 22nd, 101st, 111th. */
export function ordinal(n: number): string {
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`ordinal needs a positive integer, got ${n}`);
  const tens = n % 100;
  const last = n % 10;
  const suffix = tens >= 11 && tens <= 13 ? 'th' : last === 1 ? 'st' : last === 2 ? 'nd' : last === 3 ? 'rd' : 'th';
  return `${n}${suffix}`;
}

/** A place against its field: the place, the field size and the share of the field at or above it. */
export interface FieldStanding {
  /** "26th of 180 (top 15 %)", or "26th" without a field size. */
  place: string | null;
  /** Share of the field at or above the place, rounded up to a whole percent (26 of 180 → 15). */
  topPercent: number | null;
  /** Winning weight − this weight (lb); 0 for the winning weight. */
  behindWinnerLb: number | null;
  /** This weight − the cut weight (lb): negative when short of the cut. */
  overCutLb: number | null;
  /** "4.20 lb behind the winner", "1.30 lb over the cut" and such, for the reading. */
  readings: string[];
}

/**
 * Where a place and a weight stand in the field the angler entered from the results sheet. A place beyond the
 * field size is refused (the figures disagree); missing figures just leave their part out.
 */
export function fieldStanding(input: {
  place: number | null;
  fieldSize: number | null;
  weightLb: number | null;
  winningLb: number | null;
  cutLb: number | null;
}): FieldStanding {
  const { place, fieldSize, weightLb, winningLb, cutLb } = input;
  if (place !== null && (!Number.isInteger(place) || place < 1)) throw new RangeError(`place must be a positive integer, got ${place}`);
  if (fieldSize !== null && (!Number.isInteger(fieldSize) || fieldSize < 1))
    throw new RangeError(`fieldSize must be a positive integer, got ${fieldSize}`);
  if (place !== null && fieldSize !== null && place > fieldSize)
    throw new RangeError(`place ${place} is beyond the field of ${fieldSize}`);
  for (const [name, v] of [['weightLb', weightLb], ['winningLb', winningLb], ['cutLb', cutLb]] as const)
    if (v !== null) assertFinite(name, v);
  const topPercent = place !== null && fieldSize !== null ? Math.ceil((place / fieldSize) * 100 - 1e-9) : null;
  const placeText =
    place === null ? null : fieldSize === null ? ordinal(place) : `${ordinal(place)} of ${fieldSize} (top ${topPercent} %)`;
  const behindWinnerLb = weightLb !== null && winningLb !== null ? cleanLb(Math.max(0, winningLb - weightLb)) : null;
  const overCutLb = weightLb !== null && cutLb !== null ? cleanLb(weightLb - cutLb) : null;
  const readings: string[] = [];
  if (placeText) readings.push(placeText);
  if (behindWinnerLb !== null)
    readings.push(behindWinnerLb === 0 ? 'the winning weight' : `${behindWinnerLb.toFixed(2)} lb behind the winner`);
  if (overCutLb !== null)
    readings.push(
      overCutLb >= 0 ? `${overCutLb.toFixed(2)} lb over the cut` : `${(-overCutLb).toFixed(2)} lb short of the cut`,
    );
  return { place: placeText, topPercent, behindWinnerLb, overCutLb, readings };
}
