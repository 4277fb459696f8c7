import { Body, Controller, Get, HttpCode, HttpStatus, Patch, Post, Req, Res } from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import {
  ApiAcceptedResponse,
  ApiBadRequestResponse,
  ApiCookieAuth,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { Request, Response } from 'express';
import type { MeResponse } from '@shoalbook/shared';
import { CsrfService } from '../common/csrf/csrf.service';
import { CurrentUser } from './current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { ApiErrorDto } from '../common/dto/api-error.dto';
import { AuthThrottle } from '../common/throttling/auth-throttling';
import { MeResponseDto } from '../users/dto/user-view.dto';
import { UpdateMeDto } from '../users/dto/update-me.dto';
import type { User } from '../users/user.entity';
import { UsersService } from '../users/users.service';
import { AuthService } from './auth.service';
import { SignUpCommand } from './commands/sign-up.command';
import {
  ChangePasswordDto,
  CsrfResponseDto,
  MessageResponseDto,
  PasswordResetConfirmDto,
  PasswordResetRequestDto,
  SignInDto,
  SignUpDto,
} from './dto/auth.dto';
import { SessionsService } from './sessions.service';

export const SIGN_UP_MESSAGE =
  'Thanks. If this address was free, the account is ready: sign in with it. Either way, a message about it is on its way to the address.';

@ApiTags('auth')
@ApiCookieAuth()
@ApiBadRequestResponse({ type: ApiErrorDto, description: 'Invalid input; fieldErrors name the fields.' })
@Controller('auth')
export class AuthController {
  constructor(
    private readonly commands: CommandBus,
    private readonly auth: AuthService,
    private readonly users: UsersService,
    private readonly sessions: SessionsService,
    private readonly csrf: CsrfService,
  ) {}

  @Public()
  @Get('csrf')
  @ApiOperation({
    summary: 'A CSRF token for this browser and session (fetch again after sign-in, sign-up and sign-out)',
  })
  @ApiOkResponse({ type: CsrfResponseDto })
  csrfToken(@Req() req: Request, @Res({ passthrough: true }) res: Response): CsrfResponseDto {
    return { csrfToken: this.csrf.issueToken(req, res) };
  }

  @Public()
  @AuthThrottle()
  @Post('sign-up')
  @HttpCode(HttpStatus.ACCEPTED)
  @ApiOperation({
    summary: 'Create an account (then sign in with it)',
    description:
      'The same answer whether or not the address already has an account (no account enumeration, OWASP ASVS 4.0.3 2.2.x / the Authentication cheat sheet); the owner of a taken address is told by e-mail. Sign in afterwards with the same address and password.',
  })
  @ApiAcceptedResponse({ type: MessageResponseDto })
  async signUp(@Body() dto: SignUpDto): Promise<MessageResponseDto> {
    await this.commands.execute(new SignUpCommand(dto.email, dto.password, dto.displayName));
    return { message: SIGN_UP_MESSAGE };
  }

  @Public()
  @AuthThrottle()
  @Post('sign-in')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({ summary: 'Sign in; starts a new session' })
  @ApiOkResponse({ type: MeResponseDto })
  @ApiUnauthorizedResponse({
    type: ApiErrorDto,
    description: 'E-mail or password is wrong, or the account is disabled (one answer for all three).',
  })
  async signIn(
    @Body() dto: SignInDto,
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ): Promise<MeResponse> {
    const user = await this.auth.signIn(dto.email, dto.password);
    await this.startSession(user, req, res);
    return this.users.me(user);
  }

  @Public()
  @Post('sign-out')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiOperation({ summary: 'End this session' })
  @ApiNoContentResponse({ description: 'Signed out (also when there was no session).' })
  async signOut(@Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<void> {
    if (req.authSession) await this.sessions.end(req.authSession.tokenHash);
    this.sessions.clearCookie(res);
  }

  @Get('me')
  @ApiOperation({ summary: 'The signed-in account and its crews' })
  @ApiOkResponse({ type: MeResponseDto })
  @ApiUnauthorizedResponse({ type: ApiErrorDto })
  me(@CurrentUser() user: User): Promise<MeResponse> {
    return this.users.me(user);
  }

  @Patch('me')
  @ApiOperation({ summary: 'Change the display name or unit preferences' })
  @ApiOkResponse({ type: MeResponseDto })
  @ApiUnauthorizedResponse({ type: ApiErrorDto })
  async updateMe(@CurrentUser() user: User, @Body() dto: UpdateMeDto): Promise<MeResponse> {
    await this.users.updateProfile(user, dto);
    return this.users.me(user);
  }

  @Post('change-password')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiOperation({ summary: 'Change the password; ends every other session' })
  @ApiNoContentResponse()
  @ApiUnauthorizedResponse({ type: ApiErrorDto })
  async changePassword(@CurrentUser() user: User, @Req() req: Request, @Body() dto: ChangePasswordDto): Promise<void> {
    await this.auth.changePassword(user, req.authSession!.tokenHash, dto.currentPassword, dto.newPassword);
  }

  @Public()
  @AuthThrottle()
  @Post('password-reset/request')
  @HttpCode(HttpStatus.ACCEPTED)
  @ApiOperation({ summary: 'E-mail a reset link (the same answer whether or not the address has an account)' })
  @ApiAcceptedResponse({ type: MessageResponseDto })
  requestReset(@Body() dto: PasswordResetRequestDto): MessageResponseDto {
    this.auth.requestPasswordReset(dto.email);
    return {
      message: 'If an account uses this address, a link to set a new password is on its way. It works for 30 minutes.',
    };
  }

  @Public()
  @AuthThrottle()
  @Post('password-reset/confirm')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiOperation({ summary: 'Set a new password with the e-mailed token; ends every session of the account' })
  @ApiNoContentResponse()
  async confirmReset(@Body() dto: PasswordResetConfirmDto): Promise<void> {
    await this.auth.confirmPasswordReset(dto.token, dto.password);
  }

  /** A new session on every sign-in; the previous cookie's session (if any) ends. */
  private async startSession(user: User, req: Request, res: Response): Promise<void> {
    if (req.authSession) await this.sessions.end(req.authSession.tokenHash);
    this.sessions.setCookie(res, await this.sessions.create(user));
  }
}
