import { EntityManager } from '@mikro-orm/mariadb';
import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { CATCH_UNIT_GROUPINGS, type HitRateGroupView, type HitRatesView } from '@shoalbook/shared';
import { depthBandLabels, temperatureBandLabels } from '@shoalbook/analytics';
import { fromMicroLb } from '../../projections/rows';
import { GROUPING_PLURALS, groupLabel } from '../labels';
import { fishPerHour, groupRates, ranks, singleRate } from '../rates';
import { catchShareReading, findRateReading, noSpreadReading, smallSampleReading } from '../readings';
import { eventWhere, STOPS_RECORDED } from '../report-events';
import { GetHitRatesQuery } from './hit-rates.query';

/** Below this many finds fished a group's rank is flagged as resting mostly on the overall rate (our choice). */
export const SMALL_SAMPLE_FINDS = 10;
/** Adjusted rates closer together than this (one percentage point) read as "no spread between the groups". */
const NO_SPREAD = 0.01;

interface Sums {
  key: string;
  finds: number;
  findsFished: number;
  findsProducing: number;
  findsWeighed: number;
  fishCount: number;
  weighedCount: number;
  weightUlb: number;
  secondsFished: number;
  /** Fish in the events with stops recorded: the ones timed by secondsFished. */
  timedFish: number;
}

/** Sort order of keys: bands shallow→deep / cold→warm, numbers ascending, not recorded last. */
function keyOrder(by: string): (a: string, b: string) => number {
  const bands =
    by === 'depthBand'
      ? depthBandLabels()
      : by === 'temperatureBand'
        ? temperatureBandLabels()
        : by === 'timeOfDay'
          ? ['early', 'morning', 'midday', 'afternoon', 'late']
          : by === 'solunarPeriod'
            ? ['major', 'minor', 'none']
            : null;
  return (a, b) => {
    if (a === b) return 0;
    if (a === '') return 1;
    if (b === '') return -1;
    if (bands) return bands.indexOf(a) - bands.indexOf(b);
    return a.localeCompare(b, 'en', { numeric: true });
  };
}

/** Sums rm_group_stats over the selected events (one SQL GROUP BY on the read model) and adds the statistics. */
@QueryHandler(GetHitRatesQuery)
export class GetHitRatesHandler implements IQueryHandler<GetHitRatesQuery, HitRatesView> {
  constructor(private readonly em: EntityManager) {}

