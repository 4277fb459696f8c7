import { depthBand, temperatureBand } from '@shoalbook/analytics';
import type { CatchRow, EventRow, FindRow, GroupStatsRow, OutcomeRow } from './rows';

/** Find groupings stored in rm_group_stats: the unit is the find fished in an event. */
export const FIND_GROUPINGS = ['kind', 'subKind', 'depthBand', 'hardness', 'temperatureBand'] as const;
/** Catch groupings: the unit is the catch (a find's catches fall in different periods). */
export const CATCH_GROUPINGS = ['solunarPeriod', 'timeOfDay'] as const;

/** What group statistics read of a catch. */
export type CatchForStats = Pick<CatchRow, 'eventId' | 'fate' | 'weightUlb' | 'solunarPeriod' | 'timeOfDay'>;

const safe = (band: () => string | null): string => {
  try {
    return band() ?? '';
  } catch {
    return '';
  }
};

/** Group keys of a find ('' = not recorded), with the bands of @shoalbook/analytics. */
export function findKeys(find: FindRow): Pick<OutcomeRow, 'kind' | 'subKind' | 'depthBand' | 'hardness' | 'temperatureBand'> {
  return {
    kind: find.kind,
    subKind: find.subKind,
    depthBand: safe(() => depthBand(find.depthFt)),
    hardness: find.hardness === null ? '' : String(find.hardness),
    temperatureBand: safe(() => temperatureBand(find.waterTempF)),
  };
}

/**
 * A find's outcome rows, recomputed from scratch from its catch facts: one per event it was fished in (marked
 * in that event's practice, or caught on in it). A deleted find has none.
 */
export function deriveOutcomes(find: FindRow | undefined, catches: readonly CatchRow[]): OutcomeRow[] {
  if (!find) return [];
  const byEvent = new Map<string, CatchRow[]>();
  if (find.eventId) byEvent.set(find.eventId, []);
  for (const c of catches) {
    if (c.findId !== find.id) continue;
    let list = byEvent.get(c.eventId);
    if (!list) byEvent.set(c.eventId, (list = []));
    list.push(c);
  }
  const keys = findKeys(find);
  const rows: OutcomeRow[] = [];
  for (const eventId of [...byEvent.keys()].sort()) {
    const list = byEvent.get(eventId)!;
    let weighedCount = 0;
    let weightUlb = 0;
    let weighedWeightUlb = 0;
    let firstBiteAtMs: number | null = null;
    for (const c of list) {
      weightUlb += c.weightUlb;
      if (c.fate === 'weighed') {
        weighedCount++;
        weighedWeightUlb += c.weightUlb;
      }
      if (firstBiteAtMs === null || c.caughtAtMs < firstBiteAtMs) firstBiteAtMs = c.caughtAtMs;
    }
    const practiced = find.eventId === eventId;
    rows.push({
      findId: find.id,
      eventId,
      crewId: find.crewId,
      lakeId: find.lakeId,
      ...keys,
      practiced,
      fished: practiced || list.length > 0,
      fishCount: list.length,
      weighedCount,
      weightUlb,
      weighedWeightUlb,
      firstBiteAtMs,
    });
  }
  return rows;
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
  };
}

/**
 * An event's group statistics, recomputed from its outcome rows (find groupings) and its catch facts (catch
 * groupings). Sums are integer micro-pounds, so the result does not depend on the order of the inputs.
 */
export function deriveGroupStats(event: EventRow | undefined, outcomes: readonly OutcomeRow[], catches: readonly CatchForStats[]): GroupStatsRow[] {
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
    }
  }
  for (const c of catches) {
    if (c.eventId !== event.id) continue;
    for (const grouping of CATCH_GROUPINGS) {
      const g = row(grouping, c[grouping]);
      g.fishCount++;
      g.weightUlb += c.weightUlb;
      if (c.fate === 'weighed') {
        g.weighedCount++;
        g.weighedWeightUlb += c.weightUlb;
      }
    }
  }
  return [...groups.values()].sort((a, b) => (a.grouping + a.groupKey < b.grouping + b.groupKey ? -1 : 1));
}
