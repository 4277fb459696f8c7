import { Module } from '@nestjs/common';
import { JournalEventsModule } from '../journal-events/journal-events.module';
import { STOP_COMMAND_HANDLERS } from './commands';
import { StopsController } from './stops.controller';
import { StopsService } from './stops.service';

/** The stops of a competition day (which find, from when to when): every write is a command whose handler appends to the journal in its transaction. */
@Module({
  imports: [JournalEventsModule],
  controllers: [StopsController],
  providers: [StopsService, ...STOP_COMMAND_HANDLERS],
  exports: [StopsService],
})
export class StopsModule {}
