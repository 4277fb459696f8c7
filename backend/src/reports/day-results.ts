import type { EntityManager } from '@mikro-orm/mariadb';
import type { EventRules, EventTotals, FieldContext, RecapDay } from '@shoalbook/shared';
import { bagOfDay, differenceOf, eventWeight } from '../weigh-ins/bag-rule';
import { reportFish, selectCatches, type ReportCatch } from './report-catches';
import { placeholders } from './report-events';
import { standingOf } from './standing';
import { isTrue, numberOrNull } from './row-values';

/** The rm_competition_day rows of some events, by date. */
export async function selectDayRows(
  em: EntityManager,
  crewId: string,
  eventIds: readonly string[],
): Promise<Record<string, unknown>[]> {
  if (!eventIds.length) return [];
  return em.execute(
    `SELECT id, event_id, date, has_official, official_gross_lb, official_penalty_lb, official_lb, day_place, late_minutes, field_size, winning_lb, cut_lb
       FROM rm_competition_day WHERE crew_id = ? AND event_id IN (${placeholders(eventIds.length)}) ORDER BY date`,
    [crewId, ...eventIds],
  );
}

/**
 * A competition day's bag by the one bag rule (weigh-ins/bag-rule), the official figures beside it with their
 * difference, and the day's place against its field. `catches` are the day's, in time order.
 */
export function dayResult(row: Record<string, unknown>, catches: readonly ReportCatch[], rules: EventRules): RecapDay {
  const official = isTrue(row.has_official)
    ? {
        grossLb: numberOrNull(row.official_gross_lb),
        penaltyLb: numberOrNull(row.official_penalty_lb),
        officialLb: numberOrNull(row.official_lb),
        dayPlace: numberOrNull(row.day_place),
        lateMinutes: numberOrNull(row.late_minutes),
      }
    : null;
  const bag = bagOfDay(
    catches.map((c) => ({ ...c, id: c.catchId })),
    rules,
    official?.lateMinutes ?? null,
  );
  const byId = new Map(catches.map((c) => [c.catchId, c]));
  const field = {
    fieldSize: numberOrNull(row.field_size),
    winningLb: numberOrNull(row.winning_lb),
    cutLb: numberOrNull(row.cut_lb),
  };
  return {
    competitionDayId: String(row.id),
    date: String(row.date),
    counted: bag.counted.map((id) => reportFish(byId.get(id)!)),
    fish: bag.fish.map((v) => ({
      ...reportFish(byId.get(v.catchId)!),
      state: v.state,
      weighed: v.weighed,
      penaltyLb: v.penaltyLb,
    })),
    penalties: bag.penalties,
    grossLb: bag.grossLb,
    penaltyLb: bag.penaltyLb,
    netLb: bag.netLb,
    official,
    difference: differenceOf(official, bag),
    dayPlace: official?.dayPlace ?? null,
    field,
    standing: standingOf(official?.dayPlace ?? null, official?.officialLb ?? bag.netLb, field),
  };
}

/**
 * An event's totals over its days: the computed net, the official weight (per day the official where recorded,
 * else the computed net), their difference, and the final place and total against the event's field.
 */
export function eventTotals(
  days: readonly RecapDay[],
  event: { finalPlace: number | null; field: FieldContext },
): EventTotals {
  const weight = eventWeight(days.map((d) => ({ computedNetLb: d.netLb, officialLb: d.official?.officialLb })));
  return {
    netLb: weight.computedNetLb,
    officialLb: weight.officialLb,
    differenceLb: weight.differenceLb,
    finalPlace: event.finalPlace,
    standing: standingOf(event.finalPlace, weight.officialLb, event.field),
  };
}

/**
 * Each event's totals by event id (the lake comparison's field context), from two queries for all of them. The
 * fish the read model holds as culled or released are left out: the bag rule gives them no weight and no
 * penalty, and the counted fish are the top values of the rest either way, so the totals are the recap's, read
 * from a few fish per day instead of every catch of the lake.
 */
export async function eventResults(
  em: EntityManager,
  crewId: string,
  events: readonly { id: string; rules: EventRules; finalPlace: number | null; field: FieldContext }[],
): Promise<Record<string, EventTotals>> {
  const ids = events.map((e) => e.id);
  if (!ids.length) return {};
  const [dayRows, catches] = await Promise.all([
    selectDayRows(em, crewId, ids),
    selectCatches(
      em,
      `c.crew_id = ? AND c.event_id IN (${placeholders(ids.length)}) AND c.bag_state NOT IN ('culled', 'released')`,
      [crewId, ...ids],
    ),
  ]);
  const results: Record<string, EventTotals> = {};
  for (const event of events) {
    const days = dayRows
      .filter((d) => d.event_id === event.id)
      .map((d) =>
        dayResult(
          d,
          catches.filter((c) => c.competitionDayId === d.id),
          event.rules,
        ),
      );
    results[event.id] = eventTotals(days, event);
  }
  return results;
}
