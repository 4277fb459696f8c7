import { Module } from '@nestjs/common';
import { AdminProjectionsController } from './admin-projections.controller';
import { JournalEventsAppendedHandler } from './journal-events-appended.handler';
import { JournalProjector } from './journal-projector.service';
import { ProjectionRebuildService } from './rebuild.service';

/** The read-model projections: catch-up on start-up and after every journal write, and the admin rebuild. */
@Module({
  controllers: [AdminProjectionsController],
  providers: [JournalProjector, JournalEventsAppendedHandler, ProjectionRebuildService],
  exports: [JournalProjector, ProjectionRebuildService],
})
export class ProjectionsModule {}
