import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dayBag, dayBags, isShortFish, type DayFish, type DayRules } from './day-bag.js';

// The rules below are common practice for bass events (recalled from memory, not from one event's rule book):
// five fish per day, 12 in minimum length, 0.25 lb (4 oz) per dead fish in the bag, 1 lb per short fish brought
// to the scale, 1 lb per minute late. Every event sets its own; these are test inputs, not constants.
const common: DayRules = {
  fishPerDay: 5,
  minLengthIn: 12,
  deadFishPenaltyLb: 0.25,
  shortFishPenaltyLb: 1,
  latePenaltyLbPerMinute: 1,
};
const stateOf = (bag: ReturnType<typeof dayBag>) => Object.fromEntries(bag.fish.map((f) => [f.id, f.state]));

describe('dayBag worked examples', () => {
  it('five-fish limit with culls (common practice): the best five count, the angler-culled and the surplus are culled', () => {
    // Worked by hand: kept a 2.1 early, culled it on the water for a 3.0; seven fish kept by the end.
    const day: DayFish[] = [
      { id: 'a', weightLb: 2.1, lengthIn: 14, fate: 'culled' },
      { id: 'b', weightLb: 3.0, lengthIn: 16, fate: 'weighed' },
      { id: 'c', weightLb: 2.5, lengthIn: 15, fate: 'weighed' },
      { id: 'd', weightLb: 4.25, lengthIn: 19, fate: 'weighed' },
      { id: 'e', weightLb: 1.75, lengthIn: 13, fate: 'weighed' },
      { id: 'f', weightLb: 2.8, lengthIn: 15.5, fate: 'weighed' },
      { id: 'g', weightLb: 3.6, lengthIn: 17, fate: 'weighed' },
      { id: 'h', weightLb: 0.9, lengthIn: 10, fate: 'released' },
    ];
    const bag = dayBag(day, common);
    // Best five of b 3.0, c 2.5, d 4.25, e 1.75, f 2.8, g 3.6 → d, g, b, f, c = 16.15 lb; e is the surplus.
    expect(bag.counted).toEqual(['d', 'g', 'b', 'f', 'c']);
    expect(stateOf(bag)).toEqual({
      a: 'culled',
      b: 'counted',
      c: 'counted',
      d: 'counted',
      e: 'culled',
      f: 'counted',
      g: 'counted',
      h: 'released',
    });
    expect(bag.grossLb).toBe(16.15);
    // h is under 12 in but was released at once: never at the scale, never charged.
    expect(bag.penalties).toEqual([]);
    expect(bag.netLb).toBe(16.15);
    // Live bag: the 2.5 is next to cull; a new fish must beat it.
    expect(bag.nextToCull).toBe('c');
    expect(bag.mustBeatLb).toBe(2.5);
  });

  it('dead-fish penalty (common practice 0.25 lb): a counted dead fish is weighed and charged', () => {
    const day: DayFish[] = [
      { id: 1, weightLb: 3.2, lengthIn: 17, fate: 'weighed' },
      { id: 2, weightLb: 2.9, lengthIn: 16, fate: 'dead' },
      { id: 3, weightLb: 2.4, lengthIn: 15, fate: 'weighed' },
    ];
    const bag = dayBag(day, { ...common, fishPerDay: 3 });
    expect(bag.counted).toEqual([1, 2, 3]);
    expect(bag.fish[1]).toEqual({ id: 2, state: 'dead', counted: true, weighed: true, penaltyLb: 0.25 });
    expect(bag.penalties).toEqual([{ kind: 'dead', fishId: 2, lb: 0.25 }]);
    expect(bag.grossLb).toBe(8.5); // 3.2 + 2.9 + 2.4
    expect(bag.netLb).toBe(8.25);
    // A live 2.7 ranks above the dead 2.9 (worth 2.65); with room for two only, the dead fish is left out, free.
    const better = dayBag([...day, { id: 4, weightLb: 2.7, lengthIn: 15, fate: 'weighed' }], {
      ...common,
      fishPerDay: 3,
    });
    expect(better.counted).toEqual([1, 4, 2]);
    const worse = dayBag([...day, { id: 4, weightLb: 2.7, lengthIn: 15, fate: 'weighed' }], {
      ...common,
      fishPerDay: 2,
    });
    expect(worse.counted).toEqual([1, 4]);
    expect(worse.fish[1]).toMatchObject({ state: 'dead', counted: false, weighed: false, penaltyLb: 0 });
  });

  it('a short fish brought to the scale (common practice: 1 lb, not counted); a culled short fish costs nothing', () => {
    const day: DayFish[] = [
      { id: 'a', weightLb: 3.1, lengthIn: 16, fate: 'weighed' },
      { id: 'b', weightLb: 1.1, lengthIn: 11.75, fate: 'weighed' }, // under 12 in at the scale
      { id: 'c', weightLb: 1.0, lengthIn: 11.5, fate: 'culled' }, // short but culled on the water
      { id: 'd', weightLb: 2.2, lengthIn: 14, fate: 'weighed' },
    ];
    const bag = dayBag(day, common);
    expect(stateOf(bag)).toEqual({ a: 'counted', b: 'short', c: 'culled', d: 'counted' });
    expect(bag.fish[1]).toMatchObject({ weighed: true, counted: false, penaltyLb: 1 });
    expect(bag.penalties).toEqual([{ kind: 'short', fishId: 'b', lb: 1 }]);
    expect(bag.grossLb).toBe(5.3);
    expect(bag.netLb).toBe(4.3);
    expect(isShortFish(11.99, common)).toBe(true);
    expect(isShortFish(12, common)).toBe(false);
    expect(isShortFish(null, common)).toBe(false);
  });

  it('late penalty (common practice 1 lb per minute late)', () => {
    const day: DayFish[] = [
      { id: 'a', weightLb: 4, lengthIn: 18, fate: 'weighed' },
      { id: 'b', weightLb: 3.5, lengthIn: 17, fate: 'weighed' },
    ];
    const bag = dayBag(day, common, { lateMinutes: 3 });
    expect(bag.penalties).toEqual([{ kind: 'late', fishId: null, lb: 3, minutes: 3 }]);
    expect(bag.netLb).toBe(4.5);
    expect(bag.nextToCull).toBeNull(); // two of five: any legal fish improves the bag
    expect(bag.mustBeatLb).toBe(0);
    // Late by more than the bag weighs: the net stops at zero.
    expect(dayBag(day, common, { lateMinutes: 10 }).netLb).toBe(0);
  });

  it('team event: one bag of both anglers’ fish; individual: a bag per angler (the event’s own rules)', () => {
    const day: DayFish[] = [
      { id: 1, weightLb: 3, fate: 'weighed', anglerId: 'ann' },
      { id: 2, weightLb: 2, fate: 'weighed', anglerId: 'ben' },
      { id: 3, weightLb: 4, fate: 'weighed', anglerId: 'ben' },
    ];
    const team = dayBags(day, { fishPerDay: 2, format: 'team' });
    expect(team).toHaveLength(1);
    expect(team[0]!.counted).toEqual([3, 1]);
    const solo = dayBags(day, { fishPerDay: 2, format: 'individual' });
    expect(solo.map((b) => [b.anglerId, b.counted, b.netLb])).toEqual([
      ['ann', [1], 3],
      ['ben', [3, 2], 6],
    ]);
  });

  it('rejects bad rules and fish, naming the problem', () => {
    const one: DayFish[] = [{ id: 'a', weightLb: 1, fate: 'weighed' }];
    expect(() => dayBag(one, { fishPerDay: 0 })).toThrow(/fishPerDay/);
    expect(() => dayBag(one, { fishPerDay: 2.5 })).toThrow(/fishPerDay/);
    expect(() => dayBag([...one, { id: 'a', weightLb: 2, fate: 'weighed' }], common)).toThrow(/duplicate fish id a/);
    expect(() => dayBag([{ id: 'x', weightLb: -1, fate: 'weighed' }], common)).toThrow(/fish x weightLb/);
    expect(() => dayBag(one, { fishPerDay: 5, deadFishPenaltyLb: -0.25 })).toThrow(/deadFishPenaltyLb/);
    expect(() => dayBag(one, common, { lateMinutes: -1 })).toThrow(/lateMinutes/);
    expect(() => dayBag([{ id: 'y', weightLb: 1, fate: 'kept' as never }], common)).toThrow(/fish y fate/);
  });
});

