import { Body, Controller, Get, Param, Put, Query } from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import { ApiConflictResponse, ApiCookieAuth, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { ApiErrorDto } from '../common/dto/api-error.dto';
import type { EventTally, RecordChange, WeighInHistoryField, WeighInsView } from '@shoalbook/shared';
import { CrewRoute, CurrentCrew } from '../crews/access/crew.decorators';
import type { CrewAccess } from '../crews/access/request-context';
import { WeighInChangeDto } from '../journal/record-change.dto';
import { RecordIdPipe } from '../journal/record-id.pipe';
import { RecordWeighInCommand } from './commands/record-weigh-in.command';
import { RecordWeighInDto } from './weigh-in.dto';
import { EventTallyDto, EventTallyQueryDto, RecordedWeighInDto, WeighInsViewDto } from './weigh-in-view.dto';
import { type VersionedWeighIn, WeighInsService } from './weigh-ins.service';

@ApiTags('weigh-ins')
@ApiCookieAuth()
@CrewRoute()
@Controller('crews/:crewId')
export class WeighInsController {
  constructor(
    private readonly commands: CommandBus,
    private readonly weighIns: WeighInsService,
  ) {}

  @Get('event-tallies')
  @ApiOperation({
    summary: 'Fish caught and counted and the total weight (official where entered) of every event, or of one lake’s',
  })
  @ApiOkResponse({ type: [EventTallyDto] })
  tallies(@CurrentCrew() access: CrewAccess, @Query() query: EventTallyQueryDto): Promise<EventTally[]> {
    return this.weighIns.tallies(access, query.lakeId);
  }

  @Get('events/:eventId/weigh-ins')
  @ApiOperation({
    summary: "Each competition day's computed bag (event rules) beside the official figures, and the event totals",
  })
  @ApiOkResponse({ type: WeighInsViewDto })
  list(
    @CurrentCrew() access: CrewAccess,
    @Param('eventId', new RecordIdPipe('event')) eventId: string,
  ): Promise<WeighInsView> {
    return this.weighIns.forEvent(access, eventId);
  }

  @Put('competition-days/:dayId/weigh-in')
  @ApiOperation({
    summary:
      "Record a day's official weigh-in figures (they override the computed ones in the totals); send the version you loaded, none for the first recording",
  })
  @ApiOkResponse({ type: RecordedWeighInDto })
  @ApiConflictResponse({
    type: ApiErrorDto,
    description: 'stale_version: recorded or changed by someone else since you loaded it',
  })
  record(
    @CurrentCrew() access: CrewAccess,
    @Param('dayId', new RecordIdPipe('competition day')) dayId: string,
    @Body() dto: RecordWeighInDto,
  ): Promise<VersionedWeighIn & { competitionDayId: string }> {
    return this.commands.execute(new RecordWeighInCommand(access, dayId, dto));
  }

  @Get('competition-days/:dayId/weigh-in/history')
  @ApiOperation({
    summary:
      "Every change to a day's official weigh-in figures, oldest first, with who made it and when (from the journal)",
  })
  @ApiOkResponse({ type: [WeighInChangeDto] })
  history(
    @CurrentCrew() access: CrewAccess,
    @Param('dayId', new RecordIdPipe('competition day')) dayId: string,
  ): Promise<RecordChange<WeighInHistoryField>[]> {
    return this.weighIns.changes(access, dayId);
  }
}
