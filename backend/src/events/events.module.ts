import { Module } from '@nestjs/common';
import { JournalEventsModule } from '../journal-events/journal-events.module';
import { EVENT_COMMAND_HANDLERS } from './commands';
import { EventsController } from './events.controller';
import { EventsService } from './events.service';

/** The tournament events with their practice and competition days: every write is a command whose handler appends to the journal in its transaction. */
@Module({
  imports: [JournalEventsModule],
  controllers: [EventsController],
  providers: [EventsService, ...EVENT_COMMAND_HANDLERS],
  exports: [EventsService],
})
export class EventsModule {}
