import { LockMode } from '@mikro-orm/core';
import { HttpStatus } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { ApiException } from '../../common/errors/api-errors';
import { CompetitionDay } from '../../events/competition-day.entity';
import { JournalEventsService } from '../../journal-events/journal-events.service';
import { recordState } from '../../journal-events/record-state';
import { assertVersion, JournalErrorCode, recordNotFound, staleVersion } from '../../journal/journal-errors';
import { WeighIn } from '../weigh-in.entity';
import { officialOf, type VersionedWeighIn } from '../weigh-ins.service';
import { RecordWeighInCommand } from './record-weigh-in.command';

@CommandHandler(RecordWeighInCommand)
export class RecordWeighInHandler implements ICommandHandler<RecordWeighInCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({
    access,
    dayId,
    input,
  }: RecordWeighInCommand): Promise<VersionedWeighIn & { competitionDayId: string }> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      // The day's row lock serialises recordings of one day, so two first recordings cannot both insert.
      const day = await tx.findOne(
        CompetitionDay,
        { id: dayId, crewId: access.crewId },
        { lockMode: LockMode.PESSIMISTIC_WRITE },
      );
      if (!day) throw recordNotFound('competition day');
      const existing = await tx.findOne(WeighIn, { crewId: access.crewId, competitionDayId: day.id });
      // Without a version the caller believes nothing is recorded yet; with one, it must be the stored one.
      if (existing) {
        if (input.version === undefined) throw staleVersion('weigh-in', existing.version);
        assertVersion('weigh-in', input.version, existing.version);
      } else if (input.version !== undefined) {
        throw new ApiException(
          HttpStatus.CONFLICT,
          'No weigh-in is recorded for this day any more. Reload the day and enter the figures again.',
          JournalErrorCode.staleVersion,
        );
      }
      const weighIn = existing ?? tx.create(WeighIn, { crewId: access.crewId, competitionDayId: day.id });
      for (const key of [
        'grossLb',
        'penaltyLb',
        'officialLb',
        'dayPlace',
        'lateMinutes',
        'fieldSize',
        'winningLb',
        'cutLb',
      ] as const)
        if (input[key] !== undefined) weighIn[key] = input[key];
      // An update that changes nothing still records the decision, with a new version.
      weighIn.updatedAt = new Date();
      await tx.flush();
      log.record({
        type: 'WeighInRecorded',
        aggregateType: 'weighIn',
        aggregateId: weighIn.id,
        payload: { ...recordState(tx, 'WeighIn', weighIn), eventId: day.eventId, date: day.date },
      });
      return { competitionDayId: day.id, ...officialOf(weighIn)! };
    });
  }
}
