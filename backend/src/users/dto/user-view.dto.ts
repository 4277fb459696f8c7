import { ApiProperty } from '@nestjs/swagger';
import {
  CREW_ROLES,
  type CrewRole,
  DEPTH_UNITS,
  LENGTH_UNITS,
  type MeResponse,
  type MembershipView,
  SITE_ROLES,
  type SiteRole,
  TEMPERATURE_UNITS,
  type UnitPreferences,
  type UserView,
  WEIGHT_UNITS,
} from '@shoalbook/shared';

export class UnitPreferencesDto implements UnitPreferences {
  @ApiProperty({ enum: WEIGHT_UNITS }) weight: UnitPreferences['weight'];
  @ApiProperty({ enum: LENGTH_UNITS }) length: UnitPreferences['length'];
  @ApiProperty({ enum: DEPTH_UNITS }) depth: UnitPreferences['depth'];
  @ApiProperty({ enum: TEMPERATURE_UNITS }) temperature: UnitPreferences['temperature'];
}

export class UserViewDto implements UserView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: 'angler@demo.test' }) email: string;
  @ApiProperty() displayName: string;
  @ApiProperty({ enum: SITE_ROLES }) siteRole: SiteRole;
  @ApiProperty({ type: UnitPreferencesDto }) units: UnitPreferences;
}

export class MembershipViewDto implements MembershipView {
  @ApiProperty({ format: 'uuid' }) crewId: string;
  @ApiProperty() crewName: string;
  @ApiProperty({ enum: CREW_ROLES }) role: CrewRole;
}

export class MeResponseDto implements MeResponse {
  @ApiProperty({ type: UserViewDto }) user: UserView;
  @ApiProperty({ type: [MembershipViewDto] }) crews: MembershipView[];
}
