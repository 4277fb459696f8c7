import { Command } from '@nestjs/cqrs';
import type { CompetitionDayView, EventView, PracticeDayView } from '@shoalbook/shared';
import type { CrewAccess } from '../../crews/access/request-context';
import type { UpdateCompetitionDayDto, UpdatePracticeDayDto } from '../dto/day.dto';
import type { CreateEventDto, UpdateEventDto } from '../dto/event.dto';

/** Creates the event and one practice or competition day per date. */
export class CreateEventCommand extends Command<EventView> {
  constructor(
    readonly access: CrewAccess,
    readonly input: CreateEventDto,
  ) {
    super();
  }
}

/** Changed dates add or remove days; removing a day with finds or catches is refused (409 "day_in_use"). */
export class UpdateEventCommand extends Command<EventView> {
  constructor(
    readonly access: CrewAccess,
    readonly eventId: string,
    readonly input: UpdateEventDto,
  ) {
    super();
  }
}

/** Refused (409 "in_use") while the event has finds or catches; its days and weigh-ins go with it. */
export class DeleteEventCommand extends Command<void> {
  constructor(
    readonly access: CrewAccess,
    readonly eventId: string,
  ) {
    super();
  }
}

export class UpdatePracticeDayCommand extends Command<PracticeDayView> {
  constructor(
    readonly access: CrewAccess,
    readonly dayId: string,
    readonly input: UpdatePracticeDayDto,
  ) {
    super();
  }
}

export class UpdateCompetitionDayCommand extends Command<CompetitionDayView> {
  constructor(
    readonly access: CrewAccess,
    readonly dayId: string,
    readonly input: UpdateCompetitionDayDto,
  ) {
    super();
  }
}
