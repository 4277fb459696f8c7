import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { CatchView } from '@shoalbook/shared';
import { JournalEventsService } from '../../journal-events/journal-events.service';
import { recordState } from '../../journal-events/record-state';
import { assertVersion, FieldProblems, idTaken, recordNotFound } from '../../journal/journal-errors';
import { Catch } from '../catch.entity';
import { applyCatchInput } from '../catch-input';
import { CatchesService } from '../catches.service';
import { DeleteCatchCommand, LogCatchCommand, UpdateCatchCommand } from './catch.commands';

@CommandHandler(LogCatchCommand)
export class LogCatchHandler implements ICommandHandler<LogCatchCommand> {
  constructor(
    private readonly journal: JournalEventsService,
    private readonly catches: CatchesService,
  ) {}

  async execute({ access, input }: LogCatchCommand): Promise<CatchView> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      if (input.id && (await tx.count(Catch, { id: input.id }))) throw idTaken('catch');
      const ctx = await this.catches.context(tx, access.crewId, input.competitionDayId);
      const c = Object.assign(new Catch(), {
        ...(input.id ? { id: input.id } : {}),
        crewId: access.crewId,
        eventId: ctx.event.id,
        competitionDayId: ctx.day.id,
        // Who logged it comes from the session, never from the request body.
        loggedBy: access.userId,
      });
      const problems = new FieldProblems();
      await applyCatchInput(ctx, c, input, problems);
      problems.throwIfAny();
      tx.persist(c);
      await tx.flush();
      log.record({
        type: 'CatchLogged',
        aggregateType: 'catch',
        aggregateId: c.id,
        payload: recordState(tx, 'Catch', c),
      });
      return this.catches.viewInContext(access, c, ctx);
    });
  }
}

@CommandHandler(UpdateCatchCommand)
export class UpdateCatchHandler implements ICommandHandler<UpdateCatchCommand> {
  constructor(
    private readonly journal: JournalEventsService,
    private readonly catches: CatchesService,
  ) {}

  async execute({ access, catchId, input }: UpdateCatchCommand): Promise<CatchView> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const c = await tx.findOne(Catch, { id: catchId, crewId: access.crewId });
      if (!c) throw recordNotFound('catch');
      assertVersion('catch', input.version, c.version);
      const ctx = await this.catches.context(tx, access.crewId, c.competitionDayId);
      const problems = new FieldProblems();
      await applyCatchInput(ctx, c, input, problems);
      problems.throwIfAny();
      await tx.flush();
      log.record({
        type: 'CatchUpdated',
        aggregateType: 'catch',
        aggregateId: c.id,
        payload: recordState(tx, 'Catch', c),
      });
      return this.catches.viewInContext(access, c, ctx);
    });
  }
}

@CommandHandler(DeleteCatchCommand)
export class DeleteCatchHandler implements ICommandHandler<DeleteCatchCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, catchId }: DeleteCatchCommand): Promise<void> {
    await this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const c = await tx.findOne(Catch, { id: catchId, crewId: access.crewId });
      if (!c) throw recordNotFound('catch');
      tx.remove(c);
      log.record({ type: 'CatchDeleted', aggregateType: 'catch', aggregateId: c.id, payload: { id: c.id } });
    });
  }
}
