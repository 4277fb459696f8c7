import { assertFinite, assertNonNegative } from '../stats/validate.js';
import { cleanLb } from './units.js';

/** What the angler logged of a fish: kept for the scale, culled (replaced, released on the water), released at once, or dead. */
export type LoggedFate = 'weighed' | 'culled' | 'released' | 'dead';
/** What the day's bag rule made of a fish. */
export type FishState = 'counted' | 'culled' | 'released' | 'short' | 'dead';
export const FISH_STATES: readonly FishState[] = ['counted', 'culled', 'released', 'short', 'dead'];
/** Team: one bag per boat from every angler's fish. Individual: a bag per angler. */
export type EventFormat = 'team' | 'individual';

/** A fish of one competition day. */
export interface DayFish {
  id: string | number;
  /** Weight in decimal pounds. */
  weightLb: number;
  /** Total length in inches; when absent the fish is taken as legal (not measured). */
  lengthIn?: number | null;
  fate: LoggedFate;
  /** Whose fish it is (the crew member who logged it): an individual event makes a bag per angler. */
  anglerId?: string | null;
}

/** The event's bag rules (per event, never constants: follow the event's rules and the wildlife agency). */
export interface DayRules {
  /** Fish counted per day, e.g. 5 (common practice). */
  fishPerDay: number;
  /** Minimum total length in inches, e.g. 12 (common practice); absent = no minimum. */
  minLengthIn?: number | null;
  /** Pounds deducted for each dead fish in the counted bag. */
  deadFishPenaltyLb?: number | null;
  /** Pounds deducted for each short fish (under the minimum) brought to the scale. */
  shortFishPenaltyLb?: number | null;
  /** Pounds deducted per minute of late check-in. */
  latePenaltyLbPerMinute?: number | null;
  format?: EventFormat | null;
}

/** One penalty, itemised: a dead or short fish, or a late check-in. */
export interface BagPenalty {
  kind: 'dead' | 'short' | 'late';
  /** The fish charged (null for a late penalty). */
  fishId: string | number | null;
  lb: number;
  /** Minutes late (late penalty only). */
  minutes?: number;
}

/** The verdict on one fish. */
export interface FishVerdict {
  id: string | number;
  state: FishState;
  /** In the counted bag (a counted dead fish has state 'dead' and counted true). */
  counted: boolean;
  /** Reached the scale: the counted fish and the short fish brought in. Culled and released fish never do. */
  weighed: boolean;
  /** What this fish cost in penalties. */
  penaltyLb: number;
}

/** One bag of one day; weights in decimal pounds. */
export interface DayBag {
  /** The angler of an individual event's bag; null for a team bag. */
  anglerId: string | null;
  /** Ids of the counted fish, highest value (weight less any dead-fish penalty) first. */
  counted: (string | number)[];
  /** Every fish of the bag, in input order. */
  fish: FishVerdict[];
  penalties: BagPenalty[];
  /** Weight of the counted fish. */
  grossLb: number;
  /** Sum of the itemised penalties. */
  penaltyLb: number;
  /** grossLb − penaltyLb, never below 0 (a bag cannot weigh less than nothing). */
  netLb: number;
  /** The live bag: the counted fish a better one would replace (null while the limit is not filled). */
  nextToCull: string | number | null;
  /** A new legal live fish improves the bag when it weighs more than this (0 while the limit is not filled). */
  mustBeatLb: number;
}

/** True when the fish is measured and under the event's minimum length. */
export function isShortFish(lengthIn: number | null | undefined, rules: Pick<DayRules, 'minLengthIn'>): boolean {
  const min = rules.minLengthIn ?? null;
  return min !== null && lengthIn !== null && lengthIn !== undefined && lengthIn < min;
}

