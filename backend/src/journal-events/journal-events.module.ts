import { Module } from '@nestjs/common';
import { JournalEventsService } from './journal-events.service';
import { RecordHistoryService } from './record-history.service';

/** The journal every feature appends to, and the history of a record read back from it. */
@Module({
  providers: [JournalEventsService, RecordHistoryService],
  exports: [JournalEventsService, RecordHistoryService],
})
export class JournalEventsModule {}
