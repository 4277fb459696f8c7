import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, Post } from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCookieAuth,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiParam,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { InvitePreview, InviteView } from '@shoalbook/shared';
import { CrewRoles, CrewRoute, CurrentCrew } from './access/crew.decorators';
import { CurrentUser } from '../auth/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { ApiErrorDto } from '../common/dto/api-error.dto';
import type { CrewAccess } from './access/request-context';
import { AuthThrottle } from '../common/throttling/auth-throttling';
import type { User } from '../users/user.entity';
import { AcceptInviteCommand } from './commands/accept-invite.command';
import { CreateInviteCommand } from './commands/create-invite.command';
import { CrewsService } from './crews.service';
import {
  AcceptInviteDto,
  AcceptInviteResponseDto,
  CreateInviteDto,
  InvitePreviewDto,
  InviteViewDto,
} from './dto/crew.dto';

/** An owner's view of the crew's invites. */
@ApiTags('invites')
@ApiCookieAuth()
@ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in.' })
@CrewRoute()
@CrewRoles('owner')
@Controller('crews/:crewId/invites')
export class CrewInvitesController {
  constructor(
    private readonly commands: CommandBus,
    private readonly crews: CrewsService,
  ) {}

  @Get()
  @ApiOperation({ summary: 'Pending invites (owner)' })
  @ApiOkResponse({ type: [InviteViewDto] })
  list(@CurrentCrew() access: CrewAccess): Promise<InviteView[]> {
    return this.crews.pendingInvites(access.crewId);
  }

  @Post()
  @AuthThrottle()
  @ApiOperation({ summary: 'Invite someone by e-mail (owner); the link expires after 7 days' })
  @ApiCreatedResponse({ type: InviteViewDto })
  @ApiBadRequestResponse({ type: ApiErrorDto })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'Already a member (code already_member).' })
  create(@CurrentCrew() access: CrewAccess, @Body() dto: CreateInviteDto): Promise<InviteView> {
    return this.commands.execute(new CreateInviteCommand(access.crewId, access.userId, dto.email, dto.role));
  }

  @Delete(':inviteId')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiParam({ name: 'inviteId', format: 'uuid' })
  @ApiOperation({ summary: 'Withdraw a pending invite (owner)' })
  @ApiNoContentResponse()
  async revoke(@CurrentCrew() access: CrewAccess, @Param('inviteId') inviteId: string): Promise<void> {
    await this.crews.revokeInvite(access.crewId, inviteId);
  }
}

/** The invitee's side: look at an invite, then accept it. */
@ApiTags('invites')
@Controller('invites')
export class InvitesController {
  constructor(
    private readonly commands: CommandBus,
    private readonly crews: CrewsService,
  ) {}

  @Post('accept')
  @HttpCode(HttpStatus.OK)
  @ApiCookieAuth()
  @ApiOperation({ summary: 'Accept an invite (signed in with the invited address); the token works once' })
  @ApiOkResponse({ type: AcceptInviteResponseDto })
  @ApiBadRequestResponse({ type: ApiErrorDto, description: 'Bad, expired or used token (code token_invalid).' })
  @ApiUnauthorizedResponse({ type: ApiErrorDto })
  @ApiForbiddenResponse({
    type: ApiErrorDto,
    description: 'Signed in with another address (code invite_email_mismatch).',
  })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'Already a member.' })
  accept(@CurrentUser() user: User, @Body() dto: AcceptInviteDto): Promise<AcceptInviteResponseDto> {
    return this.commands.execute(new AcceptInviteCommand(dto.token, user.id, user.email));
  }

  @Public()
  @Get(':token')
  @ApiParam({ name: 'token', description: 'The token from the e-mailed link.' })
  @ApiOperation({ summary: 'What an invite offers (public)' })
  @ApiOkResponse({ type: InvitePreviewDto })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'Bad, expired or used token (code token_invalid).' })
  preview(@Param('token') token: string): Promise<InvitePreview> {
    return this.crews.preview(token);
  }
}