function checkRules(rules: DayRules): void {
  if (!Number.isInteger(rules.fishPerDay) || rules.fishPerDay < 1) {
    throw new RangeError(`fishPerDay must be a positive integer, got ${rules.fishPerDay}`);
  }
  if (rules.minLengthIn !== null && rules.minLengthIn !== undefined) assertNonNegative('minLengthIn', rules.minLengthIn);
  assertNonNegative('deadFishPenaltyLb', rules.deadFishPenaltyLb ?? 0);
  assertNonNegative('shortFishPenaltyLb', rules.shortFishPenaltyLb ?? 0);
  assertNonNegative('latePenaltyLbPerMinute', rules.latePenaltyLbPerMinute ?? 0);
  if (rules.format && rules.format !== 'team' && rules.format !== 'individual') {
    throw new RangeError(`format must be 'team' or 'individual', got ${String(rules.format)}`);
  }
}

function checkFish(fish: readonly DayFish[]): void {
  const ids = new Set<string | number>();
  for (const f of fish) {
    if (ids.has(f.id)) throw new RangeError(`duplicate fish id ${String(f.id)}`);
    ids.add(f.id);
    assertNonNegative(`fish ${String(f.id)} weightLb`, f.weightLb);
    if (f.lengthIn !== null && f.lengthIn !== undefined) assertNonNegative(`fish ${String(f.id)} lengthIn`, f.lengthIn);
    if (!['weighed', 'culled', 'released', 'dead'].includes(f.fate)) {
      throw new RangeError(`fish ${String(f.id)} fate must be weighed, culled, released or dead, got ${String(f.fate)}`);
    }
  }
}

/**
 * The one bag rule of a competition day (every screen, report and projection calls it).
 *
 * - Released and culled fish never reach the scale: no weight, no penalty (a culled short fish costs nothing).
 * - Of the fish kept for the scale (logged weighed or dead), a short one (under `minLengthIn`) is brought in,
 *   charged `shortFishPenaltyLb` and not counted.
 * - Of the legal ones, the at most `fishPerDay` with the highest value count, a dead fish's value being its
 *   weight less `deadFishPenaltyLb` (so a dead fish is counted only when that beats the next fish). A counted
 *   dead fish is weighed and charged; the rest are culled (state 'dead' for a dead one left out).
 * - A late check-in costs `lateMinutes × latePenaltyLbPerMinute`.
 *
 * Each fish adds its own value independently, so the best bag is simply the top values; ties keep the input
 * order. Trade rules (common practice, not constants): five fish, 12 in minimum; the event's rules decide.
 *
 * @throws RangeError on duplicate ids, negative weights or lengths, an unknown fate, or a bad rule
 */
export function dayBag(
  fish: readonly DayFish[],
  rules: DayRules,
  options: { lateMinutes?: number | null; anglerId?: string | null } = {},
): DayBag {
  checkRules(rules);
  checkFish(fish);
  const lateMinutes = options.lateMinutes ?? 0;
  assertNonNegative('lateMinutes', lateMinutes);
  const deadPenalty = rules.deadFishPenaltyLb ?? 0;
  const shortPenalty = rules.shortFishPenaltyLb ?? 0;

  const value = (f: DayFish) => f.weightLb - (f.fate === 'dead' ? deadPenalty : 0);
  const kept = (f: DayFish) => f.fate === 'weighed' || f.fate === 'dead';
  const short = (f: DayFish) => kept(f) && isShortFish(f.lengthIn, rules);
  const chosen = fish
    .map((f, order) => ({ f, order, v: value(f) }))
    .filter(({ f, v }) => kept(f) && !short(f) && v > 0)
    .sort((a, b) => b.v - a.v || a.order - b.order)
    .slice(0, rules.fishPerDay);
  const countedIds = new Set(chosen.map((c) => c.f.id));

  const penalties: BagPenalty[] = [];
  const verdicts = fish.map((f): FishVerdict => {
    if (f.fate === 'released' || f.fate === 'culled')
      return { id: f.id, state: f.fate, counted: false, weighed: false, penaltyLb: 0 };
    if (short(f)) {
      if (shortPenalty > 0) penalties.push({ kind: 'short', fishId: f.id, lb: shortPenalty });
      return { id: f.id, state: 'short', counted: false, weighed: true, penaltyLb: shortPenalty };
    }
    const dead = f.fate === 'dead';
    if (!countedIds.has(f.id)) return { id: f.id, state: dead ? 'dead' : 'culled', counted: false, weighed: false, penaltyLb: 0 };
    const cost = dead ? deadPenalty : 0;
    if (cost > 0) penalties.push({ kind: 'dead', fishId: f.id, lb: cost });
    return { id: f.id, state: dead ? 'dead' : 'counted', counted: true, weighed: true, penaltyLb: cost };
  });
  const late = lateMinutes * (rules.latePenaltyLbPerMinute ?? 0);
  if (late > 0) penalties.push({ kind: 'late', fishId: null, lb: cleanLb(late), minutes: lateMinutes });

  const grossLb = chosen.reduce((sum, c) => sum + c.f.weightLb, 0);
  const penaltyLb = penalties.reduce((sum, p) => sum + p.lb, 0);
  assertFinite('penaltyLb', penaltyLb);
  const full = chosen.length === rules.fishPerDay;
  const last = chosen[chosen.length - 1];
  return {
    anglerId: options.anglerId ?? null,
    counted: chosen.map((c) => c.f.id),
    fish: verdicts,
    penalties,
    grossLb: cleanLb(grossLb),
    penaltyLb: cleanLb(penaltyLb),
    netLb: cleanLb(Math.max(0, grossLb - penaltyLb)),
    nextToCull: full && last ? last.f.id : null,
    mustBeatLb: full && last ? cleanLb(last.v) : 0,
  };
}

