import type { EntityManager } from '@mikro-orm/mariadb';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { clockTime, type CompetitionDayView, type PracticeDayView } from '@shoalbook/shared';
import { JournalEventsService } from '../../journal-events/journal-events.service';
import { recordState } from '../../journal-events/record-state';
import { assertVersion, FieldProblems, recordNotFound } from '../../journal/journal-errors';
import { MeasurementError, resolveTemperature } from '../../measurements/measurements';
import { assignMeasured, checkRange, RANGES, sentField } from '../../measurements/ranges';
import { Catch } from '../../catches/catch.entity';
import { catchTimeProblem } from '../../catches/catch-window';
import { Lake } from '../../lakes/lake.entity';
import { CompetitionDay } from '../competition-day.entity';
import { competitionDayView, practiceDayView } from '../event-views';
import { PracticeDay } from '../practice-day.entity';
import { TournamentEvent } from '../tournament-event.entity';
import { UpdateCompetitionDayCommand, UpdatePracticeDayCommand } from './event.commands';
import type { UpdatePracticeDayDto } from '../dto/day.dto';

function applyWaterTemp(
  day: PracticeDay | CompetitionDay,
  input: Pick<UpdatePracticeDayDto, 'waterTemp' | 'waterTempF'>,
): void {
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

/**
 * A day's start must come before its check-in, and a new window must still hold the catches already
 * logged on the day: they would otherwise count on a day they no longer belong to. Moving them comes first.
 */
async function checkDayWindow(tx: EntityManager, crewId: string, day: CompetitionDay): Promise<void> {
  const problems = new FieldProblems();
  if (day.startTime && day.checkInTime && day.checkInTime <= day.startTime) {
    problems.add('checkInTime', `Check-in (${day.checkInTime}) must come after the start (${day.startTime}).`);
    problems.throwIfAny();
  }
  const event = await tx.findOneOrFail(TournamentEvent, { id: day.eventId, crewId });
  const lake = await tx.findOneOrFail(Lake, { id: event.lakeId, crewId });
  const catches = await tx.find(
    Catch,
    { crewId, competitionDayId: day.id },
    { fields: ['id', 'caughtAt'], orderBy: { caughtAt: 'asc' } },
  );
  const outside = catches
    .filter((c) => catchTimeProblem(c.caughtAt, day, lake.timeZone) !== null)
    .map((c) => clockTime(c.caughtAt, lake.timeZone));
  if (outside.length) {
    const listed = `${outside.slice(0, 5).join(', ')}${outside.length > 5 ? ', …' : ''}`;
    const field = day.startTime && outside[0]! < day.startTime ? 'startTime' : 'checkInTime';
    problems.add(
      field,
      `${outside.length} catch(es) logged on this day fall outside the new window (at ${listed}, lake time); change their times first.`,
    );
  }
  problems.throwIfAny();
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
      log.record({
        type: 'PracticeDayUpdated',
        aggregateType: 'practiceDay',
        aggregateId: day.id,
        payload: recordState(tx, 'PracticeDay', day),
      });
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
      if (input.startTime !== undefined || input.checkInTime !== undefined)
        await checkDayWindow(tx, access.crewId, day);
      if (input.weatherNotes !== undefined) day.weatherNotes = input.weatherNotes;
      applyWaterTemp(day, input);
      await tx.flush();
      log.record({
        type: 'CompetitionDayUpdated',
        aggregateType: 'competitionDay',
        aggregateId: day.id,
        payload: recordState(tx, 'CompetitionDay', day),
      });
      return competitionDayView(day);
    });
  }
}
