import { EntityManager } from '@mikro-orm/mariadb';
import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import type { EventRecapView, FindKind } from '@shoalbook/shared';
import { fromMicroLb } from '../../projections/rows';
import { bagOfDay } from '../../weigh-ins/bag-rule';
import { dayResult, eventTotals, selectDayRows } from '../day-results';
import { fishPerHour, singleRate } from '../rates';
import { percent, plural } from '../readings';
import { reportFish, selectCatches, type ReportCatch } from '../report-catches';
import { findLake, selectEvents } from '../report-events';
import { GetEventRecapQuery } from './event-recap.query';
import { isTrue } from '../row-values';

const bagInput = (catches: readonly ReportCatch[]) => catches.map((c) => ({ ...c, id: c.catchId }));

/** The recap from rm_event, rm_competition_day, rm_catch_fact, rm_find_outcome and rm_find. */
@QueryHandler(GetEventRecapQuery)
export class GetEventRecapHandler implements IQueryHandler<GetEventRecapQuery, EventRecapView | null> {
  constructor(private readonly em: EntityManager) {}

  async execute({ crewId, eventId }: GetEventRecapQuery): Promise<EventRecapView | null> {
    const [event] = await selectEvents(this.em, crewId, { eventId });
    if (!event) return null;
    const lake = await findLake(this.em, crewId, event.lakeId);
    const dayRows = await selectDayRows(this.em, crewId, [eventId]);
    const catches = await selectCatches(this.em, 'c.crew_id = ? AND c.event_id = ?', [crewId, eventId]);
    const days = dayRows.map((d) =>
      dayResult(
        d,
        catches.filter((c) => c.competitionDayId === d.id),
        event.rules,
      ),
    );

    const timeline: EventRecapView['timeline'] = [];
    for (const d of dayRows) {
      const mine = catches.filter((c) => c.competitionDayId === d.id);
      for (let i = 0; i < mine.length; i++) {
        const c = mine[i]!;
        timeline.push({
          catchId: c.catchId,
          caughtAt: c.caughtAt,
          weightLb: c.weightLb,
          cumulativeBagLb: bagOfDay(bagInput(mine.slice(0, i + 1)), event.rules, null).grossLb,
          day: c.day,
        });
      }
    }

    const outcomes: Record<string, unknown>[] = await this.em.execute(
      `SELECT o.find_id, o.practiced, o.fished, o.fish_count, o.weight_ulb, o.seconds_fished, f.name, f.kind, f.sub_kind
         FROM rm_find_outcome o JOIN rm_find f ON f.id = o.find_id AND f.crew_id = o.crew_id
        WHERE o.crew_id = ? AND o.event_id = ?`,
      [crewId, eventId],
    );
    const practiced = outcomes.filter((o) => isTrue(o.practiced));
    const producingFinds = outcomes
      .filter((o) => Number(o.fish_count) > 0)
      .map((o) => ({
        findId: String(o.find_id),
        name: String(o.name),
        kind: String(o.kind) as FindKind,
        subKind: String(o.sub_kind),
        fishCount: Number(o.fish_count),
        weightLb: fromMicroLb(Number(o.weight_ulb)),
      }))
      .sort((a, b) => b.weightLb - a.weightLb || b.fishCount - a.fishCount || a.name.localeCompare(b.name));
    const share = singleRate(practiced.filter((o) => Number(o.fish_count) > 0).length, practiced.length);
    const big = catches.reduce<(typeof catches)[number] | null>(
      (best, c) => (!best || c.weightLb > best.weightLb ? c : best),
      null,
    );

    const totals = eventTotals(days, event);
    const fishCounted = days.reduce((s, d) => s + d.counted.length, 0);
    const findsFished = outcomes.filter((o) => isTrue(o.fished)).length;
    const secondsFished = outcomes.reduce((s, o) => s + Number(o.seconds_fished), 0);
    // Fish from finds over the time on finds (a fish with no find was not caught in any find's time).
    const findFish = outcomes.reduce((s, o) => s + Number(o.fish_count), 0);
    const readings: string[] = [];
    if (!catches.length)
      readings.push(
        'No catches logged for this event yet: log the competition-day catches to see the bags and which finds produced.',
      );
    else {
      readings.push(
        `${plural(catches.length, 'fish', 'fish')} caught, ${fishCounted} counted over ${plural(days.length, 'day')}; the counted bags make ${totals.netLb.toFixed(2)} lb after penalties.`,
      );
      if (event.derivedFromCatches)
        readings.push(
          `No stops were logged for this event: ${plural(findsFished, 'find')} count as fished because they produced (derived from catches), so the finds tried without a bite are missing and no time fished is known.`,
        );
      else if (secondsFished > 0)
        readings.push(
          `${plural(findsFished, 'find')} fished for ${(secondsFished / 3600).toFixed(1)} h in all: ${fishPerHour(findFish, secondsFished)!.toFixed(2)} fish per hour on finds.`,
        );
      if (practiced.length)
        readings.push(
          `${share.successes} of ${plural(practiced.length, 'practice find')} produced a fish (${percent(share.rate)}).`,
        );
      if (big)
        readings.push(
          `Big fish: ${big.weightLb.toFixed(2)} lb${big.findName ? ` from ${big.findName}` : ''} on ${big.day}.`,
        );
    }
    return {
      event: {
        id: event.id,
        name: event.name,
        lake: lake
          ? { id: lake.id, name: lake.name, timeZone: lake.timeZone }
          : { id: event.lakeId, name: '', timeZone: 'UTC' },
        dates: { practice: event.practiceDates, competition: event.competitionDates },
        rules: event.rules,
        finalPlace: event.finalPlace,
        field: event.field,
      },
      days,
      totals,
      producingFinds,
      timeline,
      bigFish: big ? reportFish(big) : null,
      fishCaught: catches.length,
      fishCounted,
      findsFished,
      secondsFished,
      fishPerHour: event.derivedFromCatches ? null : fishPerHour(findFish, secondsFished),
      derivedFromCatches: event.derivedFromCatches,
      findsPracticed: practiced.length,
      shareOfPracticePaidOff: share,
      readings,
    };
  }
}
