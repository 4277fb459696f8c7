import { Module } from '@nestjs/common';
import { CatchesController } from '../catches/catches.controller';
import { CatchesService } from '../catches/catches.service';
import { CATCH_COMMAND_HANDLERS } from '../catches/commands';
import { EVENT_COMMAND_HANDLERS } from '../events/commands';
import { EventsController } from '../events/events.controller';
import { EventsService } from '../events/events.service';
import { ExportsController } from '../exports/exports.controller';
import { JournalExportService } from '../exports/journal-export.service';
import { FIND_COMMAND_HANDLERS } from '../finds/commands';
import { FindsController } from '../finds/finds.controller';
import { FindsService } from '../finds/finds.service';
import { JournalEventsService } from '../journal-events/journal-events.service';
import { RecordHistoryService } from '../journal-events/record-history.service';
import { LAKE_COMMAND_HANDLERS } from '../lakes/commands';
import { LakesController } from '../lakes/lakes.controller';
import { LakesService } from '../lakes/lakes.service';
import { UploadPhotoHandler } from '../photos/commands/upload-photo.handler';
import { PhotosController } from '../photos/photos.controller';
import { SkyController } from '../sky/sky.controller';
import { SkyService } from '../sky/sky.service';
import { StorageModule } from '../storage/storage.module';
import { STOP_COMMAND_HANDLERS } from '../stops/commands';
import { StopsController } from '../stops/stops.controller';
import { StopsService } from '../stops/stops.service';
import { WEIGH_IN_COMMAND_HANDLERS } from '../weigh-ins/commands';
import { WeighInsController } from '../weigh-ins/weigh-ins.controller';
import { WeighInsService } from '../weigh-ins/weigh-ins.service';

/**
 * The journal: lakes, events and their days, finds, catches, stops, weigh-ins, photos, imports, exports and
 * sky context. Every write is a command whose handler appends to journal_event in its transaction.
 */
@Module({
  imports: [StorageModule],
  controllers: [
    LakesController,
    EventsController,
    FindsController,
    CatchesController,
    StopsController,
    WeighInsController,
    PhotosController,
    SkyController,
    ExportsController,
  ],
  providers: [
    JournalEventsService,
    RecordHistoryService,
    SkyService,
    LakesService,
    EventsService,
    FindsService,
    CatchesService,
    StopsService,
    WeighInsService,
    JournalExportService,
    ...LAKE_COMMAND_HANDLERS,
    ...EVENT_COMMAND_HANDLERS,
    ...FIND_COMMAND_HANDLERS,
    ...CATCH_COMMAND_HANDLERS,
    ...STOP_COMMAND_HANDLERS,
    ...WEIGH_IN_COMMAND_HANDLERS,
    UploadPhotoHandler,
  ],
  exports: [JournalEventsService, SkyService],
})
export class JournalModule {}
