import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsIn } from 'class-validator';
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
