import { LockMode } from '@mikro-orm/core';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { LakeView } from '@shoalbook/shared';
import { TournamentEvent } from '../../events/tournament-event.entity';
import { Find } from '../../finds/find.entity';
import { JournalEventsService } from '../../journal-events/journal-events.service';
import { recordState } from '../../journal-events/record-state';
import { assertVersion, inUse, recordNotFound } from '../../journal/journal-errors';
import { Lake } from '../lake.entity';
import { lakeView } from '../lake-view';
import { CreateLakeCommand, DeleteLakeCommand, UpdateLakeCommand } from './lake.commands';

@CommandHandler(CreateLakeCommand)
export class CreateLakeHandler implements ICommandHandler<CreateLakeCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, input }: CreateLakeCommand): Promise<LakeView> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const lake = tx.create(Lake, {
        crewId: access.crewId,
        name: input.name,
        region: input.region ?? '',
        timeZone: input.timeZone,
        lat: input.lat,
        lon: input.lon,
        areaAcres: input.areaAcres ?? null,
        notes: input.notes ?? '',
      });
      await tx.flush();
      log.record({
        type: 'LakeCreated',
        aggregateType: 'lake',
        aggregateId: lake.id,
        payload: recordState(tx, 'Lake', lake),
      });
      return lakeView(lake);
    });
  }
}

@CommandHandler(UpdateLakeCommand)
export class UpdateLakeHandler implements ICommandHandler<UpdateLakeCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, lakeId, input }: UpdateLakeCommand): Promise<LakeView> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const lake = await tx.findOne(Lake, { id: lakeId, crewId: access.crewId });
      if (!lake) throw recordNotFound('lake');
      assertVersion('lake', input.version, lake.version);
      const { version: _version, ...changes } = input;
      for (const [key, value] of Object.entries(changes)) {
        if (value === undefined) continue;
        if (key === 'region' || key === 'notes') (lake as unknown as Record<string, unknown>)[key] = value ?? '';
        else (lake as unknown as Record<string, unknown>)[key] = value;
      }
      await tx.flush();
      log.record({
        type: 'LakeUpdated',
        aggregateType: 'lake',
        aggregateId: lake.id,
        payload: recordState(tx, 'Lake', lake),
      });
      return lakeView(lake);
    });
  }
}

@CommandHandler(DeleteLakeCommand)
export class DeleteLakeHandler implements ICommandHandler<DeleteLakeCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, lakeId }: DeleteLakeCommand): Promise<void> {
    await this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const lake = await tx.findOne(
        Lake,
        { id: lakeId, crewId: access.crewId },
        { lockMode: LockMode.PESSIMISTIC_WRITE },
      );
      if (!lake) throw recordNotFound('lake');
      const events = await tx.count(TournamentEvent, { crewId: access.crewId, lakeId });
      const finds = await tx.count(Find, { crewId: access.crewId, lakeId });
      if (events || finds)
        throw inUse(`The lake still has ${events} event(s) and ${finds} find(s); delete those first (the finds list deletes many at once: select them, then delete).`);
      tx.remove(lake);
      log.record({ type: 'LakeDeleted', aggregateType: 'lake', aggregateId: lake.id, payload: { id: lake.id } });
    });
  }
}
