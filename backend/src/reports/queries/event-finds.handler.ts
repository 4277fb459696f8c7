import { EntityManager } from '@mikro-orm/mariadb';
import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import type { EventFindsView, FindKind, PaidOffFindView } from '@shoalbook/shared';
import { fromMicroLb } from '../../projections/rows';
import { outcomeOf } from '../outcome';
import { fishPerHour, singleRate } from '../rates';
import { selectEvents } from '../report-events';
import { GetEventFindsQuery } from './event-finds.query';
import { isTrue } from '../row-values';

const numOrNull = (v: unknown) => (v === null || v === undefined ? null : Number(v));

/** rm_find_outcome joined with rm_find for one event. */
@QueryHandler(GetEventFindsQuery)
export class GetEventFindsHandler implements IQueryHandler<GetEventFindsQuery, EventFindsView | null> {
  constructor(private readonly em: EntityManager) {}

  async execute({ crewId, eventId }: GetEventFindsQuery): Promise<EventFindsView | null> {
    const [event] = await selectEvents(this.em, crewId, { eventId });
    if (!event) return null;
    const rows: Record<string, unknown>[] = await this.em.execute(
      `SELECT o.find_id, o.practiced, o.fished, o.fish_count, o.weighed_count, o.weight_ulb, o.first_bite_at,
              o.stop_count, o.seconds_fished,
              (SELECT COUNT(DISTINCT c.competition_day_id) FROM rm_catch_fact c
                WHERE c.crew_id = o.crew_id AND c.event_id = o.event_id AND c.find_id = o.find_id) AS catch_days,
              f.name, f.kind, f.sub_kind, f.depth_ft, f.hardness, f.water_temp_f
         FROM rm_find_outcome o JOIN rm_find f ON f.id = o.find_id AND f.crew_id = o.crew_id
        WHERE o.crew_id = ? AND o.event_id = ?
        ORDER BY o.weight_ulb DESC, o.fish_count DESC, f.name`,
      [crewId, eventId],
    );
    const finds: PaidOffFindView[] = rows.map((r) => {
      const base = { fished: isTrue(r.fished), fishCount: Number(r.fish_count), weighedCount: Number(r.weighed_count) };
      const bite = r.first_bite_at;
      const seconds = Number(r.seconds_fished);
      return {
        findId: String(r.find_id),
        name: String(r.name),
        kind: String(r.kind) as FindKind,
        subKind: String(r.sub_kind),
        depthFt: numOrNull(r.depth_ft),
        hardness: numOrNull(r.hardness),
        waterTempF: numOrNull(r.water_temp_f),
        practiced: isTrue(r.practiced),
        ...base,
        // Before stops existed: one stop per day with a catch, and no time on the find.
        stopCount: event.derivedFromCatches ? Number(r.catch_days) : Number(r.stop_count),
        minutesFished: event.derivedFromCatches ? null : Math.round(seconds / 60),
        fishPerHour: event.derivedFromCatches ? null : fishPerHour(base.fishCount, seconds),
        weightLb: fromMicroLb(Number(r.weight_ulb)),
        firstBiteAt:
          bite === null || bite === undefined
            ? null
            : new Date(
                bite instanceof Date ? bite.getTime() : Date.parse(`${String(bite).replace(' ', 'T')}Z`),
              ).toISOString(),
        outcome: outcomeOf(base),
      };
    });
    const fished = finds.filter((f) => f.fished);
    return {
      finds,
      paidOff: singleRate(fished.filter((f) => f.fishCount > 0).length, fished.length),
      derivedFromCatches: event.derivedFromCatches,
    };
  }
}
