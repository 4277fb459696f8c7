import { Body, Controller, Delete, Get, Param, Patch, Post, Query, Res } from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import {
  ApiConflictResponse,
  ApiCookieAuth,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import type { Response } from 'express';
import type { StopDeletedView, StopView } from '@shoalbook/shared';
import { CrewRoute, CurrentCrew } from '../crews/access/crew.decorators';
import { ApiErrorDto } from '../common/dto/api-error.dto';
import type { CrewAccess } from '../crews/access/request-context';
import { RecordIdPipe } from '../journal/record-id.pipe';
import { DeleteStopCommand, LogStopCommand, UpdateStopCommand } from './commands/stop.commands';
import { LogStopDto, StopListQueryDto, UpdateStopDto } from './dto/stop.dto';
import { StopDeletedViewDto, StopViewDto } from './dto/stop-view.dto';
import { StopsService } from './stops.service';

@ApiTags('stops')
@ApiCookieAuth()
@CrewRoute()
@Controller('crews/:crewId/stops')
export class StopsController {
  constructor(
    private readonly commands: CommandBus,
    private readonly stops: StopsService,
  ) {}

  @Get()
  @ApiOperation({
    summary: 'Stops, optionally of one event or competition day, by arrival; X-Total-Count has the total',
  })
  @ApiOkResponse({
    type: [StopViewDto],
    headers: { 'X-Total-Count': { schema: { type: 'integer' }, description: 'stops matching the filter' } },
  })
  async list(
    @CurrentCrew() access: CrewAccess,
    @Query() query: StopListQueryDto,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StopView[]> {
    const { views, total } = await this.stops.list(access, query);
    res.setHeader('X-Total-Count', String(total));
    return views;
  }

  @Post()
  @ApiOperation({
    summary:
      'Log a stop on a competition day (at a find, or with lat/lon and no find); leftAt may follow later. 400 names the field for a stop that ends before it starts, overlaps another stop of the angler, lies outside the day or names a find not of this crew and lake',
  })
  @ApiCreatedResponse({ type: StopViewDto })
  create(@CurrentCrew() access: CrewAccess, @Body() dto: LogStopDto): Promise<StopView> {
    return this.commands.execute(new LogStopCommand(access, dto));
  }

  @Get(':stopId')
  @ApiOkResponse({ type: StopViewDto })
  get(@CurrentCrew() access: CrewAccess, @Param('stopId', new RecordIdPipe('stop')) stopId: string): Promise<StopView> {
    return this.stops.get(access, stopId);
  }

  @Patch(':stopId')
  @ApiOperation({ summary: 'Change a stop (e.g. set leftAt when leaving); send the version you loaded' })
  @ApiOkResponse({ type: StopViewDto })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'stale_version' })
  update(
    @CurrentCrew() access: CrewAccess,
    @Param('stopId', new RecordIdPipe('stop')) stopId: string,
    @Body() dto: UpdateStopDto,
  ): Promise<StopView> {
    return this.commands.execute(new UpdateStopCommand(access, stopId, dto));
  }

  @Delete(':stopId')
  @ApiOperation({ summary: 'Delete a stop; its catches are kept and are then in no stop (listed in the answer)' })
  @ApiOkResponse({ type: StopDeletedViewDto })
  remove(
    @CurrentCrew() access: CrewAccess,
    @Param('stopId', new RecordIdPipe('stop')) stopId: string,
  ): Promise<StopDeletedView> {
    return this.commands.execute(new DeleteStopCommand(access, stopId));
  }
}
