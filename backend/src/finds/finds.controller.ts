import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  Param,
  Patch,
  Post,
  Query,
  Req,
  Res,
  UseInterceptors,
} from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import {
  ApiBadRequestResponse,
  ApiBody,
  ApiConflictResponse,
  ApiConsumes,
  ApiCookieAuth,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiOperation,
  ApiPayloadTooLargeResponse,
  ApiTags,
} from '@nestjs/swagger';
import type { Request, Response } from 'express';
import type {
  BulkDeleteFindsResult,
  BulkUpdateFindsResult,
  FindImportPreview,
  FindImportResult,
  FindView,
} from '@shoalbook/shared';
import { CrewRoute, CurrentCrew } from '../crews/access/crew.decorators';
import { ApiErrorDto } from '../common/dto/api-error.dto';
import type { CrewAccess } from '../crews/access/request-context';
import { TournamentEvent } from '../events/tournament-event.entity';
import { previewFindImport } from '../imports/find-import';
import { GPX_LIMITS } from '../imports/gpx-parser';
import { readGpxUpload } from '../imports/read-upload';
import { UploadInterceptor } from '../imports/upload.interceptor';
import { FieldProblems, unknownReference } from '../journal/journal-errors';
import { RecordIdPipe } from '../journal/record-id.pipe';
import { Lake } from '../lakes/lake.entity';
import { EntityManager } from '@mikro-orm/mariadb';
import { AddFindCommand, DeleteFindCommand, UpdateFindCommand } from './commands/find.commands';
import { BulkDeleteFindsCommand, BulkUpdateFindsCommand } from './commands/bulk-finds.commands';
import { ImportFindsCommand } from './commands/import-finds.command';
import {
  BulkDeleteFindsResultDto,
  BulkFindsDto,
  BulkUpdateFindsDto,
  BulkUpdateFindsResultDto,
} from './dto/bulk-finds.dto';
import { AddFindDto, FindListQueryDto, UpdateFindDto } from './dto/find.dto';
import { FindImportOptionsDto } from './dto/find-import.dto';
import { FindViewDto } from './dto/find-view.dto';
import { FindImportPreviewDto, FindImportResultDto } from '../imports/dto/import-view.dto';
import { FindsService } from './finds.service';

const UPLOAD_BODY = {
  schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' } }, required: ['file'] },
};

function importOptions(query: FindImportOptionsDto, body: FindImportOptionsDto): FindImportOptionsDto {
  const merged = {
    ...query,
    ...Object.fromEntries(Object.entries(body ?? {}).filter(([, v]) => v !== undefined)),
  } as FindImportOptionsDto;
  if (!merged.lakeId) {
    const p = new FieldProblems();
    p.add('lakeId', 'Say which lake the waypoints belong to.');
    p.throwIfAny();
  }
  return merged;
}

@ApiTags('finds')
@ApiCookieAuth()
@CrewRoute()
@Controller('crews/:crewId/finds')
export class FindsController {
  constructor(
    private readonly commands: CommandBus,
    private readonly finds: FindsService,
    private readonly em: EntityManager,
  ) {}

  @Get()
  @ApiOperation({
    summary:
      'Finds, optionally of one lake or event; X-Total-Count has the total; positions hidden from viewers unless allowed',
  })
  @ApiOkResponse({
    type: [FindViewDto],
    headers: { 'X-Total-Count': { schema: { type: 'integer' }, description: 'finds matching the filter' } },
  })
  async list(
    @CurrentCrew() access: CrewAccess,
    @Query() query: FindListQueryDto,
    @Res({ passthrough: true }) res: Response,
  ): Promise<FindView[]> {
    const { views, total } = await this.finds.list(access, query);
    res.setHeader('X-Total-Count', String(total));
    return views;
  }

  @Post()
  @ApiOperation({ summary: 'Add a find' })
  @ApiCreatedResponse({ type: FindViewDto })
  create(@CurrentCrew() access: CrewAccess, @Body() dto: AddFindDto): Promise<FindView> {
    return this.commands.execute(new AddFindCommand(access, dto));
  }

  @Post('bulk-update')
  @HttpCode(200)
  @ApiOperation({ summary: 'Set the kind (and sub-kind) or the event of many finds at once: all of them or none' })
  @ApiOkResponse({ type: BulkUpdateFindsResultDto })
  @ApiBadRequestResponse({
    type: ApiErrorDto,
    description: 'a find not in the crew, a sub-kind of another kind, an event on another lake',
  })
  bulkUpdate(@CurrentCrew() access: CrewAccess, @Body() dto: BulkUpdateFindsDto): Promise<BulkUpdateFindsResult> {
    return this.commands.execute(new BulkUpdateFindsCommand(access, dto));
  }

