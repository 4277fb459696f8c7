import { Body, Controller, Delete, HttpCode, HttpStatus, Res } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCookieAuth,
  ApiNoContentResponse,
  ApiOperation,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser } from '../auth/current-user.decorator';
import { DeleteAccountDto } from '../auth/dto/auth.dto';
import { SessionsService } from '../auth/sessions.service';
import { ApiErrorDto } from '../common/dto/api-error.dto';
import type { User } from '../users/user.entity';
import { AccountDeletionService } from './account-deletion.service';

/**
 * Deleting one's own account, under /auth with the other account routes; it lives here because it removes the
 * crews the account leaves empty, which only the crews layer may do.
 */
@ApiTags('auth')
@ApiCookieAuth()
@ApiBadRequestResponse({ type: ApiErrorDto, description: 'Invalid input; fieldErrors name the fields.' })
@Controller('auth')
export class AccountDeletionController {
  constructor(
    private readonly accounts: AccountDeletionService,
    private readonly sessions: SessionsService,
  ) {}

  @Delete('me')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiOperation({
    summary: 'Delete my account (confirm with the password)',
    description:
      'Removes the account, its memberships, sessions and pending tokens; crews where it is the only member are deleted with their data. Refused with 409 last_owner while the account is the last owner of a crew that has other members.',
  })
  @ApiNoContentResponse({ description: 'The account is gone and the session cookie cleared.' })
  @ApiUnauthorizedResponse({ type: ApiErrorDto })
  @ApiConflictResponse({
    type: ApiErrorDto,
    description: 'last_owner: make another member an owner (or delete the crew) first.',
  })
  async deleteMe(
    @CurrentUser() user: User,
    @Body() dto: DeleteAccountDto,
    @Res({ passthrough: true }) res: Response,
  ): Promise<void> {
    await this.accounts.deleteAccount(user, dto.password);
    this.sessions.clearCookie(res);
  }
}
