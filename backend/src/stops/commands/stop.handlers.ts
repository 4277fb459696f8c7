import type { EntityManager } from '@mikro-orm/mariadb';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { clockTime, type StopDeletedView, type StopView } from '@shoalbook/shared';
import type { CrewAccess } from '../../crews/access/request-context';
import { JournalEventsService } from '../../journal-events/journal-events.service';
import { recordState } from '../../journal-events/record-state';
import { assertVersion, FieldProblems, idTaken, recordNotFound } from '../../journal/journal-errors';
import { applyStopInput, overlappingStop, type StopContext } from '../stop-input';
import { Stop } from '../stop.entity';
import { StopsService } from '../stops.service';
import { DeleteStopCommand, LogStopCommand, UpdateStopCommand } from './stop.commands';

/** One angler is in one place at a time: refuse a span that shares an instant with another stop of theirs. */
async function refuseOverlap(tx: EntityManager, ctx: StopContext, stop: Stop, sent: object): Promise<void> {
  const other = await overlappingStop(tx, stop);
  if (!other) return;
  const clock = (d: Date | null) => (d ? clockTime(d, ctx.lake.timeZone) : 'still there');
  const problems = new FieldProblems();
  // Name the field the request sent that causes it (leaving, when only that changed).
  const field = 'arrivedAt' in sent || !('leftAt' in sent) ? 'arrivedAt' : 'leftAt';
  problems.add(
    field,
    `This overlaps the angler's stop from ${clock(other.arrivedAt)} to ${clock(other.leftAt)} on ${ctx.day.date}; one angler is at one stop at a time.`,
  );
  problems.throwIfAny();
}

async function stopView(stops: StopsService, tx: EntityManager, access: CrewAccess, stop: Stop): Promise<StopView> {
  return (await stops.views(access, [stop], tx))[0]!;
}

@CommandHandler(LogStopCommand)
export class LogStopHandler implements ICommandHandler<LogStopCommand> {
  constructor(
    private readonly journal: JournalEventsService,
    private readonly stops: StopsService,
  ) {}

  async execute({ access, input }: LogStopCommand): Promise<StopView> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      if (input.id && (await tx.count(Stop, { id: input.id }))) throw idTaken('stop');
      const ctx = await this.stops.context(tx, access.crewId, input.competitionDayId);
      const stop = Object.assign(new Stop(), {
        ...(input.id ? { id: input.id } : {}),
        crewId: access.crewId,
        eventId: ctx.event.id,
        competitionDayId: ctx.day.id,
        loggedById: access.userId,
      });
      const problems = new FieldProblems();
      await applyStopInput(ctx, stop, input, problems);
      problems.throwIfAny();
      await refuseOverlap(tx, ctx, stop, input);
      tx.persist(stop);
      await tx.flush();
      log.record({
        type: 'StopLogged',
        aggregateType: 'stop',
        aggregateId: stop.id,
        payload: recordState(tx, 'Stop', stop),
      });
      return stopView(this.stops, tx, access, stop);
    });
  }
}

@CommandHandler(UpdateStopCommand)
export class UpdateStopHandler implements ICommandHandler<UpdateStopCommand> {
  constructor(
    private readonly journal: JournalEventsService,
    private readonly stops: StopsService,
  ) {}

  async execute({ access, stopId, input }: UpdateStopCommand): Promise<StopView> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const found = await tx.findOne(Stop, { id: stopId, crewId: access.crewId });
      if (!found) throw recordNotFound('stop');
      const ctx = await this.stops.context(tx, access.crewId, found.competitionDayId);
      // Read again under the day's lock, so the version compared is the one this transaction will change.
      await tx.refresh(found);
      assertVersion('stop', input.version, found.version);
      const problems = new FieldProblems();
      await applyStopInput(ctx, found, input, problems);
      problems.throwIfAny();
      await refuseOverlap(tx, ctx, found, input);
      await tx.flush();
      log.record({
        type: 'StopUpdated',
        aggregateType: 'stop',
        aggregateId: found.id,
        payload: recordState(tx, 'Stop', found),
      });
      return stopView(this.stops, tx, access, found);
    });
  }
}

@CommandHandler(DeleteStopCommand)
export class DeleteStopHandler implements ICommandHandler<DeleteStopCommand> {
  constructor(
    private readonly journal: JournalEventsService,
    private readonly stops: StopsService,
  ) {}

  async execute({ access, stopId }: DeleteStopCommand): Promise<StopDeletedView> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const stop = await tx.findOne(Stop, { id: stopId, crewId: access.crewId });
      if (!stop) throw recordNotFound('stop');
      await this.stops.context(tx, access.crewId, stop.competitionDayId);
      const { byStop } = await this.stops.attribution(tx, access.crewId, [stop.competitionDayId]);
      const unattachedCatchIds = byStop.get(stop.id)?.catchIds ?? [];
      tx.remove(stop);
      log.record({ type: 'StopDeleted', aggregateType: 'stop', aggregateId: stop.id, payload: { id: stop.id } });
      const n = unattachedCatchIds.length;
      return {
        id: stop.id,
        unattachedCatchIds,
        message:
          n === 0
            ? 'Stop deleted; it had no catches.'
            : `Stop deleted; its ${n} catch${n === 1 ? '' : 'es'} ${n === 1 ? 'is' : 'are'} kept and now in no stop.`,
      };
    });
  }
}
