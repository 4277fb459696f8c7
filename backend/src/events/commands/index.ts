import { UpdateCompetitionDayHandler, UpdatePracticeDayHandler } from './day.handlers';
import { CreateEventHandler, DeleteEventHandler, UpdateEventHandler } from './event.handlers';

export const EVENT_COMMAND_HANDLERS = [
  CreateEventHandler,
  UpdateEventHandler,
  DeleteEventHandler,
  UpdatePracticeDayHandler,
  UpdateCompetitionDayHandler,
];
