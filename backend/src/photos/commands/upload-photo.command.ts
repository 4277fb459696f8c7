import { Command } from '@nestjs/cqrs';
import type { PhotoView } from '@shoalbook/shared';
import type { CrewAccess } from '../../crews/access/request-context';

/** Re-encode an uploaded image (metadata stripped) and store it for the crew. */
export class UploadPhotoCommand extends Command<PhotoView> {
  constructor(
    readonly access: CrewAccess,
    readonly bytes: Buffer,
  ) {
    super();
  }
}