  @Post('bulk-delete')
  @HttpCode(200)
  @ApiOperation({ summary: 'Delete many finds at once; their catches and stops stay, with no find' })
  @ApiOkResponse({ type: BulkDeleteFindsResultDto })
  @ApiBadRequestResponse({ type: ApiErrorDto, description: 'a find not in the crew: nothing is deleted' })
  bulkDelete(@CurrentCrew() access: CrewAccess, @Body() dto: BulkFindsDto): Promise<BulkDeleteFindsResult> {
    return this.commands.execute(new BulkDeleteFindsCommand(access, dto.findIds));
  }

  @Post('import/preview')
  @HttpCode(200)
  @UseInterceptors(UploadInterceptor(GPX_LIMITS.maxBytes, 'GPX file'))
  @ApiConsumes('multipart/form-data')
  @ApiBody(UPLOAD_BODY)
  @ApiOperation({ summary: 'Check a GPX 1.1 file: per-waypoint errors and duplicates within 15 m; nothing is written' })
  @ApiOkResponse({ type: FindImportPreviewDto })
  @ApiPayloadTooLargeResponse({ type: ApiErrorDto })
  async preview(
    @CurrentCrew() access: CrewAccess,
    @Req() req: Request,
    @Query() query: FindImportOptionsDto,
    @Body() body: FindImportOptionsDto,
  ): Promise<FindImportPreview> {
    const options = importOptions(query, body);
    const lake = await this.em.findOne(Lake, { id: options.lakeId!, crewId: access.crewId });
    if (!lake) throw unknownReference('lakeId', 'lake');
    if (
      options.eventId &&
      !(await this.em.count(TournamentEvent, { id: options.eventId, crewId: access.crewId, lakeId: lake.id }))
    ) {
      throw unknownReference('eventId', 'event on this lake');
    }
    const waypoints = await readGpxUpload(req.file!.buffer);
    return previewFindImport(this.em, access.crewId, lake, waypoints);
  }

  @Post('import')
  @UseInterceptors(UploadInterceptor(GPX_LIMITS.maxBytes, 'GPX file'))
  @ApiConsumes('multipart/form-data')
  @ApiBody(UPLOAD_BODY)
  @ApiOperation({ summary: 'Import a GPX 1.1 file as finds: all accepted rows in one transaction, or none' })
  @ApiCreatedResponse({ type: FindImportResultDto })
  @ApiPayloadTooLargeResponse({ type: ApiErrorDto })
  import(
    @CurrentCrew() access: CrewAccess,
    @Req() req: Request,
    @Query() query: FindImportOptionsDto,
    @Body() body: FindImportOptionsDto,
  ): Promise<FindImportResult> {
    const options = importOptions(query, body);
    return this.commands.execute(
      new ImportFindsCommand(access, req.file!.buffer, {
        lakeId: options.lakeId!,
        eventId: options.eventId ?? null,
        kind: options.kind ?? 'other',
        subKind: options.subKind ?? '',
        skipDuplicates: options.skipDuplicates ?? true,
      }),
    );
  }

  @Get(':findId')
  @ApiOkResponse({ type: FindViewDto })
  get(@CurrentCrew() access: CrewAccess, @Param('findId', new RecordIdPipe('find')) findId: string): Promise<FindView> {
    return this.finds.get(access, findId);
  }

  @Patch(':findId')
  @ApiOperation({ summary: 'Change a find; send the version you loaded' })
  @ApiOkResponse({ type: FindViewDto })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'stale_version' })
  update(
    @CurrentCrew() access: CrewAccess,
    @Param('findId', new RecordIdPipe('find')) findId: string,
    @Body() dto: UpdateFindDto,
  ): Promise<FindView> {
    return this.commands.execute(new UpdateFindCommand(access, findId, dto));
  }

  @Delete(':findId')
  @HttpCode(204)
  @ApiNoContentResponse()
  async remove(
    @CurrentCrew() access: CrewAccess,
    @Param('findId', new RecordIdPipe('find')) findId: string,
  ): Promise<void> {
    await this.commands.execute(new DeleteFindCommand(access, findId));
  }
}
