import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Patch, Post } from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import {
  ApiBadRequestResponse,
  ApiCookieAuth,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiServiceUnavailableResponse,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { CrewView, MemberView } from '@shoalbook/shared';
import { CrewRoles, CrewRoute, CurrentCrew } from './access/crew.decorators';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiErrorDto } from '../common/dto/api-error.dto';
import type { CrewAccess } from './access/request-context';
import type { User } from '../users/user.entity';
import { CreateCrewCommand } from './commands/create-crew.command';
import { DeleteCrewCommand } from './commands/delete-crew.command';
import { HandOverCrewCommand } from './commands/hand-over-crew.command';
import { toCrewView } from './crew-views';
import { CrewsService } from './crews.service';
import {
  CreateCrewDto,
  CrewViewDto,
  DeleteCrewDto,
  HandOverCrewDto,
  MemberViewDto,
  UpdateCrewDto,
} from './dto/crew.dto';

@ApiTags('crews')
@ApiCookieAuth()
@ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in.' })
@ApiBadRequestResponse({ type: ApiErrorDto })
@Controller('crews')
export class CrewsController {
  constructor(
    private readonly commands: CommandBus,
    private readonly crews: CrewsService,
  ) {}

  @Get()
  @ApiOperation({ summary: 'My crews' })
  @ApiOkResponse({ type: [CrewViewDto] })
  list(@CurrentUser() user: User): Promise<CrewView[]> {
    return this.crews.myCrews(user.id);
  }

  @Post()
  @ApiOperation({ summary: 'Create a crew; the caller becomes its owner' })
  @ApiCreatedResponse({ type: CrewViewDto })
  create(@CurrentUser() user: User, @Body() dto: CreateCrewDto): Promise<CrewView> {
    return this.commands.execute(new CreateCrewCommand(user.id, dto.name));
  }
}

/** Routes of one crew: the guard has checked membership before any of these runs. */
@ApiTags('crews')
@ApiCookieAuth()
@ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in.' })
@CrewRoute()
@Controller('crews/:crewId')
export class CrewController {
  constructor(
    private readonly crews: CrewsService,
    private readonly commands: CommandBus,
  ) {}

  @Get()
  @ApiOperation({ summary: 'One crew (any member)' })
  @ApiOkResponse({ type: CrewViewDto })
  get(@CurrentCrew() access: CrewAccess): CrewView {
    return toCrewView(access.crew, access.role);
  }

  @Patch()
  @CrewRoles('owner')
  @ApiOperation({ summary: 'Rename the crew or change its settings (owner)' })
  @ApiOkResponse({ type: CrewViewDto })
  @ApiBadRequestResponse({ type: ApiErrorDto })
  update(@CurrentCrew() access: CrewAccess, @Body() dto: UpdateCrewDto): Promise<CrewView> {
    return this.crews.update(access, dto);
  }

  @Post('hand-over')
  @CrewRoles('owner')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({
    summary: 'Hand the crew to another member (owner): they become an owner, you an angler, a viewer, or no member',
  })
  @ApiOkResponse({ type: [MemberViewDto], description: 'the members after the hand-over' })
  @ApiBadRequestResponse({ type: ApiErrorDto, description: 'yourself, or not a UUID (fieldErrors.userId)' })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'that person is not a member of the crew' })
  handOver(@CurrentCrew() access: CrewAccess, @Body() dto: HandOverCrewDto): Promise<MemberView[]> {
    return this.commands.execute(
      new HandOverCrewCommand(access.crewId, access.userId, dto.userId, dto.stayAs === 'leave' ? null : dto.stayAs),
    );
  }

  @Delete()
  @CrewRoles('owner')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiOperation({
    summary: 'Delete the crew with everything in it (owner; type the crew’s name as confirmName)',
    description:
      'Removes the crew, its memberships and invites, every journal record (lakes, events, days, finds, catches, weigh-ins, journal events), the report tables’ rows and the photo files. It cannot be undone: export the journal first if it is to be kept.',
  })
  @ApiNoContentResponse({ description: 'The crew and its data are gone.' })
  @ApiBadRequestResponse({
    type: ApiErrorDto,
    description: 'confirmName does not match the crew’s name (fieldErrors.confirmName); nothing was changed.',
  })
  @ApiServiceUnavailableResponse({ type: ApiErrorDto, description: 'The report tables are being rebuilt; try again.' })
  async remove(@CurrentCrew() access: CrewAccess, @Body() dto: DeleteCrewDto): Promise<void> {
    await this.commands.execute(new DeleteCrewCommand(access.crewId, dto.confirmName));
  }
}
