import { Module } from '@nestjs/common';
import { JournalEventsModule } from '../journal-events/journal-events.module';
import { CatchesModule } from '../catches/catches.module';
import { EventsModule } from '../events/events.module';
import { WEIGH_IN_COMMAND_HANDLERS } from './commands';
import { WeighInsController } from './weigh-ins.controller';
import { WeighInsService } from './weigh-ins.service';

/** The weigh-ins: the day's bag and the official figures: every write is a command whose handler appends to the journal in its transaction. */
@Module({
  imports: [JournalEventsModule, CatchesModule, EventsModule],
  controllers: [WeighInsController],
  providers: [WeighInsService, ...WEIGH_IN_COMMAND_HANDLERS],
})
export class WeighInsModule {}
