import { Body, Controller, Get, Param, Patch, Query, Res } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCookieAuth,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiParam,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { Response } from 'express';
import type { AdminUserView } from '@shoalbook/shared';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiErrorDto } from '../common/dto/api-error.dto';
import { SiteAdminOnly } from '../common/guards/site-admin.guard';
import type { User } from '../users/user.entity';
import { AdminService } from './admin.service';
import { AdminUpdateUserDto, AdminUserListQueryDto, AdminUserViewDto } from './dto/admin.dto';

@ApiTags('admin')
@ApiCookieAuth()
@ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Not signed in.' })
@SiteAdminOnly()
@Controller('admin/users')
export class AdminController {
  constructor(private readonly admin: AdminService) {}

  @Get()
  @ApiOperation({
    summary: 'Accounts, newest first, searchable by e-mail or name (site admin); X-Total-Count has the total',
  })
  @ApiOkResponse({
    type: [AdminUserViewDto],
    headers: { 'X-Total-Count': { schema: { type: 'integer' }, description: 'accounts matching q' } },
  })
  async list(
    @Query() query: AdminUserListQueryDto,
    @Res({ passthrough: true }) res: Response,
  ): Promise<AdminUserView[]> {
    const { views, total } = await this.admin.list(query);
    res.setHeader('X-Total-Count', String(total));
    return views;
  }

  @Patch(':userId')
  @ApiParam({ name: 'userId', format: 'uuid' })
  @ApiOperation({ summary: 'Disable/enable an account or change its site role (site admin)' })
  @ApiOkResponse({ type: AdminUserViewDto })
  @ApiBadRequestResponse({ type: ApiErrorDto })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  @ApiConflictResponse({
    type: ApiErrorDto,
    description: 'An admin cannot disable or demote themselves (code self_lockout).',
  })
  update(
    @CurrentUser() admin: User,
    @Param('userId') userId: string,
    @Body() dto: AdminUpdateUserDto,
  ): Promise<AdminUserView> {
    return this.admin.update(admin.id, userId, dto);
  }
}
