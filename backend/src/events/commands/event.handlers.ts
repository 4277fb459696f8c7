import type { EntityManager } from '@mikro-orm/mariadb';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { EventView } from '@shoalbook/shared';
import { Catch } from '../../catches/catch.entity';
import { Stop } from '../../stops/stop.entity';
import { Find } from '../../finds/find.entity';
import { JournalEventsService } from '../../journal-events/journal-events.service';
import { recordState } from '../../journal-events/record-state';
import {
  assertVersion,
  FieldProblems,
  inUse,
  JournalErrorCode,
  recordNotFound,
  unknownReference,
} from '../../journal/journal-errors';
import { Lake } from '../../lakes/lake.entity';
import { WeighIn } from '../../weigh-ins/weigh-in.entity';
import { CompetitionDay } from '../competition-day.entity';
import { eventView } from '../event-views';
import { PracticeDay } from '../practice-day.entity';
import { TournamentEvent } from '../tournament-event.entity';
import { CreateEventCommand, DeleteEventCommand, UpdateEventCommand } from './event.commands';
import type { CreateEventDto, UpdateEventDto } from '../dto/event.dto';

const sorted = (dates: string[]) => [...dates].sort();

function checkDates(practice: string[], competition: string[]): void {
  const problems = new FieldProblems();
  if (competition.length === 0) problems.add('competitionDates', 'An event needs at least one competition day.');
  const both = practice.filter((d) => competition.includes(d));
  if (both.length)
    problems.add('practiceDates', `A date cannot be both a practice and a competition day: ${both.join(', ')}.`);
  problems.throwIfAny();
}

function applyRules(event: TournamentEvent, input: CreateEventDto | UpdateEventDto): void {
  const r = input.rules;
  if (!r) return;
  if (r.fishPerDay !== undefined) event.fishPerDay = r.fishPerDay;
  if (r.minLengthIn !== undefined) event.minLengthIn = r.minLengthIn;
  if (r.deadFishPenaltyLb !== undefined) event.deadFishPenaltyLb = r.deadFishPenaltyLb;
  if (r.shortFishPenaltyLb !== undefined) event.shortFishPenaltyLb = r.shortFishPenaltyLb;
  if (r.latePenaltyLbPerMinute !== undefined) event.latePenaltyLbPerMinute = r.latePenaltyLbPerMinute;
  if (r.format !== undefined) event.format = r.format;
}

function applyField(event: TournamentEvent, input: CreateEventDto | UpdateEventDto): void {
  const f = input.field;
  if (!f) return;
  if (f.fieldSize !== undefined) event.fieldSize = f.fieldSize;
  if (f.winningLb !== undefined) event.winningLb = f.winningLb;
  if (f.cutLb !== undefined) event.cutLb = f.cutLb;
}

function applyRamp(event: TournamentEvent, input: CreateEventDto | UpdateEventDto): void {
  if (input.ramp === undefined) return;
  event.rampLat = input.ramp?.lat ?? null;
  event.rampLon = input.ramp?.lon ?? null;
}

/** The event's state with its days, as its journal events carry it. */
export async function eventState(tx: EntityManager, event: TournamentEvent): Promise<Record<string, unknown>> {
  const practiceDays = await tx.find(PracticeDay, { eventId: event.id }, { orderBy: { date: 'asc' } });
  const competitionDays = await tx.find(CompetitionDay, { eventId: event.id }, { orderBy: { date: 'asc' } });
  return {
    ...recordState(tx, 'TournamentEvent', event),
    practiceDays: practiceDays.map((d) => recordState(tx, 'PracticeDay', d)),
    competitionDays: competitionDays.map((d) => recordState(tx, 'CompetitionDay', d)),
  };
}

@CommandHandler(CreateEventCommand)
export class CreateEventHandler implements ICommandHandler<CreateEventCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, input }: CreateEventCommand): Promise<EventView> {
    const practice = sorted(input.practiceDates ?? []);
    const competition = sorted(input.competitionDates);
    checkDates(practice, competition);
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const lake = await tx.findOne(Lake, { id: input.lakeId, crewId: access.crewId });
      if (!lake) throw unknownReference('lakeId', 'lake');
      const event = tx.create(TournamentEvent, {
        crewId: access.crewId,
        lakeId: lake.id,
        name: input.name,
        organiser: input.organiser ?? '',
        practiceDates: practice,
        competitionDates: competition,
        entryFee: input.entryFee ?? null,
        payout: input.payout ?? null,
        finalPlace: input.finalPlace ?? null,
        notes: input.notes ?? '',
      });
      applyRules(event, input);
      applyField(event, input);
      applyRamp(event, input);
      // Foreign keys are plain columns, so the ORM cannot order the inserts: the event goes first.
      await tx.flush();
      for (const date of practice) tx.create(PracticeDay, { crewId: access.crewId, eventId: event.id, date });
      for (const date of competition) tx.create(CompetitionDay, { crewId: access.crewId, eventId: event.id, date });
      await tx.flush();
      log.record({
        type: 'EventCreated',
        aggregateType: 'event',
        aggregateId: event.id,
        payload: await eventState(tx, event),
      });
      return eventView(event);
    });
  }
}

