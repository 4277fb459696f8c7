import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { depthBandLabels } from '../geo/bands.js';
import { hitRates, type CatchInput, type FindInput } from './hit-rates.js';
import { shrinkRates } from './shrinkage.js';
import { wilsonInterval } from './wilson.js';

// Invented demo data: six finds on an invented lake, five catches.
const finds: FindInput[] = [
  {
    id: 'f1',
    kind: 'hard bottom',
    subKind: 'shell',
    depthFt: 14,
    hardness: 5,
    waterTempF: 71,
    eventId: 'e1',
    lakeId: 'l1',
  },
  {
    id: 'f2',
    kind: 'hard bottom',
    subKind: 'rock',
    depthFt: 22,
    hardness: 4,
    waterTempF: 69,
    eventId: 'e1',
    lakeId: 'l1',
  },
  {
    id: 'f3',
    kind: 'hard bottom',
    subKind: 'shell',
    depthFt: 9,
    hardness: 3,
    waterTempF: 72,
    eventId: 'e1',
    lakeId: 'l1',
    fished: true,
  },
  {
    id: 'f4',
    kind: 'vegetation',
    subKind: 'eelgrass',
    depthFt: 6,
    hardness: 1,
    waterTempF: 74,
    eventId: 'e1',
    lakeId: 'l1',
    fished: true,
  },
  {
    id: 'f5',
    kind: 'vegetation',
    subKind: 'hydrilla',
    depthFt: 4,
    hardness: 1,
    waterTempF: null,
    eventId: 'e1',
    lakeId: 'l1',
  },
  { id: 'f6', kind: null, depthFt: null, hardness: null, eventId: 'e1', lakeId: 'l1' },
];
const catches: CatchInput[] = [
  { id: 'c1', findId: 'f1', weightLb: 4.25, fate: 'weighed', caughtAt: '2025-05-10T13:05:00Z' },
  { id: 'c2', findId: 'f1', weightLb: 2.5, fate: 'culled', caughtAt: '2025-05-10T14:40:00Z' },
  { id: 'c3', findId: 'f2', weightLb: 1.75, fate: 'released', caughtAt: '2025-05-10T15:10:00Z' },
  { id: 'c4', findId: 'f4', weightLb: 3.1, fate: 'weighed', caughtAt: '2025-05-10T16:00:00Z' },
  { id: 'c5', findId: null, weightLb: 2.0, fate: 'weighed', caughtAt: '2025-05-10T17:00:00Z' },
  { id: 'c6', findId: 'not-in-list', weightLb: 2.0, fate: 'weighed' },
];

/** A deliberately naive reference: one pass per group, no typed arrays, no arquero. */
function naiveHitRates(fs: FindInput[], cs: CatchInput[], keyOf: (f: FindInput) => unknown) {
  const keys = [...new Set(fs.map(keyOf))];
  return keys.map((key) => {
    const members = fs.filter((f) => keyOf(f) === key);
    const onMember = (f: FindInput) => cs.filter((c) => c.findId === f.id);
    return {
      key,
      finds: members.length,
      findsFished: members.filter((f) => f.fished === true || onMember(f).length > 0).length,
      findsWithFish: members.filter((f) => onMember(f).length > 0).length,
      findsWithWeighedFish: members.filter((f) => onMember(f).some((c) => c.fate === 'weighed')).length,
      fish: members.reduce((s, f) => s + onMember(f).length, 0),
      fishWeightLb: members.reduce((s, f) => s + onMember(f).reduce((t, c) => t + (c.weightLb ?? 0), 0), 0),
    };
  });
}

