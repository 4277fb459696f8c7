import { Controller, Get, Header, Param, Res } from '@nestjs/common';
import { ApiCookieAuth, ApiOkResponse, ApiOperation, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import type { JournalExport } from '@shoalbook/shared';
import { CrewRoles, CrewRoute, CurrentCrew } from '../crews/access/crew.decorators';
import type { CrewAccess } from '../crews/access/request-context';
import { RecordIdPipe } from '../journal/record-id.pipe';
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

  @Get('lakes/:lakeId/finds.gpx')
  @ApiProduces('application/gpx+xml')
  @ApiOperation({
    summary:
      "A lake's finds as GPX 1.1 waypoints, which the find import reads back (contains positions; owner or angler)",
  })
  @ApiOkResponse({
    description: 'kind in <type>, notes in <desc>, depth (m) and sub-kind in extensions',
    schema: { type: 'string' },
  })
  @Header('Content-Type', 'application/gpx+xml; charset=utf-8')
  async gpx(
    @CurrentCrew() access: CrewAccess,
    @Param('lakeId', new RecordIdPipe('lake')) lakeId: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<string> {
    const { fileName, gpx } = await this.exports.lakeFindsGpx(access, lakeId);
    res.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
    res.setHeader('X-Shoalbook-Notice', EXPORT_NOTICE);
    return gpx;
  }
}
