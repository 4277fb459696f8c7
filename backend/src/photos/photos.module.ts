import { Module } from '@nestjs/common';
import { JournalEventsModule } from '../journal-events/journal-events.module';
import { StorageModule } from '../storage/storage.module';
import { UploadPhotoHandler } from './commands/upload-photo.handler';
import { PhotosController } from './photos.controller';

/** Photos of catches and finds: uploaded, checked and resized, kept in storage. */
@Module({
  imports: [JournalEventsModule, StorageModule],
  controllers: [PhotosController],
  providers: [UploadPhotoHandler],
})
export class PhotosModule {}
