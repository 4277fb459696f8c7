import { EntityManager } from '@mikro-orm/mariadb';
import { HttpStatus, Logger } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { InviteView } from '@shoalbook/shared';
import { ApiException, ErrorCode } from '../../common/errors/api-errors';
import { hashToken, randomToken } from '../../common/tokens';
import { AppConfig } from '../../config/app-config.service';
import { MailService } from '../../mail/mail.service';
import { inviteMail } from '../../mail/templates/invite.template';
import { User } from '../../users/user.entity';
import { Crew } from '../crew.entity';
import { toInviteView } from '../crew-views';
import { Invite } from '../invite.entity';
import { Membership } from '../membership.entity';
import { CreateInviteCommand } from './create-invite.command';

/** Invite links live 7 days. */
export const INVITE_DAYS = 7;

@CommandHandler(CreateInviteCommand)
export class CreateInviteHandler implements ICommandHandler<CreateInviteCommand> {
  private readonly logger = new Logger(CreateInviteHandler.name);

  constructor(
    private readonly em: EntityManager,
    private readonly mail: MailService,
    private readonly config: AppConfig,
  ) {}

  async execute({ crewId, invitedByUserId, email, role }: CreateInviteCommand): Promise<InviteView> {
    const alreadyMember = await this.em.count(Membership, { crew: crewId, user: { email } });
    if (alreadyMember) {
      throw new ApiException(
        HttpStatus.CONFLICT,
        'This person is already a member of the crew.',
        ErrorCode.alreadyMember,
        { email: ['Already a member.'] },
      );
    }
    const token = randomToken(32);
    const [crew, inviter] = await Promise.all([
      this.em.findOneOrFail(Crew, { id: crewId }),
      this.em.findOneOrFail(User, { id: invitedByUserId }),
    ]);
    const invite = await this.em.transactional(async (em) => {
      // A new invite replaces a pending one to the same address, so only the newest link works.
      await em.nativeDelete(Invite, { crew: crewId, email, acceptedAt: null });
      const created = em.create(Invite, {
        crew,
        email,
        role,
        tokenHash: hashToken(token),
        invitedBy: inviter,
        expiresAt: new Date(Date.now() + INVITE_DAYS * 86_400_000),
      });
      await em.flush();
      const link = `${this.config.appUrl}/invite?token=${encodeURIComponent(token)}`;
      try {
        // Sent inside the transaction: if the mail cannot go, the invite is not kept either.
        await this.mail.send(
          email,
          inviteMail({
            crewName: crew.name,
            inviterName: inviter.displayName,
            role,
            link,
            expiresAt: created.expiresAt,
          }),
        );
      } catch (e) {
        this.logger.error(`invite e-mail failed: ${e instanceof Error ? e.message : String(e)}`);
        throw new ApiException(
          HttpStatus.SERVICE_UNAVAILABLE,
          'The invite e-mail could not be sent. Try again in a moment.',
          ErrorCode.mailFailed,
        );
      }
      return created;
    });
    return toInviteView(invite);
  }
}
