import { Module } from '@nestjs/common';
import { JournalEventsModule } from '../journal-events/journal-events.module';
import { SkyModule } from '../sky/sky.module';
import { FIND_COMMAND_HANDLERS } from './commands';
import { FindsController } from './finds.controller';
import { FindsService } from './finds.service';

/** The finds marked in practice, their imports and bulk edits: every write is a command whose handler appends to the journal in its transaction. */
@Module({
  imports: [JournalEventsModule, SkyModule],
  controllers: [FindsController],
  providers: [FindsService, ...FIND_COMMAND_HANDLERS],
  exports: [FindsService],
})
export class FindsModule {}
