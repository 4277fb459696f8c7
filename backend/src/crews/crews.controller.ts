import { Body, Controller, Get, Patch, Post } from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import { ApiBadRequestResponse, ApiCookieAuth, ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiTags, ApiUnauthorizedResponse } from '@nestjs/swagger';
import type { CrewView } from '@shoalbook/shared';
import { CrewRoles, CrewRoute, CurrentCrew } from '../common/decorators/crew.decorators';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { ApiErrorDto } from '../common/dto/api-error.dto';
import type { CrewAccess } from '../common/request-context';
import type { User } from '../users/user.entity';
import { CreateCrewCommand } from './commands/create-crew.command';
import { toCrewView } from './crew-views';
import { CrewsService } from './crews.service';
import { CreateCrewDto, CrewViewDto, UpdateCrewDto } from './dto/crew.dto';

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
  constructor(private readonly crews: CrewsService) {}

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
}
