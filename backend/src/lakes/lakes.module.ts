import { Module } from '@nestjs/common';
import { JournalEventsModule } from '../journal-events/journal-events.module';
import { LAKE_COMMAND_HANDLERS } from './commands';
import { LakesController } from './lakes.controller';
import { LakesService } from './lakes.service';

/** The lakes and their details: every write is a command whose handler appends to the journal in its transaction. */
@Module({
  imports: [JournalEventsModule],
  controllers: [LakesController],
  providers: [LakesService, ...LAKE_COMMAND_HANDLERS],
  exports: [LakesService],
})
export class LakesModule {}
