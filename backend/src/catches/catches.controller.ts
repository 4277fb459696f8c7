import {
  Body,
  Controller,
  Delete,
  Get,
  Header,
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
import { EntityManager } from '@mikro-orm/mariadb';
import {
  ApiBody,
  ApiConflictResponse,
  ApiConsumes,
  ApiCookieAuth,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiOperation,
  ApiProduces,
  ApiTags,
} from '@nestjs/swagger';
import type { Request, Response } from 'express';
import type {
  CatchHistoryField,
  CatchImportPreview,
  CatchImportResult,
  CatchView,
  RecordChange,
} from '@shoalbook/shared';
import { CrewRoute, CurrentCrew } from '../crews/access/crew.decorators';
import { ApiErrorDto } from '../common/dto/api-error.dto';
import type { CrewAccess } from '../crews/access/request-context';
import { CompetitionDay } from '../events/competition-day.entity';
import { TournamentEvent } from '../events/tournament-event.entity';
import { catchCsvTemplate, checkCatchRows, CSV_LIMITS, previewOf } from '../imports/catch-csv';
import { readCatchCsvUpload } from '../imports/read-upload';
import { UploadInterceptor } from '../imports/upload.interceptor';
import { recordNotFound } from '../journal/journal-errors';
import { CatchChangeDto } from '../journal/record-change.dto';
import { RecordIdPipe } from '../journal/record-id.pipe';
import { CatchesService } from './catches.service';
import {
  DeleteCatchCommand,
  ImportCatchesCommand,
  LogCatchCommand,
  UpdateCatchCommand,
} from './commands/catch.commands';
import { CatchImportQueryDto, CatchListQueryDto, LogCatchDto, UpdateCatchDto } from './dto/catch.dto';
import { CatchViewDto } from './dto/catch-view.dto';
import { CatchImportPreviewDto, CatchImportResultDto } from '../imports/dto/import-view.dto';

const UPLOAD_BODY = {
  schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' } }, required: ['file'] },
};

@ApiTags('catches')
@ApiCookieAuth()
@CrewRoute()
@Controller('crews/:crewId/catches')
export class CatchesController {
  constructor(
    private readonly commands: CommandBus,
    private readonly catches: CatchesService,
    private readonly em: EntityManager,
  ) {}

  @Get()
  @ApiOperation({ summary: 'Catches, optionally of one event or competition day; X-Total-Count has the total' })
  @ApiOkResponse({
    type: [CatchViewDto],
    headers: { 'X-Total-Count': { schema: { type: 'integer' }, description: 'catches matching the filter' } },
  })
  async list(
    @CurrentCrew() access: CrewAccess,
    @Query() query: CatchListQueryDto,
    @Res({ passthrough: true }) res: Response,
  ): Promise<CatchView[]> {
    const { views, total } = await this.catches.list(access, query);
    res.setHeader('X-Total-Count', String(total));
    return views;
  }

  @Post()
  @ApiOperation({
    summary:
      'Log a catch; with lat/lon and no findId it is attributed to the nearest find within radiusM (default 50 m)',
  })
  @ApiCreatedResponse({ type: CatchViewDto })
  create(@CurrentCrew() access: CrewAccess, @Body() dto: LogCatchDto): Promise<CatchView> {
    return this.commands.execute(new LogCatchCommand(access, dto));
  }

  @Get('import/template')
  @ApiProduces('text/csv')
  @ApiOkResponse({ description: 'the CSV header row with the catch columns', schema: { type: 'string' } })
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="shoalbook-catches-template.csv"')
  template(): string {
    return catchCsvTemplate();
  }

  @Post('import/preview')
  @HttpCode(200)
  @UseInterceptors(UploadInterceptor(CSV_LIMITS.maxBytes, 'CSV file'))
  @ApiConsumes('multipart/form-data')
  @ApiBody(UPLOAD_BODY)
  @ApiOperation({ summary: 'Check a catch CSV row by row; nothing is written' })
  @ApiOkResponse({ type: CatchImportPreviewDto })
  async preview(
    @CurrentCrew() access: CrewAccess,
    @Req() req: Request,
    @Query() query: CatchImportQueryDto,
  ): Promise<CatchImportPreview> {
    const event = await this.em.findOne(TournamentEvent, { id: query.eventId, crewId: access.crewId });
    if (!event) throw recordNotFound('event');
    const parsed = await readCatchCsvUpload(req.file!.buffer);
    const days = await this.em.find(CompetitionDay, { crewId: access.crewId, eventId: event.id });
    const ctx = await this.catches.lakeContext(this.em, access.crewId, event);
    const existing = await this.catches.loggedCatchIdentities(this.em, access.crewId, event.id);
    return previewOf(await checkCatchRows(access.crewId, event.id, days, ctx, parsed, existing));
  }

  @Post('import')
  @UseInterceptors(UploadInterceptor(CSV_LIMITS.maxBytes, 'CSV file'))
  @ApiConsumes('multipart/form-data')
  @ApiBody(UPLOAD_BODY)
  @ApiOperation({
    summary: 'Import a catch CSV: every row in one transaction, or none if any row has an error (400 import_refused)',
  })
  @ApiCreatedResponse({ type: CatchImportResultDto })
  import(
    @CurrentCrew() access: CrewAccess,
    @Req() req: Request,
    @Query() query: CatchImportQueryDto,
  ): Promise<CatchImportResult> {
    return this.commands.execute(new ImportCatchesCommand(access, query.eventId, req.file!.buffer));
  }

  @Get(':catchId')
  @ApiOkResponse({ type: CatchViewDto })
  get(
    @CurrentCrew() access: CrewAccess,
    @Param('catchId', new RecordIdPipe('catch')) catchId: string,
  ): Promise<CatchView> {
    return this.catches.get(access, catchId);
  }

  @Get(':catchId/history')
  @ApiOperation({
    summary:
      "Every change to the catch's weight and length, oldest first, with who made it and when (from the journal)",
  })
  @ApiOkResponse({ type: [CatchChangeDto] })
  history(
    @CurrentCrew() access: CrewAccess,
    @Param('catchId', new RecordIdPipe('catch')) catchId: string,
  ): Promise<RecordChange<CatchHistoryField>[]> {
    return this.catches.changes(access, catchId);
  }

  @Patch(':catchId')
  @ApiOperation({ summary: 'Change a catch; send the version you loaded' })
  @ApiOkResponse({ type: CatchViewDto })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'stale_version' })
  update(
    @CurrentCrew() access: CrewAccess,
    @Param('catchId', new RecordIdPipe('catch')) catchId: string,
    @Body() dto: UpdateCatchDto,
  ): Promise<CatchView> {
    return this.commands.execute(new UpdateCatchCommand(access, catchId, dto));
  }

  @Delete(':catchId')
  @HttpCode(204)
  @ApiNoContentResponse()
  async remove(
    @CurrentCrew() access: CrewAccess,
    @Param('catchId', new RecordIdPipe('catch')) catchId: string,
  ): Promise<void> {
    await this.commands.execute(new DeleteCatchCommand(access, catchId));
  }
}
