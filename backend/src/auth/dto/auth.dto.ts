import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsNotEmpty, IsString, MaxLength, MinLength } from 'class-validator';
import {
  PASSWORD_MAX_LENGTH,
  PASSWORD_MIN_LENGTH,
  type PasswordResetConfirm,
  type PasswordResetRequest,
  type SignInRequest,
  type SignUpRequest,
} from '@shoalbook/shared';
import { NormaliseEmail, Trim } from '../../common/dto/common-transforms';
import { NoControlCharacters } from '../../common/dto/no-control-characters';

const EMAIL_MAX = 254;
const emailRules = [
  NormaliseEmail(),
  IsString({ message: 'Enter an e-mail address.' }),
  MaxLength(EMAIL_MAX, { message: `Use at most ${EMAIL_MAX} characters.` }),
  IsEmail({}, { message: 'Enter a valid e-mail address.' }),
];
const Email = (): PropertyDecorator => (target, key) => emailRules.forEach((d) => d(target, key));

/** A new password: length rules here, the common-password check in the service. */
const NewPassword = (): PropertyDecorator => (target, key) =>
  [
    IsString({ message: 'Enter a password.' }),
    MinLength(PASSWORD_MIN_LENGTH, { message: `Use at least ${PASSWORD_MIN_LENGTH} characters.` }),
    MaxLength(PASSWORD_MAX_LENGTH, { message: `Use at most ${PASSWORD_MAX_LENGTH} characters.` }),
  ].forEach((d) => d(target, key));

export class SignUpDto implements SignUpRequest {
  @ApiProperty({ example: 'new.angler@example.test', maxLength: EMAIL_MAX }) @Email() email: string;
  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH }) @NewPassword() password: string;
  @ApiProperty({ maxLength: 80 })
  @Trim()
  @NoControlCharacters()
  @IsString({ message: 'Enter a name.' })
  @IsNotEmpty({ message: 'Enter a name.' })
  @MaxLength(80, { message: 'Use at most 80 characters.' })
  displayName: string;
}

export class SignInDto implements SignInRequest {
  @ApiProperty({ example: 'angler@demo.test' }) @Email() email: string;
  @ApiProperty()
  @IsString({ message: 'Enter your password.' })
  @IsNotEmpty({ message: 'Enter your password.' })
  @MaxLength(PASSWORD_MAX_LENGTH, { message: `Use at most ${PASSWORD_MAX_LENGTH} characters.` })
  password: string;
}

export class ChangePasswordDto {
  @ApiProperty()
  @IsString({ message: 'Enter your current password.' })
  @IsNotEmpty({ message: 'Enter your current password.' })
  @MaxLength(PASSWORD_MAX_LENGTH)
  currentPassword: string;
  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH }) @NewPassword() newPassword: string;
}

export class DeleteAccountDto {
  @ApiProperty({ description: 'The current password, to confirm.' })
  @IsString({ message: 'Enter your password to confirm.' })
  @IsNotEmpty({ message: 'Enter your password to confirm.' })
  @MaxLength(PASSWORD_MAX_LENGTH)
  password: string;
}

export class PasswordResetRequestDto implements PasswordResetRequest {
  @ApiProperty() @Email() email: string;
}

export class PasswordResetConfirmDto implements PasswordResetConfirm {
  @ApiProperty({ description: 'The token from the e-mailed link.' })
  @IsString({ message: 'The link is incomplete.' })
  @IsNotEmpty({ message: 'The link is incomplete.' })
  @MaxLength(200, { message: 'The link is not valid.' })
  token: string;
  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH }) @NewPassword() password: string;
}

export class CsrfResponseDto {
  @ApiProperty({ description: 'Send it back in the x-csrf-token header of every POST/PUT/PATCH/DELETE.' })
  csrfToken: string;
}

export class MessageResponseDto {
  @ApiProperty() message: string;
}
