import { depthBand, temperatureBand } from '@shoalbook/analytics';
import { type CatchTimingCalculator, spanSeconds, type TimingPlace } from './catch-timing';
import type { CatchRow, EventRow, FindRow, GroupStatsRow, OutcomeRow, StopRow } from './rows';

/** Find groupings stored in rm_group_stats: the unit is the find fished in an event. */
export const FIND_GROUPINGS = ['kind', 'subKind', 'depthBand', 'hardness', 'temperatureBand'] as const;
/** Catch groupings: the unit is the catch (a find's catches fall in different periods). */
export const CATCH_GROUPINGS = ['solunarPeriod', 'timeOfDay'] as const;

/** What group statistics read of a catch. */
export type CatchForStats = Pick<CatchRow, 'eventId' | 'bagCounted' | 'weightUlb' | 'solunarPeriod' | 'timeOfDay'>;

const safe = (band: () => string | null): string => {
  try {
    return band() ?? '';
  } catch {
    return '';
  }
};

/** Group keys of a find ('' = not recorded), with the bands of @shoalbook/analytics. */
export function findKeys(
  find: FindRow,
): Pick<OutcomeRow, 'kind' | 'subKind' | 'depthBand' | 'hardness' | 'temperatureBand'> {
  return {
    kind: find.kind,
    subKind: find.subKind,
    depthBand: safe(() => depthBand(find.depthFt)),
    hardness: find.hardness === null ? '' : String(find.hardness),
    temperatureBand: safe(() => temperatureBand(find.waterTempF)),
  };
}

/**
 * What outcomes and group statistics need of a set of catches: counts, integer micro-pound sums, first bite.
 * "Weighed" is the counted bag (the one bag rule's verdict, bag-states.ts), not a fate of its own.
 */
export interface CatchSums {
  fishCount: number;
  weighedCount: number;
  weightUlb: number;
  weighedWeightUlb: number;
  firstBiteAtMs: number | null;
}

/** The sums of some catches (the rebuild's path; incremental batches get the same sums from SQL GROUP BY). */
export function sumCatches(catches: Iterable<Pick<CatchRow, 'bagCounted' | 'weightUlb' | 'caughtAtMs'>>): CatchSums {
  const s: CatchSums = { fishCount: 0, weighedCount: 0, weightUlb: 0, weighedWeightUlb: 0, firstBiteAtMs: null };
  for (const c of catches) {
    s.fishCount++;
    s.weightUlb += c.weightUlb;
    if (c.bagCounted) {
      s.weighedCount++;
      s.weighedWeightUlb += c.weightUlb;
    }
    if (s.firstBiteAtMs === null || c.caughtAtMs < s.firstBiteAtMs) s.firstBiteAtMs = c.caughtAtMs;
  }
  return s;
}

/** What outcomes need of a find's stops in one event: how many, and the time on the find in whole seconds. */
export interface StopSums {
  stopCount: number;
  secondsFished: number;
}

/** The sums of some stops (the rebuild's path; incremental batches get the same sums from SQL GROUP BY). */
export function sumStops(stops: Iterable<Pick<StopRow, 'seconds'>>): StopSums {
  const s: StopSums = { stopCount: 0, secondsFished: 0 };
  for (const stop of stops) {
    s.stopCount++;
    s.secondsFished += stop.seconds;
  }
  return s;
}

/**
 * A find's outcome rows from the sums of its catches and stops per event: one per event it was marked in (in that
 * event's practice), stopped at or caught on. It is *fished* in an event when it has a stop on one of the event's
 * competition days, or a catch (a fish caught there was fished for, whether or not a stop was logged); a practice
 * mark alone does not make it fished. A deleted find has none.
 */
export function outcomesFromSums(
  find: FindRow | undefined,
  sumsByEvent: ReadonlyMap<string, CatchSums>,
  stopsByEvent: ReadonlyMap<string, StopSums> = new Map(),
): OutcomeRow[] {
  if (!find) return [];
  const events = new Set([...sumsByEvent.keys(), ...stopsByEvent.keys()]);
  if (find.eventId) events.add(find.eventId);
  const keys = findKeys(find);
  return [...events].sort().map((eventId) => {
    const s = sumsByEvent.get(eventId) ?? {
      fishCount: 0,
      weighedCount: 0,
      weightUlb: 0,
      weighedWeightUlb: 0,
      firstBiteAtMs: null,
    };
    const practiced = find.eventId === eventId;
    const stops = stopsByEvent.get(eventId) ?? { stopCount: 0, secondsFished: 0 };
    return {
      findId: find.id,
      eventId,
      crewId: find.crewId,
      lakeId: find.lakeId,
      ...keys,
      practiced,
      fished: stops.stopCount > 0 || s.fishCount > 0,
      fishCount: s.fishCount,
      weighedCount: s.weighedCount,
      weightUlb: s.weightUlb,
      weighedWeightUlb: s.weighedWeightUlb,
      firstBiteAtMs: s.firstBiteAtMs,
      stopCount: stops.stopCount,
      secondsFished: stops.secondsFished,
    };
  });
}

