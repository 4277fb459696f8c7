import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsEmail, IsIn, IsNotEmpty, IsString, IsUUID, MaxLength } from 'class-validator';
import {
  CREW_ROLES,
  type ChangeRoleRequest,
  type CreateCrewRequest,
  type CreateInviteRequest,
  type CrewRole,
  type CrewView,
  type InvitePreview,
  type InviteView,
  type MemberView,
  type UpdateCrewRequest,
} from '@shoalbook/shared';
import { NormaliseEmail, Trim } from '../../common/dto/common-transforms';
import { IsOmittable } from '../../common/dto/omittable';
import { NoControlCharacters } from '../../common/dto/no-control-characters';

const roleMessage = { message: `The role is one of ${CREW_ROLES.join(', ')}.` };
const nameRules = (target: object, key: string | symbol) =>
  [
    Trim(),
    IsString({ message: 'Enter a name.' }),
    NoControlCharacters(),
    IsNotEmpty({ message: 'Enter a name.' }),
    MaxLength(80, { message: 'Use at most 80 characters.' }),
  ].forEach((d) => d(target, key));

export class CreateCrewDto implements CreateCrewRequest {
  @ApiProperty({ maxLength: 80, example: 'Spring Practice Crew' }) @(nameRules as PropertyDecorator) name: string;
}

export class UpdateCrewDto implements UpdateCrewRequest {
  @ApiPropertyOptional({ maxLength: 80 }) @IsOmittable() @(nameRules as PropertyDecorator) name?: string;
  @ApiPropertyOptional({ description: 'Whether viewers see exact positions.' })
  @IsOmittable()
  @IsBoolean({ message: 'Use true or false.' })
  viewersSeePositions?: boolean;
}

export class DeleteCrewDto {
  @ApiProperty({ maxLength: 80, description: 'The crew’s name, typed again to confirm the deletion.' })
  @Trim()
  @NoControlCharacters()
  @IsString({ message: 'Type the crew’s name to confirm.' })
  @IsNotEmpty({ message: 'Type the crew’s name to confirm.' })
  @MaxLength(80, { message: 'Use at most 80 characters.' })
  confirmName: string;
}

export class ChangeRoleDto implements ChangeRoleRequest {
  @ApiProperty({ enum: CREW_ROLES }) @IsIn(CREW_ROLES, roleMessage) role: CrewRole;
}

export class HandOverCrewDto {
  @ApiProperty({ format: 'uuid', description: 'the member who becomes an owner' })
  @IsUUID('all', { message: 'Choose a member of the crew.' })
  userId: string;

  @ApiProperty({
    enum: ['angler', 'viewer', 'leave'],
    description: 'what the one handing over becomes: an angler, a viewer, or no member (leave)',
  })
  @IsIn(['angler', 'viewer', 'leave'], { message: 'Stay as an angler or a viewer, or leave the crew.' })
  stayAs: 'angler' | 'viewer' | 'leave';
}

export class CreateInviteDto implements CreateInviteRequest {
  @ApiProperty({ example: 'coach@example.test', maxLength: 254 })
  @NormaliseEmail()
  @IsString({ message: 'Enter an e-mail address.' })
  @MaxLength(254, { message: 'Use at most 254 characters.' })
  @IsEmail({}, { message: 'Enter a valid e-mail address.' })
  email: string;
  @ApiProperty({ enum: CREW_ROLES }) @IsIn(CREW_ROLES, roleMessage) role: CrewRole;
}

export class AcceptInviteDto {
  @ApiProperty({ description: 'The token from the e-mailed link.' })
  @IsString({ message: 'The link is incomplete.' })
  @IsNotEmpty({ message: 'The link is incomplete.' })
  @MaxLength(200, { message: 'The link is not valid.' })
  token: string;
}

export class CrewViewDto implements CrewView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: CREW_ROLES, description: 'The caller’s role in this crew.' }) role: CrewRole;
  @ApiProperty() viewersSeePositions: boolean;
}

export class MemberViewDto implements MemberView {
  @ApiProperty({ format: 'uuid' }) userId: string;
  @ApiProperty() email: string;
  @ApiProperty() displayName: string;
  @ApiProperty({ enum: CREW_ROLES }) role: CrewRole;
  @ApiProperty({ format: 'date-time' }) joinedAt: string;
}

export class InviteViewDto implements InviteView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() email: string;
  @ApiProperty({ enum: CREW_ROLES }) role: CrewRole;
  @ApiProperty({ format: 'date-time' }) expiresAt: string;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}

export class InvitePreviewDto implements InvitePreview {
  @ApiProperty() crewName: string;
  @ApiProperty({ enum: CREW_ROLES }) role: CrewRole;
  @ApiProperty() email: string;
  @ApiProperty({ format: 'date-time' }) expiresAt: string;
}

export class AcceptInviteResponseDto {
  @ApiProperty({ format: 'uuid' }) crewId: string;
}
