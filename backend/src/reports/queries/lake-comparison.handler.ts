import { EntityManager } from '@mikro-orm/mariadb';
import { HttpStatus } from '@nestjs/common';
import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { compareProportions } from '@shoalbook/analytics';
import { CATCH_UNIT_GROUPINGS, type EventRate, type LakeComparisonView } from '@shoalbook/shared';
import { ApiException, ErrorCode } from '../../common/errors/api-errors';
import { eventLabel, groupLabel } from '../labels';
import { fishPerHour, groupRates } from '../rates';
import { differenceText, percent, pValueText } from '../readings';
import { eventResults } from '../day-results';
import { findLake, placeholders, selectEvents } from '../report-events';
import { GetLakeComparisonQuery } from './lake-comparison.query';

/** Reads rm_group_stats for the lake's events; differences with @shoalbook/analytics compareProportions. */
@QueryHandler(GetLakeComparisonQuery)
export class GetLakeComparisonHandler implements IQueryHandler<GetLakeComparisonQuery, LakeComparisonView> {
  constructor(private readonly em: EntityManager) {}

  async execute({ crewId, lakeId, by, filters, eventIds }: GetLakeComparisonQuery): Promise<LakeComparisonView> {
    // Side by side on two pooled connections: a report is read on every filter change.
    const [lake, events] = await Promise.all([
      findLake(this.em, crewId, lakeId),
      selectEvents(this.em, crewId, { ...filters, lakeId }, { ids: eventIds }),
    ]);
    if (!lake) throw new ApiException(HttpStatus.NOT_FOUND, 'No such lake in this crew.', ErrorCode.notFound);
    const refs = events.map(({ id, name, firstDate, season, year, derivedFromCatches }) => ({
      id,
      name,
      firstDate,
      season,
      year,
      derivedFromCatches,
    }));
    const view: LakeComparisonView = {
      lake: { id: lake.id, name: lake.name },
      by,
      events: refs,
      results: await eventResults(this.em, crewId, events),
      groups: [],
      comparisons: [],
    };
    if (!events.length) return view;

    const catchUnit = CATCH_UNIT_GROUPINGS.includes(by);
    const rows: Record<string, unknown>[] = await this.em.execute(
      `SELECT event_id, group_key, finds_fished, finds_producing, fish_count, seconds_fished FROM rm_group_stats
        WHERE crew_id = ? AND grouping = ? AND event_id IN (${placeholders(events.length)})`,
      [crewId, by, ...events.map((e) => e.id)],
    );
    const keys = [...new Set(rows.map((r) => String(r.group_key)))].sort((a, b) =>
      a === '' ? 1 : b === '' ? -1 : a.localeCompare(b, 'en', { numeric: true }),
    );
    const cell = new Map<string, { successes: number; trials: number }>();
    const perHour = new Map<string, number | null>();
    const fishByEvent = new Map<string, number>();
    for (const r of rows)
      fishByEvent.set(String(r.event_id), (fishByEvent.get(String(r.event_id)) ?? 0) + Number(r.fish_count));
    for (const r of rows) {
      const successes = catchUnit ? Number(r.fish_count) : Number(r.finds_producing);
      const trials = catchUnit ? (fishByEvent.get(String(r.event_id)) ?? 0) : Number(r.finds_fished);
      cell.set(`${String(r.event_id)}|${String(r.group_key)}`, { successes, trials });
      perHour.set(
        `${String(r.event_id)}|${String(r.group_key)}`,
        fishPerHour(Number(r.fish_count), Number(r.seconds_fished)),
      );
    }
    const count = (eventId: string, key: string) =>
      cell.get(`${eventId}|${key}`) ?? { successes: 0, trials: catchUnit ? (fishByEvent.get(eventId) ?? 0) : 0 };

    // Shrinkage within each event, toward that event's pooled rate.
    const perEventRates = new Map<string, Map<string, EventRate>>();
    for (const e of events) {
      const rates = groupRates(keys.map((k) => count(e.id, k)));
      perEventRates.set(
        e.id,
        new Map(
          keys.map((k, i) => [
            k,
            {
              ...rates[i]!,
              findsFished: catchUnit ? 0 : rates[i]!.trials,
              // An event derived from catches has no time fished; its seconds are 0, so this is null there.
              fishPerHour: perHour.get(`${e.id}|${k}`) ?? null,
            },
          ]),
        ),
      );
    }
    view.groups = keys.map((k) => ({
      key: k === '' ? null : k,
      label: groupLabel(by, k === '' ? null : k),
      perEvent: Object.fromEntries(events.map((e) => [e.id, perEventRates.get(e.id)!.get(k)!])),
    }));

    const pairs: [number, number][] = [];
    for (let i = 1; i < events.length; i++) pairs.push([i, i - 1]);
    if (events.length > 2) pairs.push([events.length - 1, 0]);
    for (const k of keys) {
      const label = groupLabel(by, k === '' ? null : k);
      for (const [later, earlier] of pairs) {
        const a = events[later]!;
        const b = events[earlier]!;
        const ca = count(a.id, k);
        const cb = count(b.id, k);
        const cmp = compareProportions(ca, cb);
        const defined = Number.isFinite(cmp.difference);
        const moreThanChance = defined && cmp.pValue < 0.05 && (cmp.lower > 0 || cmp.upper < 0);
        const la = eventLabel(a, refs);
        const lb = eventLabel(b, refs);
        let reading: string;
        if (!defined) reading = `${label}: not fished in both ${la} and ${lb}, so there is nothing to compare.`;
        else {
          const rateA = ca.successes / ca.trials;
          const rateB = cb.successes / cb.trials;
          const verb = cmp.difference > 0 ? 'did better' : cmp.difference < 0 ? 'did worse' : 'did the same';
          const unit = catchUnit ? 'of the fish' : 'of finds fished';
          reading =
            `${label} ${verb} in ${la} than in ${lb}: ${percent(rateA)} against ${percent(rateB)} ${unit} ` +
            `(${differenceText(cmp.difference, cmp.lower, cmp.upper)}); ` +
            (moreThanChance
              ? `more than chance (${pValueText(cmp.pValue)}).`
              : `could well be chance (${pValueText(cmp.pValue)}).`);
        }
        view.comparisons.push({
          key: k === '' ? null : k,
          label,
          a: a.id,
          b: b.id,
          difference: defined ? cmp.difference : null,
          lower: cmp.lower,
          upper: cmp.upper,
          pValue: cmp.pValue,
          moreThanChance,
          reading,
        });
      }
    }
    return view;
  }
}