/**
 * The bags of one day by the event's format: a team event makes one bag of every angler's fish (anglerId
 * null); an individual event makes one bag per angler (fish without an angler form a bag of their own, null;
 * a day without fish has one empty bag).
 * A late check-in is the boat's, so it is charged on every bag.
 */
export function dayBags(
  fish: readonly DayFish[],
  rules: DayRules,
  options: { lateMinutes?: number | null } = {},
): DayBag[] {
  if ((rules.format ?? 'team') === 'team') return [dayBag(fish, rules, options)];
  checkFish(fish);
  const byAngler = new Map<string | null, DayFish[]>();
  for (const f of fish) {
    const key = f.anglerId ?? null;
    const list = byAngler.get(key) ?? [];
    list.push(f);
    byAngler.set(key, list);
  }
  if (!byAngler.size) return [dayBag([], rules, options)];
  return [...byAngler].map(([anglerId, list]) => dayBag(list, rules, { ...options, anglerId }));
}

/** The fish verdicts of every bag of a day, by fish id. */
export function verdictsById(bags: readonly DayBag[]): Map<string | number, FishVerdict> {
  return new Map(bags.flatMap((b) => b.fish.map((v) => [v.id, v] as const)));
}

/** A day's bags by the event's format, with the day's sums over its bags. */
export interface DaySummary {
  format: EventFormat;
  bags: DayBag[];
  counted: (string | number)[];
  /** Every fish of the day, in input order. */
  fish: FishVerdict[];
  penalties: BagPenalty[];
  grossLb: number;
  penaltyLb: number;
  netLb: number;
}

/** The day as every screen and report shows it: {@link dayBags} and their sums. */
export function daySummary(
  fish: readonly DayFish[],
  rules: DayRules,
  options: { lateMinutes?: number | null } = {},
): DaySummary {
  const bags = dayBags(fish, rules, options);
  const verdicts = verdictsById(bags);
  const sum = (pick: (b: DayBag) => number) => cleanLb(bags.reduce((s, b) => s + pick(b), 0));
  return {
    format: rules.format ?? 'team',
    bags,
    counted: bags.flatMap((b) => b.counted),
    fish: fish.map((f) => verdicts.get(f.id)!),
    penalties: bags.flatMap((b) => b.penalties),
    grossLb: sum((b) => b.grossLb),
    penaltyLb: sum((b) => b.penaltyLb),
    netLb: sum((b) => b.netLb),
  };
}