@CommandHandler(UpdateEventCommand)
export class UpdateEventHandler implements ICommandHandler<UpdateEventCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, eventId, input }: UpdateEventCommand): Promise<EventView> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const event = await tx.findOne(TournamentEvent, { id: eventId, crewId: access.crewId });
      if (!event) throw recordNotFound('event');
      assertVersion('event', input.version, event.version);
      const practice = sorted(input.practiceDates ?? event.practiceDates);
      const competition = sorted(input.competitionDates ?? event.competitionDates);
      checkDates(practice, competition);

      await reconcileDays(tx, access.crewId, event, PracticeDay, practice, (dayIds) =>
        tx.count(Find, { practiceDayId: { $in: dayIds } }),
      );
      await reconcileDays(
        tx,
        access.crewId,
        event,
        CompetitionDay,
        competition,
        async (dayIds) =>
          (await tx.count(Catch, { competitionDayId: { $in: dayIds } })) +
          (await tx.count(Stop, { competitionDayId: { $in: dayIds } })),
      );

      if (input.name !== undefined) event.name = input.name;
      if (input.organiser !== undefined) event.organiser = input.organiser;
      if (input.entryFee !== undefined) event.entryFee = input.entryFee;
      if (input.payout !== undefined) event.payout = input.payout;
      if (input.finalPlace !== undefined) event.finalPlace = input.finalPlace;
      if (input.notes !== undefined) event.notes = input.notes;
      event.practiceDates = practice;
      event.competitionDates = competition;
      applyRules(event, input);
      applyField(event, input);
      applyRamp(event, input);
      // A change to the days alone still bumps the event's version, so the journal sees one new state.
      event.updatedAt = new Date();
      await tx.flush();
      log.record({
        type: 'EventUpdated',
        aggregateType: 'event',
        aggregateId: event.id,
        payload: await eventState(tx, event),
      });
      return eventView(event);
    });
  }
}

/** Add days for new dates; remove days for dropped dates unless something was logged on them. */
async function reconcileDays(
  tx: EntityManager,
  crewId: string,
  event: TournamentEvent,
  entity: typeof PracticeDay | typeof CompetitionDay,
  dates: string[],
  usage: (dayIds: string[]) => Promise<number>,
): Promise<void> {
  const existing = await tx.find(entity as typeof PracticeDay, { eventId: event.id, crewId });
  const dropped = existing.filter((d) => !dates.includes(d.date));
  if (dropped.length) {
    const used = await usage(dropped.map((d) => d.id));
    if (used) {
      throw inUse(
        `The day(s) ${dropped.map((d) => d.date).join(', ')} have finds, catches or stops logged; move or delete those before dropping the date.`,
        JournalErrorCode.dayInUse,
      );
    }
    if (entity === CompetitionDay)
      await tx.nativeDelete(WeighIn, { competitionDayId: { $in: dropped.map((d) => d.id) } });
    for (const d of dropped) tx.remove(d);
  }
  for (const date of dates)
    if (!existing.some((d) => d.date === date))
      tx.create(entity as typeof PracticeDay, { crewId, eventId: event.id, date });
}

@CommandHandler(DeleteEventCommand)
export class DeleteEventHandler implements ICommandHandler<DeleteEventCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, eventId }: DeleteEventCommand): Promise<void> {
    await this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const event = await tx.findOne(TournamentEvent, { id: eventId, crewId: access.crewId });
      if (!event) throw recordNotFound('event');
      const finds = await tx.count(Find, { crewId: access.crewId, eventId });
      const catches = await tx.count(Catch, { crewId: access.crewId, eventId });
      const stops = await tx.count(Stop, { crewId: access.crewId, eventId });
      if (finds || catches || stops)
        throw inUse(
          `The event still has ${finds} find(s), ${catches} catch(es) and ${stops} stop(s); delete those first.`,
        );
      const dayIds = (await tx.find(CompetitionDay, { eventId })).map((d) => d.id);
      if (dayIds.length) await tx.nativeDelete(WeighIn, { competitionDayId: { $in: dayIds } });
      await tx.nativeDelete(PracticeDay, { eventId });
      await tx.nativeDelete(CompetitionDay, { eventId });
      tx.remove(event);
      log.record({ type: 'EventDeleted', aggregateType: 'event', aggregateId: event.id, payload: { id: event.id } });
    });
  }
}
