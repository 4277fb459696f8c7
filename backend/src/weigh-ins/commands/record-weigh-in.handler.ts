import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { OfficialWeighIn } from '@shoalbook/shared';
import { CompetitionDay } from '../../events/competition-day.entity';
import { JournalEventsService } from '../../journal-events/journal-events.service';
import { recordState } from '../../journal-events/record-state';
import { recordNotFound } from '../../journal/journal-errors';
import { WeighIn } from '../weigh-in.entity';
import { officialOf } from '../weigh-ins.service';
import { RecordWeighInCommand } from './record-weigh-in.command';

@CommandHandler(RecordWeighInCommand)
export class RecordWeighInHandler implements ICommandHandler<RecordWeighInCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, dayId, input }: RecordWeighInCommand): Promise<OfficialWeighIn & { competitionDayId: string }> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const day = await tx.findOne(CompetitionDay, { id: dayId, crewId: access.crewId });
      if (!day) throw recordNotFound('competition day');
      const weighIn = (await tx.findOne(WeighIn, { crewId: access.crewId, competitionDayId: day.id })) ?? tx.create(WeighIn, { crewId: access.crewId, competitionDayId: day.id });
      for (const key of ['grossLb', 'penaltyLb', 'officialLb', 'dayPlace', 'lateMinutes'] as const) if (input[key] !== undefined) weighIn[key] = input[key];
      // An update that changes nothing still records the decision, with a new version.
      weighIn.updatedAt = new Date();
      await tx.flush();
      log.record({ type: 'WeighInRecorded', aggregateType: 'weighIn', aggregateId: weighIn.id, payload: { ...recordState(tx, 'WeighIn', weighIn), eventId: day.eventId, date: day.date } });
      return { competitionDayId: day.id, ...officialOf(weighIn)! };
    });
  }
}
