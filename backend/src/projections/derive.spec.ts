import { countBagStates } from './bag-states';
import fc from 'fast-check';
import { hitRates } from '@shoalbook/analytics';
import { describe, expect, it } from 'vitest';
import { catchGroupSums, deriveGroupStats, deriveOutcomes, FIND_GROUPINGS } from './derive';
import { JournalApplier } from './journal-applier';
import type { JournalRecord } from './journal-record';
import { ProjectionState } from './projection-state';
import { fromMicroLb } from './rows';

// The reference is @shoalbook/analytics hitRates (checked against Newcombe 1998 and reference libraries): the
// projector's rows, summed, must give its counts, and its weights to within the micro-pound rounding.
const LAKE = '00000000-0000-4000-8000-00000000000a';
const EVENTS = ['00000000-0000-4000-8000-0000000000e1', '00000000-0000-4000-8000-0000000000e2'];
const KINDS = ['hard-bottom', 'vegetation', 'bait'];

const findArb = fc.record({
  kind: fc.constantFrom(...KINDS),
  subKind: fc.constantFrom('', 'shell', 'rock'),
  depthFt: fc.option(fc.double({ min: 0, max: 50, noNaN: true }), { nil: null }),
  hardness: fc.option(fc.integer({ min: 1, max: 5 }), { nil: null }),
  waterTempF: fc.option(fc.double({ min: 40, max: 90, noNaN: true }), { nil: null }),
  event: fc.option(fc.integer({ min: 0, max: 1 }), { nil: null }),
});
const catchArb = (finds: number) =>
  fc.record({
    find: fc.option(fc.integer({ min: 0, max: finds - 1 }), { nil: null }),
    event: fc.integer({ min: 0, max: 1 }),
    weightLb: fc.double({ min: 0.1, max: 12, noNaN: true }),
    fate: fc.constantFrom('weighed', 'culled', 'released', 'dead'),
    minute: fc.integer({ min: 0, max: 600 }),
  });

type Of<A> = A extends fc.Arbitrary<infer T> ? T : never;

function journal(finds: Of<typeof findArb>[], catches: Of<ReturnType<typeof catchArb>>[]): JournalRecord[] {
  let seq = 0;
  const r = (type: string, aggregateType: string, payload: Record<string, unknown>): JournalRecord => ({
    seq: ++seq,
    crewId: 'crew',
    type,
    aggregateType,
    aggregateId: String(payload.id),
    payload,
  });
  return [
    r('LakeCreated', 'lake', { id: LAKE, name: 'Test', timeZone: 'America/Chicago', lat: 34.7, lon: -92.3 }),
    ...EVENTS.map((id, i) =>
      r('EventCreated', 'event', {
        id,
        lakeId: LAKE,
        name: `E${i}`,
        competitionDates: [`2026-10-0${i + 1}`],
        competitionDays: [{ id: `${id.slice(0, -2)}d${i}`, date: `2026-10-0${i + 1}` }],
      }),
    ),
    ...finds.map((f, i) =>
      r('FindAdded', 'find', {
        id: `find-${i}`,
        lakeId: LAKE,
        eventId: f.event === null ? null : EVENTS[f.event],
        name: `F${i}`,
        kind: f.kind,
        subKind: f.subKind,
        depthFt: f.depthFt,
        hardness: f.hardness,
        waterTempF: f.waterTempF,
        lat: 34.7,
        lon: -92.3,
      }),
    ),
    ...catches.map((c, i) =>
      r('CatchLogged', 'catch', {
        id: `catch-${i}`,
        eventId: EVENTS[c.event],
        competitionDayId: `${EVENTS[c.event]!.slice(0, -2)}d${c.event}`,
        findId: c.find === null ? null : `find-${c.find}`,
        caughtAt: new Date(Date.UTC(2026, 9, 1 + c.event, 12) + c.minute * 60_000).toISOString(),
        weightLb: c.weightLb,
        fate: c.fate,
        species: 'largemouth',
      }),
    ),
  ];
}

