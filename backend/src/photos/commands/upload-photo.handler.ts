import { HttpStatus } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { PhotoView } from '@shoalbook/shared';
import { ApiException } from '../../common/errors/api-errors';
import { JournalEventsService } from '../../journal-events/journal-events.service';
import { recordState } from '../../journal-events/record-state';
import { JournalErrorCode } from '../../journal/journal-errors';
import { StorageService } from '../../storage/storage.service';
import { PhotoRejected, processPhoto } from '../image-processing';
import { Photo } from '../photo.entity';
import { UploadPhotoCommand } from './upload-photo.command';

export function photoView(p: Photo): PhotoView {
  return { id: p.id, contentType: p.contentType, width: p.width, height: p.height, byteSize: p.byteSize };
}

@CommandHandler(UploadPhotoCommand)
export class UploadPhotoHandler implements ICommandHandler<UploadPhotoCommand> {
  constructor(
    private readonly journal: JournalEventsService,
    private readonly storage: StorageService,
  ) {}

  async execute({ access, bytes }: UploadPhotoCommand): Promise<PhotoView> {
    let processed;
    try {
      processed = await processPhoto(bytes);
    } catch (e) {
      if (e instanceof PhotoRejected)
        throw new ApiException(HttpStatus.BAD_REQUEST, e.message, JournalErrorCode.wrongFileType, {
          file: [e.message],
        });
      throw e;
    }
    const key = await this.storage.put(processed.bytes);
    try {
      return await this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
        const photo = tx.create(Photo, {
          crewId: access.crewId,
          storageKey: key,
          contentType: processed.contentType,
          width: processed.width,
          height: processed.height,
          byteSize: processed.bytes.length,
          uploadedById: access.userId,
        });
        await tx.flush();
        const { storageKey: _private, ...state } = recordState(tx, 'Photo', photo);
        log.record({ type: 'PhotoUploaded', aggregateType: 'photo', aggregateId: photo.id, payload: state });
        return photoView(photo);
      });
    } catch (e) {
      // The row was not written: remove the orphaned bytes.
      await this.storage.delete(key);
      throw e;
    }
  }
}