describe('hitRates', () => {
  it('counts finds, finds fished, finds with a fish and with a weighed fish per kind (counted by hand)', () => {
    const groups = hitRates(finds, catches, { by: 'kind' });
    expect(groups.map((g) => g.key)).toEqual(['hard bottom', 'vegetation', null]);
    const [hard, veg, none] = groups;
    // hard bottom: f1 (2 catches, one weighed), f2 (1 released), f3 (fished, nothing)
    expect([
      hard.finds,
      hard.findsFished,
      hard.findsWithFish,
      hard.findsWithWeighedFish,
      hard.fish,
      hard.weighedFish,
    ]).toEqual([3, 3, 2, 1, 3, 1]);
    expect(hard.fishWeightLb).toBe(8.5);
    expect(hard.weighedWeightLb).toBe(4.25);
    // vegetation: f4 (fished, one weighed), f5 (not fished)
    expect([veg.finds, veg.findsFished, veg.findsWithFish, veg.findsWithWeighedFish]).toEqual([2, 1, 1, 1]);
    expect([none.finds, none.findsFished]).toEqual([1, 0]);
    expect(none.hitRate.rate).toBeNaN();
  });

  it('gives the Wilson interval and the shrunk rate of each group', () => {
    const groups = hitRates(finds, catches, { by: 'kind', confidence: 0.9 });
    const expectedShrunk = shrinkRates(
      groups.map((g) => ({ key: g.key, successes: g.findsWithFish, trials: g.findsFished })),
      0.9,
    );
    groups.forEach((g, i) => {
      const w = wilsonInterval(g.findsWithFish, g.findsFished, 0.9);
      expect([g.hitRate.lower, g.hitRate.upper]).toEqual([w.lower, w.upper]);
      expect(g.hitRate.shrunk).toBe(expectedShrunk[i].shrunk);
    });
    expect(groups[0].weighedHitRate.rate).toBeCloseTo(1 / 3, 12);
  });

  it('groups by depth band in band order, and by a function', () => {
    const byDepth = hitRates(finds, catches, { by: 'depthBand' });
    const labels = depthBandLabels();
    const order = byDepth.map((g) => (g.key === null ? Infinity : labels.indexOf(String(g.key))));
    expect(order).toEqual([...order].sort((a, b) => a - b));
    expect(byDepth.find((g) => g.key === '10–15 ft')?.findsWithFish).toBe(1);

    const byFn = hitRates(finds, catches, { by: (f) => (f.hardness != null && f.hardness >= 4 ? 'hard' : 'soft') });
    expect(byFn.map((g) => [g.key, g.finds])).toEqual([
      ['hard', 2],
      ['soft', 4],
    ]);
  });

  it('numbers sort numerically (hardness grades)', () => {
    expect(hitRates(finds, catches, { by: 'hardness' }).map((g) => g.key)).toEqual([1, 3, 4, 5, null]);
  });

  it('rejects duplicate find ids and bad weights, naming them', () => {
    expect(() => hitRates([...finds, { id: 'f1' }], catches, { by: 'kind' })).toThrow(/duplicate find id f1/);
    expect(() => hitRates(finds, [{ id: 'bad', findId: 'f1', weightLb: -1 }], { by: 'kind' })).toThrow(/catch bad/);
    expect(() => hitRates(finds, catches, { by: 'kind', confidence: 2 })).toThrow(/confidence/);
  });

  it('property: agrees with a naive per-group count on random journals', () => {
    const findArb = fc.record({
      kind: fc.constantFrom('hard bottom', 'vegetation', 'bait', null),
      fished: fc.boolean(),
    });
    const journalArb = fc.array(findArb, { minLength: 1, maxLength: 40 }).chain((fs) =>
      fc.tuple(
        fc.constant(fs.map((f, i) => ({ id: i, ...f }) as FindInput)),
        fc.array(
          fc.record({
            findId: fc.option(fc.integer({ min: 0, max: fs.length + 2 }), { nil: null }),
            weightLb: fc.option(
              fc.integer({ min: 50, max: 900 }).map((h) => h / 100),
              { nil: null },
            ),
            fate: fc.constantFrom('weighed', 'culled', 'released', 'dead' as const),
          }),
          { maxLength: 120 },
        ),
      ),
    );
    fc.assert(
      fc.property(journalArb, ([fs, raw]) => {
        const cs = raw.map((c, i) => ({ id: i, ...c }) as CatchInput);
        const got = hitRates(fs, cs, { by: 'kind' });
        const expected = naiveHitRates(fs, cs, (f) => f.kind ?? null);
        expect(got.length).toBe(expected.length);
        for (const e of expected) {
          const g = got.find((x) => x.key === e.key)!;
          expect([g.finds, g.findsFished, g.findsWithFish, g.findsWithWeighedFish, g.fish]).toEqual([
            e.finds,
            e.findsFished,
            e.findsWithFish,
            e.findsWithWeighedFish,
            e.fish,
          ]);
          expect(g.fishWeightLb).toBeCloseTo(e.fishWeightLb, 6);
        }
      }),
    );
  });
});

describe('hitRates edge cases', () => {
  it('returns no groups for no finds, and zero counts for finds without catches', () => {
    expect(hitRates([], catches, { by: 'kind' })).toEqual([]);
    const [only] = hitRates([{ id: 1, kind: 'bait' }], [], { by: 'kind' });
    expect([only.finds, only.findsFished, only.fish, only.fishWeightLb]).toEqual([1, 0, 0, 0]);
  });
});
