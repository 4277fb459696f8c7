import { EntityManager } from '@mikro-orm/mariadb';
import { Controller, Get, Param, Post, Req, Res, StreamableFile, UseInterceptors } from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import {
  ApiBody,
  ApiConsumes,
  ApiCookieAuth,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiOperation,
  ApiProduces,
  ApiTags,
} from '@nestjs/swagger';
import type { Request, Response } from 'express';
import type { PhotoView } from '@shoalbook/shared';
import { CrewRoute, CurrentCrew } from '../crews/access/crew.decorators';
import type { CrewAccess } from '../crews/access/request-context';
import { UploadInterceptor } from '../imports/upload.interceptor';
import { recordNotFound } from '../journal/journal-errors';
import { RecordIdPipe } from '../journal/record-id.pipe';
import { StorageService } from '../storage/storage.service';
import { UploadPhotoCommand } from './commands/upload-photo.command';
import { PhotoViewDto } from './dto/photo-view.dto';
import { PHOTO_LIMITS } from './image-processing';
import { Photo } from './photo.entity';

@ApiTags('photos')
@ApiCookieAuth()
@CrewRoute()
@Controller('crews/:crewId/photos')
export class PhotosController {
  constructor(
    private readonly commands: CommandBus,
    private readonly em: EntityManager,
    private readonly storage: StorageService,
  ) {}

  @Post()
  @UseInterceptors(UploadInterceptor(PHOTO_LIMITS.maxBytes, 'image'))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' } }, required: ['file'] },
  })
  @ApiOperation({
    summary: 'Upload a photo or sonar screenshot (images only, ≤ 8 MB); re-encoded, all metadata incl. GPS removed',
  })
  @ApiCreatedResponse({ type: PhotoViewDto })
  upload(@CurrentCrew() access: CrewAccess, @Req() req: Request): Promise<PhotoView> {
    return this.commands.execute(new UploadPhotoCommand(access, req.file!.buffer));
  }

  @Get(':photoId')
  @ApiProduces('image/jpeg')
  @ApiOperation({ summary: 'The image (crew members only)' })
  @ApiOkResponse({ description: 'the re-encoded image bytes', schema: { type: 'string', format: 'binary' } })
  async get(
    @CurrentCrew() access: CrewAccess,
    @Param('photoId', new RecordIdPipe('photo')) photoId: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StreamableFile> {
    const photo = await this.em.findOne(Photo, { id: photoId, crewId: access.crewId });
    const bytes = photo ? await this.storage.get(photo.storageKey) : null;
    if (!photo || !bytes) throw recordNotFound('photo');
    res.setHeader('X-Content-Type-Options', 'nosniff');
    return new StreamableFile(bytes, { type: photo.contentType, length: bytes.length });
  }
}
