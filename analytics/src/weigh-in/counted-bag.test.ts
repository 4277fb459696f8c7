import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { countedBag, type BagFish, type BagRules } from './counted-bag.js';

// Common practice: five fish per day and a 12 in minimum length (per-event rules, not constants).
const fivePerDay: BagRules = { fishPerDay: 5, minLengthIn: 12, deadFishPenaltyLb: 0.5, shortFishPenaltyLb: 1 };

// Invented demo day.
const day: BagFish[] = [
  { id: 'a', weightLb: 3.25, lengthIn: 17 },
  { id: 'b', weightLb: 4.5, lengthIn: 11.75 }, // heaviest but short
  { id: 'c', weightLb: 2.1, lengthIn: 14 },
  { id: 'd', weightLb: 5.8, lengthIn: 21 },
  { id: 'e', weightLb: 1.9, lengthIn: 13.5 },
  { id: 'f', weightLb: 2.75, lengthIn: 15, dead: true },
  { id: 'g', weightLb: 2.4, lengthIn: 14.5 },
];

describe('countedBag', () => {
  it('counts the five heaviest legal fish and never a short one (five fish, 12 in: common practice)', () => {
    const bag = countedBag(day, fivePerDay);
    // Values: d 5.8, a 3.25, f 2.75 − 0.5 = 2.25, g 2.4, c 2.1, e 1.9 → d, a, g, f, c.
    expect(bag.counted).toEqual(['d', 'a', 'g', 'f', 'c']);
    expect(bag.culled).toEqual(['b', 'e']);
    expect(bag.short).toEqual(['b']);
    expect(bag.grossLb).toBe(16.3); // 5.8 + 3.25 + 2.4 + 2.75 + 2.1
    expect(bag.penaltyLb).toBe(1.5); // dead f 0.5 + short b 1
    expect(bag.netLb).toBe(14.8);
  });

  it('leaves a dead fish out when its weight less the penalty loses to a live fish', () => {
    const bag = countedBag(day, { ...fivePerDay, deadFishPenaltyLb: 1 });
    // f is now worth 1.75 < e 1.9
    expect(bag.counted).toEqual(['d', 'a', 'g', 'c', 'e']);
    expect(bag.penaltyLb).toBe(1);
  });

  it('counts every legal fish when there are fewer than the limit, and applies no minimum when none is set', () => {
    const bag = countedBag(day.slice(0, 3), { fishPerDay: 5 });
    expect(bag.counted).toEqual(['b', 'a', 'c']);
    expect(bag.culled).toEqual([]);
    expect(bag.netLb).toBe(9.85);
  });

  it('never reports a net below zero', () => {
    const bag = countedBag(
      [
        { id: 1, weightLb: 0.5, lengthIn: 10 },
        { id: 2, weightLb: 1, lengthIn: 13 },
      ],
      { fishPerDay: 5, minLengthIn: 12, shortFishPenaltyLb: 2 },
    );
    expect(bag.grossLb).toBe(1);
    expect(bag.netLb).toBe(0);
  });

  it('rejects bad rules and fish, naming the problem', () => {
    expect(() => countedBag(day, { fishPerDay: 0 })).toThrow(/fishPerDay/);
    expect(() => countedBag(day, { fishPerDay: 2.5 })).toThrow(/fishPerDay/);
    expect(() => countedBag([...day, { id: 'a', weightLb: 1 }], fivePerDay)).toThrow(/duplicate fish id a/);
    expect(() => countedBag([{ id: 'x', weightLb: -1 }], fivePerDay)).toThrow(/fish x weightLb/);
    expect(() => countedBag(day, { fishPerDay: 5, deadFishPenaltyLb: -0.25 })).toThrow(/deadFishPenaltyLb/);
  });

  const fishArb = fc.uniqueArray(
    fc.record({
      id: fc.integer({ min: 0, max: 1000 }),
      weightLb: fc.integer({ min: 0, max: 1200 }).map((h) => h / 100),
      lengthIn: fc.option(
        fc.integer({ min: 80, max: 260 }).map((q) => q / 10),
        { nil: undefined },
      ),
      dead: fc.boolean(),
    }),
    { selector: (f) => f.id, maxLength: 12 },
  );
  const rulesArb = fc.record({
    fishPerDay: fc.integer({ min: 1, max: 6 }),
    minLengthIn: fc.option(fc.constantFrom(12, 14, 15), { nil: undefined }),
    deadFishPenaltyLb: fc.constantFrom(0, 0.25, 0.5, 1, 4),
    shortFishPenaltyLb: fc.constantFrom(0, 0.5, 1),
  });
  const netOf = (chosen: BagFish[], all: BagFish[], rules: BagRules) => {
    const short = all.filter(
      (f) => rules.minLengthIn != null && f.lengthIn != null && f.lengthIn < rules.minLengthIn,
    ).length;
    const gross = chosen.reduce((s, f) => s + f.weightLb, 0);
    const penalty =
      chosen.filter((f) => f.dead).length * (rules.deadFishPenaltyLb ?? 0) + short * (rules.shortFishPenaltyLb ?? 0);
    return Math.max(0, gross - penalty);
  };

  it('property: never exceeds the limit, never counts a short fish, and no swap of a counted and a culled fish raises the net', () => {
    fc.assert(
      fc.property(fishArb, rulesArb, (fish, rules) => {
        const bag = countedBag(fish, rules);
        const byId = new Map<string | number, BagFish>(fish.map((f) => [f.id, f]));
        const counted = bag.counted.map((id) => byId.get(id)!);
        expect(counted.length).toBeLessThanOrEqual(rules.fishPerDay);
        const legal = (f: BagFish) =>
          rules.minLengthIn == null || f.lengthIn == null || f.lengthIn >= rules.minLengthIn;
        expect(counted.every(legal)).toBe(true);
        expect(new Set([...bag.counted, ...bag.culled]).size).toBe(fish.length);
        const net = netOf(counted, fish, rules);
        expect(bag.netLb).toBeCloseTo(net, 6);
        for (const out of bag.culled.map((id) => byId.get(id)!).filter(legal)) {
          for (let i = 0; i < counted.length; i++) {
            const swapped = counted.map((f, j) => (j === i ? out : f));
            expect(netOf(swapped, fish, rules)).toBeLessThanOrEqual(net + 1e-9);
          }
          if (counted.length < rules.fishPerDay)
            expect(netOf([...counted, out], fish, rules)).toBeLessThanOrEqual(net + 1e-9);
        }
      }),
    );
  });

  it('property: the net equals the best over every allowed subset (brute force)', () => {
    fc.assert(
      fc.property(fishArb, rulesArb, (fish, rules) => {
        const legal = fish.filter(
          (f) => rules.minLengthIn == null || f.lengthIn == null || f.lengthIn >= rules.minLengthIn,
        );
        let best = netOf([], fish, rules);
        for (let mask = 1; mask < 1 << legal.length; mask++) {
          const subset = legal.filter((_, i) => mask & (1 << i));
          if (subset.length <= rules.fishPerDay) best = Math.max(best, netOf(subset, fish, rules));
        }
        expect(countedBag(fish, rules).netLb).toBeCloseTo(best, 6);
      }),
    );
  });
});
