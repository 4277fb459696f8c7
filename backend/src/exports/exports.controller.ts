import { Controller, Get, Header, Res } from '@nestjs/common';
import { ApiCookieAuth, ApiOkResponse, ApiOperation, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import type { JournalExport } from '@shoalbook/shared';
import { CrewRoles, CrewRoute, CurrentCrew } from '../common/decorators/crew.decorators';
import type { CrewAccess } from '../common/request-context';
import { JournalExportDto } from './dto/journal-export.dto';
import { EXPORT_NOTICE, JournalExportService } from './journal-export.service';

/** Exports carry exact positions: owners and anglers only (viewers get 403 whatever the crew setting). */
@ApiTags('exports')
@ApiCookieAuth()
@CrewRoute()
@CrewRoles('angler')
@Controller('crews/:crewId')
export class ExportsController {
  constructor(private readonly exports: JournalExportService) {}

  @Get('export.json')
  @ApiOperation({ summary: "The crew's whole journal as JSON (contains positions; owner or angler)" })
  @ApiOkResponse({ type: JournalExportDto })
  async json(@CurrentCrew() access: CrewAccess, @Res({ passthrough: true }) res: Response): Promise<JournalExport> {
    res.setHeader(
      'Content-Disposition',
      `attachment; filename="shoalbook-journal-${new Date().toISOString().slice(0, 10)}.json"`,
    );
    res.setHeader('X-Shoalbook-Notice', EXPORT_NOTICE);
    return this.exports.json(access);
  }

  @Get('export.csv')
  @ApiProduces('text/csv')
  @ApiOperation({
    summary: "The crew's whole journal as CSV, one row per record (contains positions; owner or angler)",
  })
  @ApiOkResponse({
    description: 'one row per record; cells that could start a formula are neutralised',
    schema: { type: 'string' },
  })
  @Header('Content-Type', 'text/csv; charset=utf-8')
  async csv(@CurrentCrew() access: CrewAccess, @Res({ passthrough: true }) res: Response): Promise<string> {
    res.setHeader(
      'Content-Disposition',
      `attachment; filename="shoalbook-journal-${new Date().toISOString().slice(0, 10)}.csv"`,
    );
    res.setHeader('X-Shoalbook-Notice', EXPORT_NOTICE);
    return this.exports.csv(access);
  }
}
