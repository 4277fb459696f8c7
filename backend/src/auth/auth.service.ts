import { EntityManager } from '@mikro-orm/mariadb';
import { HttpStatus, Injectable, Logger } from '@nestjs/common';
import { AppConfig } from '../config/app-config.service';
import { ApiException, ErrorCode, fieldError } from '../common/errors/api-errors';
import { hashToken, randomToken } from '../common/tokens';
import { MailService } from '../mail/mail.service';
import { passwordResetMail } from '../mail/templates/password-reset.template';
import { decoyHash, hashPassword, verifyPassword } from '../users/passwords/password-hasher';
import { passwordProblem } from '../users/passwords/password-policy';
import { User } from '../users/user.entity';
import { UsersService } from '../users/users.service';
import { AuthToken } from './auth-token.entity';
import { SessionsService } from './sessions.service';

/** Reset links live 30 minutes (OWASP Forgot Password cheat sheet: short-lived, single use). */
export const RESET_TOKEN_MINUTES = 30;

export const WRONG_CREDENTIALS = 'E-mail or password is wrong.';

/** Sign-in and passwords. Sign-up is a command (SignUpCommand). */
@Injectable()
export class AuthService {
  private readonly logger = new Logger(AuthService.name);

  constructor(
    private readonly em: EntityManager,
    private readonly users: UsersService,
    private readonly sessions: SessionsService,
    private readonly mail: MailService,
    private readonly config: AppConfig,
  ) {}

  /** Check the credentials; the same answer and the same work whether or not the e-mail exists. */
  async signIn(email: string, password: string): Promise<User> {
    const user = await this.users.findByEmail(email);
    const ok = await verifyPassword(user?.passwordHash ?? (await decoyHash()), password);
    if (!user || !ok) throw new ApiException(HttpStatus.UNAUTHORIZED, WRONG_CREDENTIALS, ErrorCode.wrongCredentials);
    if (user.disabled)
      throw new ApiException(
        HttpStatus.FORBIDDEN,
        'This account is disabled. Ask the site admin.',
        ErrorCode.accountDisabled,
      );
    return user;
  }

  /** Change the password and end the user's other sessions (the current one stays signed in). */
  async changePassword(
    user: User,
    currentTokenHash: string,
    currentPassword: string,
    newPassword: string,
  ): Promise<void> {
    if (!(await verifyPassword(user.passwordHash, currentPassword)))
      throw fieldError('currentPassword', 'The current password is wrong.', ErrorCode.wrongPassword);
    const problem = passwordProblem(newPassword, { email: user.email });
    if (problem) throw fieldError('newPassword', problem);
    const passwordHash = await hashPassword(newPassword);
    await this.em.transactional(async (em) => {
      await em.nativeUpdate(User, { id: user.id }, { passwordHash });
      await this.sessions.endAllFor(user.id, currentTokenHash, em);
    });
    user.passwordHash = passwordHash;
  }

  /**
   * E-mail a reset link if the account exists. The caller answers the same either way, and the mail is
   * sent in the background so that the answer's timing does not tell either.
   */
  async requestPasswordReset(email: string): Promise<void> {
    const user = await this.users.findByEmail(email);
    if (!user || user.disabled) return;
    const token = randomToken(32);
    this.em.create(AuthToken, {
      tokenHash: hashToken(token),
      purpose: 'password_reset',
      user,
      expiresAt: new Date(Date.now() + RESET_TOKEN_MINUTES * 60_000),
    });
    await this.em.flush();
    const link = `${this.config.appUrl}/reset-password?token=${encodeURIComponent(token)}`;
    const message = passwordResetMail({ displayName: user.displayName, link, validMinutes: RESET_TOKEN_MINUTES });
    this.mail
      .send(user.email, message)
      .catch((e: unknown) =>
        this.logger.error(`password-reset e-mail failed: ${e instanceof Error ? e.message : String(e)}`),
      );
  }

  /** Use a reset token once: set the password, end every session, void the user's other reset links. */
  async confirmPasswordReset(token: string, password: string): Promise<void> {
    const invalid = () =>
      new ApiException(
        HttpStatus.BAD_REQUEST,
        'This reset link is not valid any more. Ask for a new one.',
        ErrorCode.tokenInvalid,
      );
    const found = await this.em.findOne(
      AuthToken,
      { tokenHash: hashToken(token), purpose: 'password_reset' },
      { populate: ['user'] },
    );
    if (!found || found.usedAt || found.expiresAt.getTime() <= Date.now() || found.user.disabled) throw invalid();
    const problem = passwordProblem(password, { email: found.user.email });
    if (problem) throw fieldError('password', problem);
    const passwordHash = await hashPassword(password);
    await this.em.transactional(async (em) => {
      // The conditional update makes the token single-use even when two requests race.
      const claimed = await em.nativeUpdate(AuthToken, { id: found.id, usedAt: null }, { usedAt: new Date() });
      if (claimed !== 1) throw invalid();
      await em.nativeUpdate(
        AuthToken,
        { user: found.user.id, purpose: 'password_reset', usedAt: null },
        { usedAt: new Date() },
      );
      await em.nativeUpdate(User, { id: found.user.id }, { passwordHash });
      await this.sessions.endAllFor(found.user.id, undefined, em);
    });
  }
}
