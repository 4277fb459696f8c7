import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, Patch } from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCookieAuth,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiOperation,
  ApiParam,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { MemberView } from '@shoalbook/shared';
import { CrewRoles, CrewRoute, CurrentCrew } from './access/crew.decorators';
import { ApiErrorDto } from '../common/dto/api-error.dto';
import type { CrewAccess } from './access/request-context';
import { ChangeMemberRoleCommand } from './commands/change-member-role.command';
import { RemoveMemberCommand } from './commands/remove-member.command';
import { CrewsService } from './crews.service';
import { ChangeRoleDto, MemberViewDto } from './dto/crew.dto';

@ApiTags('crews')
@ApiCookieAuth()
@ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in.' })
@CrewRoute()
@Controller('crews/:crewId/members')
export class MembersController {
  constructor(
    private readonly commands: CommandBus,
    private readonly crews: CrewsService,
  ) {}

  @Get()
  @ApiOperation({ summary: 'The crew’s members (any member)' })
  @ApiOkResponse({ type: [MemberViewDto] })
  list(@CurrentCrew() access: CrewAccess): Promise<MemberView[]> {
    return this.crews.members(access.crewId);
  }

  @Patch(':userId')
  @CrewRoles('owner')
  @ApiParam({ name: 'userId', format: 'uuid' })
  @ApiOperation({ summary: 'Change a member’s role (owner)' })
  @ApiOkResponse({ type: MemberViewDto })
  @ApiBadRequestResponse({ type: ApiErrorDto })
  @ApiConflictResponse({
    type: ApiErrorDto,
    description: 'It would leave the crew without an owner (code last_owner).',
  })
  changeRole(
    @CurrentCrew() access: CrewAccess,
    @Param('userId') userId: string,
    @Body() dto: ChangeRoleDto,
  ): Promise<MemberView> {
    return this.commands.execute(new ChangeMemberRoleCommand(access.crewId, userId, dto.role));
  }

  @Delete(':userId')
  @CrewRoles('owner', { orSelf: 'userId' })
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiParam({ name: 'userId', format: 'uuid' })
  @ApiOperation({ summary: 'Remove a member (owner), or leave the crew (any member, own id)' })
  @ApiNoContentResponse()
  @ApiConflictResponse({ type: ApiErrorDto, description: 'The last owner cannot leave (code last_owner).' })
  async remove(@CurrentCrew() access: CrewAccess, @Param('userId') userId: string): Promise<void> {
    await this.commands.execute(new RemoveMemberCommand(access.crewId, userId));
  }
}
