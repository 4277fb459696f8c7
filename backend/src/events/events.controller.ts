import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import {
  ApiConflictResponse,
  ApiCookieAuth,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import type { CompetitionDayView, EventView, PracticeDayView } from '@shoalbook/shared';
import { CrewRoute, CurrentCrew } from '../crews/access/crew.decorators';
import { ApiErrorDto } from '../common/dto/api-error.dto';
import type { CrewAccess } from '../crews/access/request-context';
import { RecordIdPipe } from '../journal/record-id.pipe';
import {
  CreateEventCommand,
  DeleteEventCommand,
  UpdateCompetitionDayCommand,
  UpdateEventCommand,
  UpdatePracticeDayCommand,
} from './commands/event.commands';
import { UpdateCompetitionDayDto, UpdatePracticeDayDto } from './dto/day.dto';
import { CreateEventDto, EventListQueryDto, UpdateEventDto } from './dto/event.dto';
import { CompetitionDayViewDto, EventViewDto, PracticeDayViewDto } from './dto/event-view.dto';
import { competitionDayView, eventView, practiceDayView } from './event-views';
import { EventsService } from './events.service';

@ApiTags('events')
@ApiCookieAuth()
@CrewRoute()
@Controller('crews/:crewId')
export class EventsController {
  constructor(
    private readonly commands: CommandBus,
    private readonly events: EventsService,
  ) {}

  @Get('events')
  @ApiOperation({ summary: "The crew's events, optionally of one lake" })
  @ApiOkResponse({ type: [EventViewDto] })
  async list(@CurrentCrew() access: CrewAccess, @Query() query: EventListQueryDto): Promise<EventView[]> {
    return (await this.events.list(access.crewId, query.lakeId)).map(eventView);
  }

  @Post('events')
  @ApiOperation({ summary: 'Add an event; its practice and competition days are created from the dates' })
  @ApiCreatedResponse({ type: EventViewDto })
  create(@CurrentCrew() access: CrewAccess, @Body() dto: CreateEventDto): Promise<EventView> {
    return this.commands.execute(new CreateEventCommand(access, dto));
  }

  @Get('events/:eventId')
  @ApiOkResponse({ type: EventViewDto })
  async get(
    @CurrentCrew() access: CrewAccess,
    @Param('eventId', new RecordIdPipe('event')) eventId: string,
  ): Promise<EventView> {
    return eventView(await this.events.get(access.crewId, eventId));
  }

  @Patch('events/:eventId')
  @ApiOperation({ summary: 'Change an event; send the version you loaded' })
  @ApiOkResponse({ type: EventViewDto })
  @ApiConflictResponse({
    type: ApiErrorDto,
    description: 'stale_version, or day_in_use when a dropped date has finds or catches',
  })
  update(
    @CurrentCrew() access: CrewAccess,
    @Param('eventId', new RecordIdPipe('event')) eventId: string,
    @Body() dto: UpdateEventDto,
  ): Promise<EventView> {
    return this.commands.execute(new UpdateEventCommand(access, eventId, dto));
  }

  @Delete('events/:eventId')
  @HttpCode(204)
  @ApiNoContentResponse()
  @ApiConflictResponse({ type: ApiErrorDto, description: 'in_use: the event still has finds or catches' })
  async remove(
    @CurrentCrew() access: CrewAccess,
    @Param('eventId', new RecordIdPipe('event')) eventId: string,
  ): Promise<void> {
    await this.commands.execute(new DeleteEventCommand(access, eventId));
  }

  @Get('events/:eventId/practice-days')
  @ApiOkResponse({ type: [PracticeDayViewDto] })
  async practiceDays(
    @CurrentCrew() access: CrewAccess,
    @Param('eventId', new RecordIdPipe('event')) eventId: string,
  ): Promise<PracticeDayView[]> {
    await this.events.get(access.crewId, eventId);
    return (await this.events.practiceDays(access.crewId, eventId)).map(practiceDayView);
  }

  @Patch('practice-days/:dayId')
  @ApiOkResponse({ type: PracticeDayViewDto })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'stale_version' })
  updatePracticeDay(
    @CurrentCrew() access: CrewAccess,
    @Param('dayId', new RecordIdPipe('practice day')) dayId: string,
    @Body() dto: UpdatePracticeDayDto,
  ): Promise<PracticeDayView> {
    return this.commands.execute(new UpdatePracticeDayCommand(access, dayId, dto));
  }

  @Get('events/:eventId/competition-days')
  @ApiOkResponse({ type: [CompetitionDayViewDto] })
  async competitionDays(
    @CurrentCrew() access: CrewAccess,
    @Param('eventId', new RecordIdPipe('event')) eventId: string,
  ): Promise<CompetitionDayView[]> {
    await this.events.get(access.crewId, eventId);
    return (await this.events.competitionDays(access.crewId, eventId)).map(competitionDayView);
  }

  @Patch('competition-days/:dayId')
  @ApiOkResponse({ type: CompetitionDayViewDto })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'stale_version' })
  updateCompetitionDay(
    @CurrentCrew() access: CrewAccess,
    @Param('dayId', new RecordIdPipe('competition day')) dayId: string,
    @Body() dto: UpdateCompetitionDayDto,
  ): Promise<CompetitionDayView> {
    return this.commands.execute(new UpdateCompetitionDayCommand(access, dayId, dto));
  }
}
