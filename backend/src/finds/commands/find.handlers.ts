import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { FindView } from '@shoalbook/shared';
import { JournalEventsService } from '../../journal-events/journal-events.service';
import { recordState } from '../../journal-events/record-state';
import { assertVersion, idTaken, recordNotFound, unknownReference } from '../../journal/journal-errors';
import { Lake } from '../../lakes/lake.entity';
import { deleteFinds } from '../delete-finds';
import { Find } from '../find.entity';
import { applyFindInput } from '../find-input';
import { FindsService } from '../finds.service';
import { AddFindCommand, DeleteFindCommand, UpdateFindCommand } from './find.commands';

@CommandHandler(AddFindCommand)
export class AddFindHandler implements ICommandHandler<AddFindCommand> {
  constructor(
    private readonly journal: JournalEventsService,
    private readonly finds: FindsService,
  ) {}

  async execute({ access, input }: AddFindCommand): Promise<FindView> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const lake = await tx.findOne(Lake, { id: input.lakeId, crewId: access.crewId });
      if (!lake) throw unknownReference('lakeId', 'lake');
      if (input.id && (await tx.count(Find, { id: input.id }))) throw idTaken('find');
      const find = tx.create(Find, {
        ...(input.id ? { id: input.id } : {}),
        crewId: access.crewId,
        lakeId: lake.id,
        name: input.name,
        lat: input.lat,
        lon: input.lon,
        kind: input.kind,
        source: 'form',
      });
      await applyFindInput(tx, access.crewId, lake, find, input);
      await tx.flush();
      log.record({
        type: 'FindAdded',
        aggregateType: 'find',
        aggregateId: find.id,
        payload: recordState(tx, 'Find', find),
      });
      return (await this.finds.views(access, [find], tx))[0]!;
    });
  }
}

@CommandHandler(UpdateFindCommand)
export class UpdateFindHandler implements ICommandHandler<UpdateFindCommand> {
  constructor(
    private readonly journal: JournalEventsService,
    private readonly finds: FindsService,
  ) {}

  async execute({ access, findId, input }: UpdateFindCommand): Promise<FindView> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const find = await tx.findOne(Find, { id: findId, crewId: access.crewId });
      if (!find) throw recordNotFound('find');
      assertVersion('find', input.version, find.version);
      const lake = await tx.findOneOrFail(Lake, { id: find.lakeId, crewId: access.crewId });
      await applyFindInput(tx, access.crewId, lake, find, input);
      await tx.flush();
      log.record({
        type: 'FindUpdated',
        aggregateType: 'find',
        aggregateId: find.id,
        payload: recordState(tx, 'Find', find),
      });
      return (await this.finds.views(access, [find], tx))[0]!;
    });
  }
}

@CommandHandler(DeleteFindCommand)
export class DeleteFindHandler implements ICommandHandler<DeleteFindCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, findId }: DeleteFindCommand): Promise<void> {
    await this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const find = await tx.findOne(Find, { id: findId, crewId: access.crewId });
      if (!find) throw recordNotFound('find');
      await deleteFinds(tx, log, access.crewId, [find]);
    });
  }
}
