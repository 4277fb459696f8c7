import { EventsHandler, type IEventHandler } from '@nestjs/cqrs';
import { JournalEventsAppended } from '../journal-events/journal-events-appended.event';
import { JournalProjector } from './journal-projector.service';

/**
 * A wake-up call only: the projector reads journal_event from its checkpoint, so what this event says is not
 * trusted or needed. Not awaited by the command (an @nestjs/cqrs event handler); errors are logged by the projector.
 */
@EventsHandler(JournalEventsAppended)
export class JournalEventsAppendedHandler implements IEventHandler<JournalEventsAppended> {
  constructor(private readonly projector: JournalProjector) {}

  handle(): void {
    if (this.projector.enabled) void this.projector.requestCatchUp().catch(() => undefined);
  }
}
