import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { type AdminUpdateUserRequest, type AdminUserView, SITE_ROLES, type SiteRole } from '@shoalbook/shared';
import { IsOmittable } from '../../common/dto/omittable';

export class AdminUserViewDto implements AdminUserView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() email: string;
  @ApiProperty() displayName: string;
  @ApiProperty({ enum: SITE_ROLES }) siteRole: SiteRole;
  @ApiProperty() disabled: boolean;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}

export class AdminUpdateUserDto implements AdminUpdateUserRequest {
  @ApiPropertyOptional({ description: 'Disabling ends every session of the account.' })
  @IsOmittable()
  @IsBoolean({ message: 'Use true or false.' })
  disabled?: boolean;

  @ApiPropertyOptional({ enum: SITE_ROLES })
  @IsOmittable()
  @IsIn(SITE_ROLES, { message: `The site role is one of ${SITE_ROLES.join(', ')}.` })
  siteRole?: SiteRole;
}

export const ADMIN_PAGE_MAX = 500;

/** GET /admin/users: newest first, optionally only the accounts whose e-mail or name contains `q`. */
export class AdminUserListQueryDto {
  @ApiPropertyOptional({ description: 'part of an e-mail address or a display name (any case)', maxLength: 254 })
  @IsOptional()
  @IsString()
  @MaxLength(254)
  q?: string;

  @ApiPropertyOptional({ minimum: 1, maximum: ADMIN_PAGE_MAX, default: 100 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(ADMIN_PAGE_MAX)
  limit?: number;

  @ApiPropertyOptional({ minimum: 0, default: 0 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(0)
  offset?: number;
}