  async execute({ crewId, filters, by }: GetHitRatesQuery): Promise<HitRatesView> {
    const where = eventWhere(crewId, filters);
    // One round trip: the sums per group, and a first row counting the selected events (an event with no finds has no sums).
    const rows: Record<string, unknown>[] = await this.em.execute(
      `SELECT '#events' AS grouping, '' AS group_key, 0 AS finds, 0 AS finds_fished, 0 AS finds_producing, 0 AS finds_weighed, 0 AS fish_count,
              0 AS weighed_count, 0 AS weight_ulb, 0 AS seconds_fished, 0 AS timed_fish, COUNT(*) AS events,
              SUM(NOT ${STOPS_RECORDED} AND EXISTS (SELECT 1 FROM rm_catch_fact c WHERE c.crew_id = e.crew_id AND c.event_id = e.id)) AS derived
         FROM rm_event e WHERE ${where.sql}
       UNION ALL
       SELECT s.grouping, s.group_key, SUM(s.finds), SUM(s.finds_fished), SUM(s.finds_producing), SUM(s.finds_weighed), SUM(s.fish_count),
              SUM(s.weighed_count), SUM(s.weight_ulb), SUM(s.seconds_fished),
              SUM(CASE WHEN ${STOPS_RECORDED} THEN s.fish_count ELSE 0 END), COUNT(DISTINCT s.event_id), 0
         FROM rm_event e JOIN rm_group_stats s ON s.event_id = e.id AND s.crew_id = e.crew_id
        WHERE ${where.sql} AND s.grouping IN (?, 'kind')
        GROUP BY s.grouping, s.group_key`,
      [...where.params, ...where.params, by],
    );
    const sums = (grouping: string): Sums[] =>
      rows
        .filter((r) => r.grouping === grouping)
        .map((r) => ({
          key: String(r.group_key),
          finds: Number(r.finds),
          findsFished: Number(r.finds_fished),
          findsProducing: Number(r.finds_producing),
          findsWeighed: Number(r.finds_weighed),
          fishCount: Number(r.fish_count),
          weighedCount: Number(r.weighed_count),
          weightUlb: Number(r.weight_ulb),
          secondsFished: Number(r.seconds_fished),
          timedFish: Number(r.timed_fish),
        }))
        .sort((a, b) => keyOrder(by)(a.key, b.key));
    const groups = sums(by);
    const kinds = sums('kind');
    const eventRow = rows.find((r) => r.grouping === '#events');
    const eventCount = Number(eventRow?.events ?? 0);
    const derivedEvents = Number(eventRow?.derived ?? 0);

    const total = (list: Sums[], f: keyof Omit<Sums, 'key'>) => list.reduce((s, g) => s + g[f], 0);
    const overall = {
      finds: total(kinds, 'finds'),
      findsFished: total(kinds, 'findsFished'),
      findsProducing: total(kinds, 'findsProducing'),
      // The headline counts what the table below it counts: for the catch groupings that includes catches with no
      // find; for the find groupings each find sits in one row, so the rows sum to the same as the kinds.
      fishCount: total(groups, 'fishCount'),
      countedCount: total(groups, 'weighedCount'),
      weightLb: fromMicroLb(total(groups, 'weightUlb')),
      producing: singleRate(total(kinds, 'findsProducing'), total(kinds, 'findsFished')),
      // Time as the table counts it: on finds for the find groupings, on every stop (found or not) for the catch ones.
      secondsFished: total(groups, 'secondsFished'),
      fishPerHour: fishPerHour(total(groups, 'timedFish'), total(groups, 'secondsFished')),
    };

    const catchUnit = CATCH_UNIT_GROUPINGS.includes(by);
    const allFish = total(groups, 'fishCount');
    const producing = catchUnit
      ? groupRates(groups.map((g) => ({ successes: g.fishCount, trials: allFish })))
      : groupRates(groups.map((g) => ({ successes: g.findsProducing, trials: g.findsFished })));
    const weighed = catchUnit
      ? groupRates(groups.map((g) => ({ successes: g.weighedCount, trials: g.fishCount })))
      : groupRates(groups.map((g) => ({ successes: g.findsWeighed, trials: g.findsFished })));
    const share = groupRates(groups.map((g) => ({ successes: g.fishCount, trials: allFish })));
    const rank = ranks(producing);

    const views: HitRateGroupView[] = groups.map((g, i) => ({
      key: g.key === '' ? null : g.key,
      label: groupLabel(by, g.key === '' ? null : g.key),
      finds: g.finds,
      findsFished: g.findsFished,
      findsProducing: g.findsProducing,
      findsWeighed: g.findsWeighed,
      fishCount: g.fishCount,
      weighedCount: g.weighedCount,
      weightLb: fromMicroLb(g.weightUlb),
      producing: producing[i]!,
      weighed: weighed[i]!,
      shareOfFish: share[i]!,
      secondsFished: g.secondsFished,
      fishPerHour: fishPerHour(g.timedFish, g.secondsFished),
      rank: rank[i]!,
    }));

    const byRank = [...views].sort((a, b) => a.rank - b.rank);
    const readings: string[] = [];
    if (catchUnit) {
      if (allFish === 0)
        readings.push('No catches logged for these events yet: log competition-day catches to see when the fish bit.');
      for (const v of byRank) readings.push(catchShareReading(v.label, v.shareOfFish));
    } else {
      if (overall.findsFished === 0)
        readings.push(
          'No finds fished yet: add practice finds to an event and log the catches to see which kinds paid off.',
        );
      else readings.push(findRateReading('Overall, the practice', overall.producing));
      for (const v of byRank.filter((g) => g.findsFished > 0)) readings.push(findRateReading(v.label, v.producing));
      for (const v of byRank.filter((g) => g.findsFished > 0 && g.findsFished < SMALL_SAMPLE_FINDS))
        readings.push(smallSampleReading(v.label, v.findsFished));
      const adjusted = byRank
        .filter((g) => g.findsFished > 0 && g.producing.shrunk !== null)
        .map((g) => g.producing.shrunk!);
      if (adjusted.length > 1 && Math.max(...adjusted) - Math.min(...adjusted) < NO_SPREAD)
        readings.push(noSpreadReading(GROUPING_PLURALS[by] ?? 'the groups', adjusted[0]!));
    }
    return { by, unit: catchUnit ? 'catch' : 'find', groups: views, overall, readings, eventCount, derivedEvents };
  }
}
