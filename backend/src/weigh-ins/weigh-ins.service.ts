import { EntityManager } from '@mikro-orm/mariadb';
import { Injectable } from '@nestjs/common';
import {
  WEIGH_IN_HISTORY_FIELDS,
  type EventTally,
  type OfficialWeighIn,
  type RecordChange,
  type WeighInHistoryField,
  type WeighInsView,
} from '@shoalbook/shared';
import { Catch } from '../catches/catch.entity';
import { CatchesService } from '../catches/catches.service';
import type { CrewAccess } from '../crews/access/request-context';
import { CompetitionDay } from '../events/competition-day.entity';
import { eventView } from '../events/event-views';
import { EventsService } from '../events/events.service';
import { TournamentEvent } from '../events/tournament-event.entity';
import { recordNotFound } from '../journal/journal-errors';
import { RecordHistoryService } from '../journal-events/record-history.service';
import { bagOfDay, differenceOf, eventWeight } from './bag-rule';
import { WeighIn } from './weigh-in.entity';

/** The official figures with the version a client sends back on its next PUT. */
export type VersionedWeighIn = OfficialWeighIn & { version: number };

export function officialOf(w: WeighIn | undefined): VersionedWeighIn | null {
  return w
    ? {
        grossLb: w.grossLb,
        penaltyLb: w.penaltyLb,
        officialLb: w.officialLb,
        dayPlace: w.dayPlace,
        lateMinutes: w.lateMinutes,
        fieldSize: w.fieldSize,
        winningLb: w.winningLb,
        cutLb: w.cutLb,
        version: w.version,
      }
    : null;
}

/** Map.groupBy, which Node 20 lacks. */
function groupBy<T>(items: readonly T[], key: (item: T) => string): Map<string, T[]> {
  const groups = new Map<string, T[]>();
  for (const item of items) {
    const k = key(item);
    const group = groups.get(k);
    if (group) group.push(item);
    else groups.set(k, [item]);
  }
  return groups;
}

/**
 * The event's weigh-ins: per day the bag by the one bag rule beside the official figures and their difference,
 * and the totals (official where entered). Neither figure ever overwrites the other.
 */
@Injectable()
export class WeighInsService {
  constructor(
    private readonly em: EntityManager,
    private readonly events: EventsService,
    private readonly catches: CatchesService,
    private readonly history: RecordHistoryService,
  ) {}

  /** Every change to a day's official figures, as the journal kept them; empty before the first recording. */
  async changes(access: CrewAccess, dayId: string): Promise<RecordChange<WeighInHistoryField>[]> {
    const day = await this.em.findOne(CompetitionDay, { id: dayId, crewId: access.crewId }, { fields: ['id'] });
    if (!day) throw recordNotFound('competition day');
    const weighIn = await this.em.findOne(WeighIn, { competitionDayId: day.id, crewId: access.crewId });
    if (!weighIn) return [];
    return (await this.history.changes(access.crewId, 'weighIn', weighIn.id, WEIGH_IN_HISTORY_FIELDS)) ?? [];
  }

  /**
   * Fish and weight of every event of the crew (or of one lake), for the events list: three queries for all
   * of them, each day through the one bag rule, official weights where entered.
   */
  async tallies(access: CrewAccess, lakeId?: string): Promise<EventTally[]> {
    const { crewId } = access;
    const events = await this.em.find(TournamentEvent, { crewId, ...(lakeId ? { lakeId } : {}) });
    if (!events.length) return [];
    const days = await this.em.find(CompetitionDay, { crewId, eventId: { $in: events.map((e) => e.id) } });
    const dayIds = days.map((d) => d.id);
    const catches = dayIds.length ? await this.em.find(Catch, { crewId, competitionDayId: { $in: dayIds } }) : [];
    const weighIns = new Map(
      (dayIds.length ? await this.em.find(WeighIn, { crewId, competitionDayId: { $in: dayIds } }) : []).map((w) => [
        w.competitionDayId,
        w,
      ]),
    );
    const catchesOfDay = groupBy(catches, (c) => c.competitionDayId);
    const daysOfEvent = groupBy(days, (d) => d.eventId);
    return events.map((event) => {
      const rules = eventView(event).rules;
      const tally: EventTally = { eventId: event.id, fishCaught: 0, fishCounted: 0, totalLb: 0, allOfficial: true };
      const eventDays = daysOfEvent.get(event.id) ?? [];
      if (!eventDays.length) tally.allOfficial = false;
      const weights = eventDays.map((day) => {
        const dayCatches = catchesOfDay.get(day.id) ?? [];
        const official = officialOf(weighIns.get(day.id));
        const bag = bagOfDay(dayCatches, rules, official?.lateMinutes ?? null);
        tally.fishCaught += dayCatches.length;
        tally.fishCounted += bag.counted.length;
        if (official?.officialLb == null) tally.allOfficial = false;
        return { computedNetLb: bag.netLb, officialLb: official?.officialLb };
      });
      tally.totalLb = eventWeight(weights).officialLb;
      return tally;
    });
  }

  async forEvent(access: CrewAccess, eventId: string): Promise<WeighInsView> {
    const event = await this.events.get(access.crewId, eventId);
    const days = await this.em.find(CompetitionDay, { crewId: access.crewId, eventId }, { orderBy: { date: 'asc' } });
    const dayIds = days.map((d) => d.id);
    const catches = dayIds.length
      ? await this.em.find(
          Catch,
          { crewId: access.crewId, competitionDayId: { $in: dayIds } },
          { orderBy: { caughtAt: 'asc', id: 'asc' } },
        )
      : [];
    const weighIns = new Map(
      (dayIds.length
        ? await this.em.find(WeighIn, { crewId: access.crewId, competitionDayId: { $in: dayIds } })
        : []
      ).map((w) => [w.competitionDayId, w]),
    );
    const views = new Map((await this.catches.views(access, catches)).map((v) => [v.id, v]));
    const rules = eventView(event).rules;
    const out = days.map((day) => {
      const dayCatches = catches.filter((c) => c.competitionDayId === day.id);
      const official = officialOf(weighIns.get(day.id));
      const computed = bagOfDay(dayCatches, rules, official?.lateMinutes ?? null);
      return {
        competitionDayId: day.id,
        date: day.date,
        computed,
        official,
        difference: differenceOf(official, computed),
        catches: dayCatches.map((c) => views.get(c.id)!),
      };
    });
    return {
      days: out,
      totals: {
        ...eventWeight(out.map((d) => ({ computedNetLb: d.computed.netLb, officialLb: d.official?.officialLb }))),
        finalPlace: event.finalPlace,
        field: { fieldSize: event.fieldSize, winningLb: event.winningLb, cutLb: event.cutLb },
      },
    };
  }
}