describe('dayBag properties (fast-check)', () => {
  const fishArb = fc.uniqueArray(
    fc.record({
      id: fc.integer({ min: 0, max: 1000 }),
      weightLb: fc.integer({ min: 1, max: 1200 }).map((h) => h / 100),
      lengthIn: fc.option(
        fc.integer({ min: 80, max: 260 }).map((q) => q / 10),
        { nil: undefined },
      ),
      fate: fc.constantFrom('weighed', 'culled', 'released', 'dead') as fc.Arbitrary<DayFish['fate']>,
    }),
    { selector: (f) => f.id, maxLength: 12 },
  );
  const rulesArb = fc.record({
    fishPerDay: fc.integer({ min: 1, max: 6 }),
    minLengthIn: fc.option(fc.constantFrom(12, 14, 15), { nil: undefined }),
    deadFishPenaltyLb: fc.constantFrom(0, 0.25, 0.5, 1, 4),
    shortFishPenaltyLb: fc.constantFrom(0, 0.5, 1),
    latePenaltyLbPerMinute: fc.constantFrom(0, 0.5, 1),
  });
  const lateArb = fc.integer({ min: 0, max: 20 });

  it('net = gross − penalties (floored at 0), penalties are the sum of the items, never more than N fish count', () => {
    fc.assert(
      fc.property(fishArb, rulesArb, lateArb, (fish, rules, late) => {
        const bag = dayBag(fish, rules, { lateMinutes: late });
        expect(bag.counted.length).toBeLessThanOrEqual(rules.fishPerDay);
        expect(bag.penaltyLb).toBeCloseTo(
          bag.penalties.reduce((s, p) => s + p.lb, 0),
          6,
        );
        expect(bag.netLb).toBeCloseTo(Math.max(0, bag.grossLb - bag.penaltyLb), 6);
        const byId = new Map(fish.map((f) => [f.id, f]));
        const counted = bag.counted.map((id) => byId.get(id)!);
        expect(bag.grossLb).toBeCloseTo(
          counted.reduce((s, f) => s + f.weightLb, 0),
          6,
        );
        // Culled and released fish never reach the scale and are never charged.
        for (const v of bag.fish) {
          const f = byId.get(v.id)!;
          if (f.fate === 'culled' || f.fate === 'released') expect(v).toMatchObject({ weighed: false, penaltyLb: 0 });
          if (v.counted) expect(v.weighed).toBe(true);
        }
      }),
    );
  });

  it('culling never lowers the bag: one more legal live fish kept never lowers the net', () => {
    fc.assert(
      fc.property(
        fishArb,
        rulesArb,
        fc.integer({ min: 1, max: 1200 }).map((h) => h / 100),
        (fish, rules, weightLb) => {
          const before = dayBag(fish, rules).netLb;
          const after = dayBag([...fish, { id: 'new', weightLb, lengthIn: 30, fate: 'weighed' }], rules);
          expect(after.netLb).toBeGreaterThanOrEqual(before - 1e-9);
          // The live bag's promise: a fish heavier than mustBeatLb improves it (when the bag had room or beat).
          if (weightLb > dayBag(fish, rules).mustBeatLb && before > 0) expect(after.netLb).toBeGreaterThan(before);
        },
      ),
    );
  });

  it('the net is the best over every allowed subset of the kept legal fish (brute force)', () => {
    fc.assert(
      fc.property(fishArb, rulesArb, (fish, rules) => {
        const keptShort = fish.filter(
          (f) => (f.fate === 'weighed' || f.fate === 'dead') && isShortFish(f.lengthIn, rules),
        ).length;
        const legal = fish.filter(
          (f) => (f.fate === 'weighed' || f.fate === 'dead') && !isShortFish(f.lengthIn, rules),
        );
        const netOf = (subset: DayFish[]) =>
          Math.max(
            0,
            subset.reduce((s, f) => s + f.weightLb - (f.fate === 'dead' ? rules.deadFishPenaltyLb : 0), 0) -
              keptShort * rules.shortFishPenaltyLb,
          );
        let best = netOf([]);
        for (let mask = 1; mask < 1 << legal.length; mask++) {
          const subset = legal.filter((_, i) => mask & (1 << i));
          if (subset.length <= rules.fishPerDay) best = Math.max(best, netOf(subset));
        }
        expect(dayBag(fish, rules).netLb).toBeCloseTo(best, 6);
      }),
    );
  });

  it('a team bag equals an individual event’s bags when there is one angler; individual bags sum each angler', () => {
    fc.assert(
      fc.property(fishArb, rulesArb, fc.array(fc.constantFrom('ann', 'ben'), { minLength: 12, maxLength: 12 }), (fish, rules, who) => {
        const owned = fish.map((f, i) => ({ ...f, anglerId: who[i]! }));
        const solo = dayBags(owned, { ...rules, format: 'individual' });
        for (const bag of solo) {
          const mine = owned.filter((f) => f.anglerId === bag.anglerId);
          expect(bag.netLb).toBe(dayBag(mine, rules).netLb);
        }
        const one = fish.map((f) => ({ ...f, anglerId: 'ann' }));
        expect(dayBags(one, { ...rules, format: 'individual' })[0]?.netLb ?? 0).toBe(
          dayBags(one, { ...rules, format: 'team' })[0]!.netLb,
        );
      }),
    );
  });
});
