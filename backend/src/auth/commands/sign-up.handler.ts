import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/mariadb';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { BackgroundWork } from '../../common/background-work';
import { fieldError } from '../../common/errors/api-errors';
import { AppConfig } from '../../config/app-config.service';
import { MailService } from '../../mail/mail.service';
import { accountExistsMail, welcomeMail } from '../../mail/templates/sign-up.template';
import { hashPassword } from '../../users/passwords/password-hasher';
import { passwordProblem } from '../../users/passwords/password-policy';
import { User } from '../../users/user.entity';
import { SignUpCommand } from './sign-up.command';

/**
 * At most one "account exists" e-mail an hour to an address, however often someone tries it, so probing the
 * sign-up form cannot flood the owner's inbox (anti-automation: OWASP ASVS 4.0.3 V11.1.4, recalled from memory).
 */
export const ACCOUNT_EXISTS_MAIL_INTERVAL_MS = 60 * 60 * 1000;

@CommandHandler(SignUpCommand)
export class SignUpHandler implements ICommandHandler<SignUpCommand> {
  constructor(
    private readonly em: EntityManager,
    private readonly mail: MailService,
    private readonly config: AppConfig,
    private readonly background: BackgroundWork,
  ) {}

  async execute({ email, password, displayName }: SignUpCommand): Promise<void> {
    const problem = passwordProblem(password, { email });
    if (problem) throw fieldError('password', problem);
    // Hashed for a taken address too, so both answers cost the same.
    const passwordHash = await hashPassword(password);
    const existing = await this.em.findOne(User, { email });
    if (existing) return this.recordAttempt(existing);
    const user = this.em.create(User, { email, displayName, passwordHash });
    try {
      await this.em.flush();
    } catch (e) {
      // Two sign-ups racing for one address: the unique index decides, and the loser is told like any other.
      if (!(e instanceof UniqueConstraintViolationException)) throw e;
      this.em.clear();
      const winner = await this.em.findOne(User, { email });
      return winner ? this.recordAttempt(winner) : undefined;
    }
    const signInLink = `${this.config.appUrl}/sign-in`;
    this.background.run('welcome e-mail', () =>
      this.mail.send(user.email, welcomeMail({ displayName: user.displayName, signInLink })),
    );
  }

  /**
   * A taken address: note the attempt on the owner's row (one UPDATE, flushed as a free address's INSERT is,
   * so both answers do the same kind of database work: OWASP ASVS 4.0.3 2.2.x / the OWASP Authentication
   * cheat sheet, account enumeration by time), and mail the owner unless someone tried within the hour.
   */
  private async recordAttempt(owner: User): Promise<void> {
    const previous = owner.signUpAttemptedAt;
    const now = new Date();
    owner.signUpAttemptedAt = now;
    await this.em.flush();
    if (previous && now.getTime() - previous.getTime() < ACCOUNT_EXISTS_MAIL_INTERVAL_MS) return;
    this.tellOwner(owner);
  }

  private tellOwner(owner: User): void {
    const { appUrl } = this.config;
    const message = accountExistsMail({
      displayName: owner.displayName,
      signInLink: `${appUrl}/sign-in`,
      resetLink: `${appUrl}/reset-password`,
    });
    this.background.run('account-exists e-mail', () => this.mail.send(owner.email, message));
  }
}