/** A find's outcome rows, recomputed from scratch from its catch facts and stops. */
export function deriveOutcomes(
  find: FindRow | undefined,
  catches: readonly CatchRow[],
  stops: readonly StopRow[] = [],
): OutcomeRow[] {
  if (!find) return [];
  const byEvent = <T extends { findId: string | null; eventId: string }>(rows: readonly T[]) => {
    const out = new Map<string, T[]>();
    for (const r of rows) {
      if (r.findId !== find.id) continue;
      let list = out.get(r.eventId);
      if (!list) out.set(r.eventId, (list = []));
      list.push(r);
    }
    return out;
  };
  return outcomesFromSums(
    find,
    new Map([...byEvent(catches)].map(([e, list]) => [e, sumCatches(list)])),
    new Map([...byEvent(stops)].map(([e, list]) => [e, sumStops(list)])),
  );
}

/** Sums of one catch grouping key within an event. */
export interface CatchGroupSums extends CatchSums {
  grouping: (typeof CATCH_GROUPINGS)[number];
  key: string;
}

/** The catch-grouping sums of one event's catches (the rebuild's path). */
export function catchGroupSums(catches: readonly CatchForStats[]): CatchGroupSums[] {
  const out = new Map<string, CatchGroupSums>();
  for (const c of catches) {
    for (const grouping of CATCH_GROUPINGS) {
      const key = c[grouping];
      const id = `${grouping}\u0000${key}`;
      let g = out.get(id);
      if (!g)
        out.set(
          id,
          (g = {
            grouping,
            key,
            fishCount: 0,
            weighedCount: 0,
            weightUlb: 0,
            weighedWeightUlb: 0,
            firstBiteAtMs: null,
          }),
        );
      g.fishCount++;
      g.weightUlb += c.weightUlb;
      if (c.bagCounted) {
        g.weighedCount++;
        g.weighedWeightUlb += c.weightUlb;
      }
    }
  }
  return [...out.values()];
}

/** Time on the water of one catch-grouping key within an event: the stops' seconds in that period or band. */
export interface StopGroupSeconds {
  grouping: (typeof CATCH_GROUPINGS)[number];
  key: string;
  secondsFished: number;
}

/**
 * The seconds of an event's stops (found or not, left ones only) in each solunar period and time-of-day band, split
 * at the periods' and bands' edges by the same rule that classes a catch: fish per hour by period reads against it.
 */
export function stopGroupSeconds(
  stops: Iterable<Pick<StopRow, 'arrivedAtMs' | 'leftAtMs'>>,
  place: TimingPlace,
  calc: CatchTimingCalculator,
): StopGroupSeconds[] {
  const sums = new Map<string, StopGroupSeconds>();
  for (const stop of stops) {
    if (stop.leftAtMs === null) continue;
    const split = spanSeconds(calc, stop.arrivedAtMs, stop.leftAtMs, place);
    for (const grouping of CATCH_GROUPINGS)
      for (const [key, seconds] of split[grouping]) {
        const id = `${grouping}\u0000${key}`;
        const g = sums.get(id) ?? { grouping, key, secondsFished: 0 };
        g.secondsFished += seconds;
        sums.set(id, g);
      }
  }
  return [...sums.values()];
}

function blank(event: EventRow, grouping: string, groupKey: string): GroupStatsRow {
  return {
    eventId: event.id,
    grouping,
    groupKey,
    crewId: event.crewId,
    lakeId: event.lakeId,
    finds: 0,
    findsFished: 0,
    findsProducing: 0,
    findsWeighed: 0,
    fishCount: 0,
    weighedCount: 0,
    weightUlb: 0,
    weighedWeightUlb: 0,
    secondsFished: 0,
  };
}

/**
 * An event's group statistics, recomputed from its outcome rows (find groupings), the sums of its catch facts per
 * catch-grouping key and its stops' time per key. Sums are integer micro-pounds and whole seconds, so the result
 * does not depend on the order of the inputs.
 */
export function deriveGroupStats(
  event: EventRow | undefined,
  outcomes: readonly OutcomeRow[],
  catchGroups: readonly CatchGroupSums[],
  stopTime: readonly StopGroupSeconds[] = [],
): GroupStatsRow[] {
  if (!event) return [];
  const groups = new Map<string, GroupStatsRow>();
  const row = (grouping: string, key: string) => {
    const id = `${grouping}\u0000${key}`;
    let g = groups.get(id);
    if (!g) groups.set(id, (g = blank(event, grouping, key)));
    return g;
  };
  for (const o of outcomes) {
    if (o.eventId !== event.id) continue;
    for (const grouping of FIND_GROUPINGS) {
      const g = row(grouping, o[grouping]);
      g.finds++;
      if (o.fished) g.findsFished++;
      if (o.fishCount > 0) g.findsProducing++;
      if (o.weighedCount > 0) g.findsWeighed++;
      g.fishCount += o.fishCount;
      g.weighedCount += o.weighedCount;
      g.weightUlb += o.weightUlb;
      g.weighedWeightUlb += o.weighedWeightUlb;
      g.secondsFished += o.secondsFished;
    }
  }
  for (const c of catchGroups) {
    if (c.fishCount === 0) continue;
    const g = row(c.grouping, c.key);
    g.fishCount += c.fishCount;
    g.weighedCount += c.weighedCount;
    g.weightUlb += c.weightUlb;
    g.weighedWeightUlb += c.weighedWeightUlb;
  }
  // A period fished without a bite is a row of its own: time with no fish is what makes fish per hour honest.
  for (const t of stopTime) if (t.secondsFished > 0) row(t.grouping, t.key).secondsFished += t.secondsFished;
  return [...groups.values()].sort((a, b) => (a.grouping + a.groupKey < b.grouping + b.groupKey ? -1 : 1));
}
