import { assertFinite, assertNonNegative } from '../stats/validate.js';

/** A fish brought to the weigh-in. */
export interface BagFish {
  id: string | number;
  /** Weight in decimal pounds. */
  weightLb: number;
  /** Total length in inches; when absent the fish is taken as legal (not measured here). */
  lengthIn?: number | null;
  /** True when the fish is dead at the weigh-in. */
  dead?: boolean | null;
}

/** The event's bag rules (per event, never constants: follow the event's rules and the state agency). */
export interface BagRules {
  /** Fish counted per day, e.g. 5 (common practice). */
  fishPerDay: number;
  /** Minimum total length in inches, e.g. 12 (common practice); absent = no minimum. */
  minLengthIn?: number | null;
  /** Pounds deducted for each dead fish that is counted. */
  deadFishPenaltyLb?: number | null;
  /** Pounds deducted for each short fish (under the minimum) brought to the scale. */
  shortFishPenaltyLb?: number | null;
}

/** Result of {@link countedBag}; weights in decimal pounds. */
export interface CountedBag {
  /** Ids of the counted fish, highest net value (weight less any dead-fish penalty) first. */
  counted: (string | number)[];
  /** Ids of every other fish (culled, short, or not worth counting), in input order. */
  culled: (string | number)[];
  /** Ids of the short fish (a subset of `culled`). */
  short: (string | number)[];
  /** Weight of the counted fish. */
  grossLb: number;
  /** Dead-fish penalties of counted fish plus short-fish penalties. */
  penaltyLb: number;
  /** grossLb − penaltyLb, never below 0. */
  netLb: number;
}

/** Keeps 1e-6 lb: sums of decimal pounds carry binary floating-point noise. */
function clean(lb: number): number {
  return Math.round(lb * 1e6) / 1e6;
}

/**
 * The counted bag of one competition day: among the legal fish (at least `minLengthIn` long), the
 * at most `fishPerDay` that give the highest net weight. A counted dead fish costs
 * `deadFishPenaltyLb`, so a dead fish is counted only when its weight less the penalty beats the
 * next fish (and is positive). Every short fish brought to the scale costs `shortFishPenaltyLb`.
 * Ties keep the input order. Trade rules (common practice, not constants): five fish per day,
 * a 12 in minimum length; the event's rules decide.
 *
 * @param fish the fish brought to the scale (weights in lb, lengths in inches)
 * @param rules the event's rules
 * @throws RangeError on duplicate ids, negative weights or lengths, or a bad rule
 */
export function countedBag(fish: readonly BagFish[], rules: BagRules): CountedBag {
  if (!Number.isInteger(rules.fishPerDay) || rules.fishPerDay < 1) {
    throw new RangeError(`fishPerDay must be a positive integer, got ${rules.fishPerDay}`);
  }
  const minLength = rules.minLengthIn ?? null;
  if (minLength !== null) assertNonNegative('minLengthIn', minLength);
  const deadPenalty = rules.deadFishPenaltyLb ?? 0;
  const shortPenalty = rules.shortFishPenaltyLb ?? 0;
  assertNonNegative('deadFishPenaltyLb', deadPenalty);
  assertNonNegative('shortFishPenaltyLb', shortPenalty);

  const ids = new Set<string | number>();
  for (const f of fish) {
    if (ids.has(f.id)) throw new RangeError(`duplicate fish id ${String(f.id)}`);
    ids.add(f.id);
    assertNonNegative(`fish ${String(f.id)} weightLb`, f.weightLb);
    if (f.lengthIn !== null && f.lengthIn !== undefined) assertNonNegative(`fish ${String(f.id)} lengthIn`, f.lengthIn);
  }

  const isShort = (f: BagFish) =>
    minLength !== null && f.lengthIn !== null && f.lengthIn !== undefined && f.lengthIn < minLength;
  const value = (f: BagFish) => f.weightLb - (f.dead ? deadPenalty : 0);
  const short = fish.filter(isShort);
  const candidates = fish
    .map((f, order) => ({ f, order, v: value(f) }))
    .filter(({ f, v }) => !isShort(f) && v > 0)
    .sort((a, b) => b.v - a.v || a.order - b.order);
  // Each fish adds its own value independently, so the best bag is simply the top values.
  const chosen = candidates.slice(0, rules.fishPerDay).map((c) => c.f);
  const countedIds = new Set(chosen.map((f) => f.id));

  const grossLb = chosen.reduce((sum, f) => sum + f.weightLb, 0);
  const deadCost = chosen.reduce((sum, f) => sum + (f.dead ? deadPenalty : 0), 0);
  const penaltyLb = deadCost + short.length * shortPenalty;
  assertFinite('penaltyLb', penaltyLb);
  return {
    counted: chosen.map((f) => f.id),
    culled: fish.filter((f) => !countedIds.has(f.id)).map((f) => f.id),
    short: short.map((f) => f.id),
    grossLb: clean(grossLb),
    penaltyLb: clean(penaltyLb),
    netLb: clean(Math.max(0, grossLb - penaltyLb)),
  };
}
