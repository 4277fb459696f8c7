import { Body, Controller, Get, HttpCode, HttpStatus, Param, Post, Query as QueryParams } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiAcceptedResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type {
  EventFindsView,
  EventRecapView,
  FindMapView,
  HitRatesView,
  LakeComparisonView,
  RecapEmailResult,
  ReportFilters,
  TimingView,
} from '@shoalbook/shared';
import { CrewRoute, CurrentCrew } from '../crews/access/crew.decorators';
import { ApiException, ErrorCode, fieldError } from '../common/errors/api-errors';
import type { CrewAccess } from '../crews/access/request-context';
import { canSeePositions } from '../journal/positions';
import { RecordIdPipe } from '../journal/record-id.pipe';
import { SendRecapEmailCommand } from './commands/send-recap-email.command';
import { EventFindsViewDto } from './dto/event-finds-view.dto';
import { EventRecapViewDto } from './dto/event-recap-view.dto';
import { FindMapViewDto } from './dto/find-map-view.dto';
import { HitRatesViewDto } from './dto/hit-rates-view.dto';
import { LakeComparisonViewDto } from './dto/lake-comparison-view.dto';
import { RecapEmailResultDto } from './dto/recap-email-result.dto';
import {
  FindMapQueryDto,
  HitRatesQueryDto,
  LakeComparisonQueryDto,
  RecapEmailDto,
  ReportFiltersDto,
} from './dto/report-filters.dto';
import { TimingViewDto } from './dto/timing-view.dto';
import { GetEventFindsQuery } from './queries/event-finds.query';
import { GetEventRecapQuery } from './queries/event-recap.query';
import { GetFindMapQuery } from './queries/find-map.query';
import { GetHitRatesQuery } from './queries/hit-rates.query';
import { GetLakeComparisonQuery } from './queries/lake-comparison.query';
import { GetTimingQuery } from './queries/timing.query';

function filtersOf(q: ReportFiltersDto): ReportFilters {
  const { lakeId, eventId, season, year, from, to } = q;
  return { lakeId, eventId, season, year, from, to };
}

const notFound = (what: string) =>
  new ApiException(HttpStatus.NOT_FOUND, `No such ${what} in this crew.`, ErrorCode.notFound);

/** The reports: any member reads; the recap e-mail needs an owner or angler. Every query reads only read models. */
@ApiTags('reports')
@Controller('crews/:crewId/reports')
@CrewRoute()
export class ReportsController {
  constructor(
    private readonly queries: QueryBus,
    private readonly commands: CommandBus,
  ) {}

  @Get('hit-rates')
  @ApiOperation({ summary: 'Hit rates of the crew’s finds by a grouping, with intervals, shrinkage and readings.' })
  @ApiOkResponse({ type: HitRatesViewDto })
  hitRates(@CurrentCrew() access: CrewAccess, @QueryParams() q: HitRatesQueryDto): Promise<HitRatesView> {
    return this.queries.execute(new GetHitRatesQuery(access.crewId, filtersOf(q), q.by ?? 'kind'));
  }

  @Get('lake-comparison')
  @ApiOperation({ summary: 'One grouping side by side for the events on one lake, with the differences.' })
  @ApiOkResponse({ type: LakeComparisonViewDto })
  lakeComparison(
    @CurrentCrew() access: CrewAccess,
    @QueryParams() q: LakeComparisonQueryDto,
  ): Promise<LakeComparisonView> {
    if (!q.lakeId) throw fieldError('lakeId', 'Choose a lake to compare its events.');
    return this.queries.execute(
      new GetLakeComparisonQuery(access.crewId, q.lakeId, q.by ?? 'kind', filtersOf(q), q.eventIds),
    );
  }

  @Get('events/:eventId/recap')
  @ApiOperation({ summary: 'The event recap: bags by day, standings, producing finds, weight timeline, big fish.' })
  @ApiOkResponse({ type: EventRecapViewDto })
  async recap(
    @CurrentCrew() access: CrewAccess,
    @Param('eventId', new RecordIdPipe('event')) eventId: string,
  ): Promise<EventRecapView> {
    const recap = await this.queries.execute(new GetEventRecapQuery(access.crewId, eventId));
    if (!recap) throw notFound('event');
    return recap;
  }

  @Get('events/:eventId/finds')
  @ApiOperation({ summary: 'Every find of the event with its outcome, and the share that paid off.' })
  @ApiOkResponse({ type: EventFindsViewDto })
  async eventFinds(
    @CurrentCrew() access: CrewAccess,
    @Param('eventId', new RecordIdPipe('event')) eventId: string,
  ): Promise<EventFindsView> {
    const finds = await this.queries.execute(new GetEventFindsQuery(access.crewId, eventId));
    if (!finds) throw notFound('event');
    return finds;
  }

  @Get('timing')
  @ApiOperation({ summary: 'Catches against the local clock and the sun/moon periods; weight by hour.' })
  @ApiOkResponse({ type: TimingViewDto })
  timing(@CurrentCrew() access: CrewAccess, @QueryParams() q: ReportFiltersDto): Promise<TimingView> {
    return this.queries.execute(new GetTimingQuery(access.crewId, filtersOf(q)));
  }

  @Get('find-map')
  @ApiOperation({
    summary: 'A lake’s finds and catches in metres from its reference point (hidden from viewers unless allowed).',
  })
  @ApiOkResponse({ type: FindMapViewDto })
  async findMap(@CurrentCrew() access: CrewAccess, @QueryParams() q: FindMapQueryDto): Promise<FindMapView> {
    if (!q.lakeId) throw fieldError('lakeId', 'Choose a lake to see its finds on the map.');
    const map = await this.queries.execute(
      new GetFindMapQuery(access.crewId, q.lakeId, filtersOf(q), canSeePositions(access)),
    );
    if (!map) throw notFound('lake');
    return map;
  }

  @Post('events/:eventId/recap-email')
  @HttpCode(202)
  @ApiOperation({
    summary: 'E-mail the recap (key numbers and a link, never positions) to chosen members of this crew.',
  })
  @ApiAcceptedResponse({ type: RecapEmailResultDto })
  recapEmail(
    @CurrentCrew() access: CrewAccess,
    @Param('eventId', new RecordIdPipe('event')) eventId: string,
    @Body() body: RecapEmailDto,
  ): Promise<RecapEmailResult> {
    return this.commands.execute(new SendRecapEmailCommand(access, eventId, body.userIds));
  }
}
