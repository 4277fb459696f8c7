import { EntityManager } from '@mikro-orm/mariadb';
import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import type { TimingView } from '@shoalbook/shared';
import { fromMicroLb } from '../../projections/rows';
import { selectThinnedCatches } from '../report-catches';
import { eventWhere } from '../report-events';
import { GetTimingQuery } from './timing.query';

/** The scatter plot shows at most this many catches, thinned evenly over time; byHour always counts them all. */
export const MAX_TIMING_POINTS = 5000;

@QueryHandler(GetTimingQuery)
export class GetTimingHandler implements IQueryHandler<GetTimingQuery, TimingView> {
  constructor(private readonly em: EntityManager) {}

  async execute({ crewId, filters }: GetTimingQuery): Promise<TimingView> {
    const where = eventWhere(crewId, filters);
    const scope = `c.crew_id = ? AND c.event_id IN (SELECT e.id FROM rm_event e WHERE ${where.sql})`;
    const params = [crewId, ...where.params];
    const { catches, total } = await selectThinnedCatches(this.em, scope, params, MAX_TIMING_POINTS);
    const hours: Record<string, unknown>[] = await this.em.execute(
      `SELECT FLOOR(c.local_minutes / 60) AS hour, COUNT(*) AS fish, SUM(c.weight_ulb) AS weight_ulb FROM rm_catch_fact c WHERE ${scope} GROUP BY hour ORDER BY hour`,
      params,
    );
    return {
      catches: catches.map((c) => ({
        catchId: c.catchId,
        caughtAt: c.caughtAt,
        localMinutes: c.localMinutes,
        minutesFromSunrise: c.minutesFromSunrise,
        solunarPeriod: c.solunarPeriod === 'major' || c.solunarPeriod === 'minor' ? c.solunarPeriod : null,
        weightLb: c.weightLb,
        fate: c.fate,
        eventId: c.eventId,
        day: c.day,
      })),
      totalCatches: total,
      byHour: hours.map((h) => ({
        hour: Number(h.hour),
        fishCount: Number(h.fish),
        weightLb: fromMicroLb(Number(h.weight_ulb)),
      })),
    };
  }
}
