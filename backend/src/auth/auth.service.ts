import { EntityManager } from '@mikro-orm/mariadb';
import { HttpStatus, Injectable } from '@nestjs/common';
import { AppConfig } from '../config/app-config.service';
import { BackgroundWork } from '../common/background-work';
import { ApiException, ErrorCode, fieldError } from '../common/errors/api-errors';
import { hashToken, randomToken } from '../common/tokens';
import { MailService } from '../mail/mail.service';
import { passwordResetMail } from '../mail/templates/password-reset.template';
import { decoyHash, hashPassword, verifyPassword } from '../users/passwords/password-hasher';
import { passwordProblem } from '../users/passwords/password-policy';
import { canonicalEmail } from '../common/canonical-email';
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
  constructor(
    private readonly em: EntityManager,
    private readonly users: UsersService,
    private readonly sessions: SessionsService,
    private readonly mail: MailService,
    private readonly config: AppConfig,
    private readonly background: BackgroundWork,
  ) {}

  /** Check the credentials; the same answer and the same work whether the e-mail is unknown, disabled or wrong. */
  async signIn(email: string, password: string): Promise<User> {
    const user = await this.users.findByEmail(email);
    const ok = await verifyPassword(user?.passwordHash ?? (await decoyHash()), password);
    // A disabled account answers like a wrong password, so the answer does not tell that the account exists.
    if (!user || !ok || user.disabled)
      throw new ApiException(HttpStatus.UNAUTHORIZED, WRONG_CREDENTIALS, ErrorCode.wrongCredentials);
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
   * E-mail a reset link if the account exists. Runs after the request has been answered (BackgroundWork), so
   * the answer is the same and takes as long whether or not the address has an account.
   */
  requestPasswordReset(email: string): void {
    this.background.run('password-reset request', () => this.sendResetLink(email));
  }

  private async sendResetLink(email: string): Promise<void> {
    const em = this.em.fork();
    const user = await em.findOne(User, { email: canonicalEmail(email) });
    if (!user || user.disabled) return;
    const token = randomToken(32);
    em.create(AuthToken, {
      tokenHash: hashToken(token),
      purpose: 'password_reset',
      user,
      expiresAt: new Date(Date.now() + RESET_TOKEN_MINUTES * 60_000),
    });
    await em.flush();
    const link = `${this.config.appUrl}/reset-password?token=${encodeURIComponent(token)}`;
    const message = passwordResetMail({ displayName: user.displayName, link, validMinutes: RESET_TOKEN_MINUTES });
    await this.mail.send(user.email, message);
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
