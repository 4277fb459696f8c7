import { Module } from '@nestjs/common';
import { JournalEventsModule } from '../journal-events/journal-events.module';
import { SkyModule } from '../sky/sky.module';
import { CATCH_COMMAND_HANDLERS } from './commands';
import { CatchesController } from './catches.controller';
import { CatchesService } from './catches.service';

/** The catches, logged one by one or imported from CSV: every write is a command whose handler appends to the journal in its transaction. */
@Module({
  imports: [JournalEventsModule, SkyModule],
  controllers: [CatchesController],
  providers: [CatchesService, ...CATCH_COMMAND_HANDLERS],
  exports: [CatchesService],
})
export class CatchesModule {}
