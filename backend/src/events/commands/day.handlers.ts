import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { CompetitionDayView, PracticeDayView } from '@shoalbook/shared';
import { JournalEventsService } from '../../journal-events/journal-events.service';
import { recordState } from '../../journal-events/record-state';
import { assertVersion, FieldProblems, recordNotFound } from '../../journal/journal-errors';
import { MeasurementError, resolveTemperature } from '../../measurements/measurements';
import { assignMeasured, checkRange, RANGES, sentField } from '../../measurements/ranges';
import { CompetitionDay } from '../competition-day.entity';
import { competitionDayView, practiceDayView } from '../event-views';
import { PracticeDay } from '../practice-day.entity';
import { UpdateCompetitionDayCommand, UpdatePracticeDayCommand } from './event.commands';
import type { UpdatePracticeDayDto } from '../dto/day.dto';

function applyWaterTemp(day: PracticeDay | CompetitionDay, input: Pick<UpdatePracticeDayDto, 'waterTemp' | 'waterTempF'>): void {
  const problems = new FieldProblems();
  try {
    const temp = resolveTemperature(input.waterTempF, input.waterTemp);
    checkRange(problems, sentField(input, 'waterTempF', 'waterTemp'), RANGES.waterTempF, temp?.canonical);
    problems.throwIfAny();
    assignMeasured(day, 'waterTempF', 'waterTemp', temp);
  } catch (e) {
    if (e instanceof MeasurementError) {
      problems.add(e.field, e.message);
      problems.throwIfAny();
    }
    throw e;
  }
}

@CommandHandler(UpdatePracticeDayCommand)
export class UpdatePracticeDayHandler implements ICommandHandler<UpdatePracticeDayCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, dayId, input }: UpdatePracticeDayCommand): Promise<PracticeDayView> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const day = await tx.findOne(PracticeDay, { id: dayId, crewId: access.crewId });
      if (!day) throw recordNotFound('practice day');
      assertVersion('practice day', input.version, day.version);
      if (input.notes !== undefined) day.notes = input.notes;
      applyWaterTemp(day, input);
      await tx.flush();
      log.record({ type: 'PracticeDayUpdated', aggregateType: 'practiceDay', aggregateId: day.id, payload: recordState(tx, 'PracticeDay', day) });
      return practiceDayView(day);
    });
  }
}

@CommandHandler(UpdateCompetitionDayCommand)
export class UpdateCompetitionDayHandler implements ICommandHandler<UpdateCompetitionDayCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, dayId, input }: UpdateCompetitionDayCommand): Promise<CompetitionDayView> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const day = await tx.findOne(CompetitionDay, { id: dayId, crewId: access.crewId });
      if (!day) throw recordNotFound('competition day');
      assertVersion('competition day', input.version, day.version);
      if (input.startTime !== undefined) day.startTime = input.startTime;
      if (input.checkInTime !== undefined) day.checkInTime = input.checkInTime;
      if (input.weatherNotes !== undefined) day.weatherNotes = input.weatherNotes;
      applyWaterTemp(day, input);
      await tx.flush();
      log.record({ type: 'CompetitionDayUpdated', aggregateType: 'competitionDay', aggregateId: day.id, payload: recordState(tx, 'CompetitionDay', day) });
      return competitionDayView(day);
    });
  }
}