describe('derived rows against analytics hitRates', () => {
  it('sum to the same counts and weights per grouping', () => {
    fc.assert(
      fc.property(
        fc
          .array(findArb, { minLength: 1, maxLength: 12 })
          .chain((finds) => fc.tuple(fc.constant(finds), fc.array(catchArb(finds.length), { maxLength: 30 }))),
        ([finds, catches]) => {
          const state = new ProjectionState(false);
          const applier = new JournalApplier(state);
          for (const e of journal(finds, catches)) applier.apply(e);
          // As the rebuild does: each catch's state under its day's bag rule.
          countBagStates(state.catches.rows.values(), (id) => state.events.get(id)?.rules);
          const facts = [...state.catches.rows.values()];
          const outcomes = [...state.finds.rows.values()].flatMap((f) =>
            deriveOutcomes(
              f,
              facts.filter((c) => c.findId === f.id),
            ),
          );
          const stats = [...state.events.rows.values()].flatMap((ev) =>
            deriveGroupStats(
              ev,
              outcomes.filter((o) => o.eventId === ev.id),
              catchGroupSums(facts.filter((c) => c.eventId === ev.id)),
            ),
          );

          // The reference: one analytics "find" per (find, event) with a row, its catches keyed the same way; fished
          // when caught on in that event (no stops in this journal), not merely marked in its practice.
          const pairs = outcomes.map((o) => {
            const f = state.finds.get(o.findId)!;
            return {
              id: `${o.findId}|${o.eventId}`,
              kind: f.kind,
              subKind: f.subKind || null,
              depthFt: f.depthFt,
              hardness: f.hardness,
              waterTempF: f.waterTempF,
              fished: facts.some((c) => c.findId === o.findId && c.eventId === o.eventId),
            };
          });
          const refCatches = facts.map((c) => ({
            id: c.id,
            findId: c.findId ? `${c.findId}|${c.eventId}` : null,
            weightLb: c.weightLb,
            // "Weighed" is the counted bag's verdict, whatever the logged fate.
            fate: c.bagCounted ? ('weighed' as const) : ('released' as const),
          }));
          for (const grouping of FIND_GROUPINGS) {
            const reference = hitRates(pairs, refCatches, { by: grouping });
            for (const g of reference) {
              const key = g.key === null ? '' : String(g.key);
              const mine = stats.filter((s) => s.grouping === grouping && s.groupKey === key);
              const sum = (
                f:
                  | 'finds'
                  | 'findsFished'
                  | 'findsProducing'
                  | 'findsWeighed'
                  | 'fishCount'
                  | 'weighedCount'
                  | 'weightUlb',
              ) => mine.reduce((s, r) => s + r[f], 0);
              expect([
                sum('finds'),
                sum('findsFished'),
                sum('findsProducing'),
                sum('findsWeighed'),
                sum('fishCount'),
                sum('weighedCount'),
              ]).toEqual([g.finds, g.findsFished, g.findsWithFish, g.findsWithWeighedFish, g.fish, g.weighedFish]);
              expect(Math.abs(fromMicroLb(sum('weightUlb')) - g.fishWeightLb)).toBeLessThan(1e-5 * Math.max(1, g.fish));
            }
            expect(new Set(stats.filter((s) => s.grouping === grouping).map((s) => s.groupKey)).size).toBe(
              reference.length,
            );
          }
        },
      ),
      { numRuns: 60, seed: 11 },
    );
  });

  it('end the same when an event is applied twice', () => {
    const events = journal(
      [{ kind: 'bait', subKind: '', depthFt: 12, hardness: null, waterTempF: 60, event: 0 }],
      [{ find: 0, event: 0, weightLb: 3.2, fate: 'weighed', minute: 5 }],
    );
    const once = new ProjectionState(false);
    const twice = new ProjectionState(false);
    const a = new JournalApplier(once);
    const b = new JournalApplier(twice);
    for (const e of events) a.apply(e);
    for (const e of events) {
      b.apply(e);
      b.apply(e);
    }
    expect([...twice.catches.rows.values()]).toEqual([...once.catches.rows.values()]);
    expect([...twice.finds.rows.values()]).toEqual([...once.finds.rows.values()]);
    expect([...twice.days.rows.values()]).toEqual([...once.days.rows.values()]);
  });
});
