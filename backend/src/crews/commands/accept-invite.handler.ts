import { EntityManager } from '@mikro-orm/mariadb';
import { HttpStatus } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { ApiException, ErrorCode } from '../../common/errors/api-errors';
import { hashToken } from '../../common/tokens';
import { User } from '../../users/user.entity';
import { Invite } from '../invite.entity';
import { Membership } from '../membership.entity';
import { AcceptInviteCommand } from './accept-invite.command';

export function inviteInvalid(status: HttpStatus = HttpStatus.NOT_FOUND): ApiException {
  return new ApiException(
    status,
    'This invite link is not valid any more. Ask the crew’s owner for a new one.',
    ErrorCode.tokenInvalid,
  );
}

/** The usable invite for a token (pending and not expired), or null. */
export async function findUsableInvite(em: EntityManager, token: string): Promise<Invite | null> {
  const invite = await em.findOne(Invite, { tokenHash: hashToken(token), acceptedAt: null }, { populate: ['crew'] });
  return invite && invite.expiresAt.getTime() > Date.now() ? invite : null;
}

@CommandHandler(AcceptInviteCommand)
export class AcceptInviteHandler implements ICommandHandler<AcceptInviteCommand> {
  constructor(private readonly em: EntityManager) {}

  execute({ token, userId, userEmail }: AcceptInviteCommand): Promise<{ crewId: string }> {
    return this.em.transactional(async (em) => {
      const invite = await findUsableInvite(em, token);
      if (!invite) throw inviteInvalid(HttpStatus.BAD_REQUEST);
      // The link is bound to the address it was sent to: a forwarded link does not let someone else in.
      if (invite.email !== userEmail) {
        throw new ApiException(
          HttpStatus.FORBIDDEN,
          `This invite was sent to ${invite.email}. Sign in with that address to accept it.`,
          ErrorCode.inviteEmailMismatch,
        );
      }
      const crewId = invite.crew.id;
      if (await em.count(Membership, { crew: crewId, user: userId })) {
        throw new ApiException(HttpStatus.CONFLICT, 'You are already a member of this crew.', ErrorCode.alreadyMember);
      }
      const claimed = await em.nativeUpdate(
        Invite,
        { id: invite.id, acceptedAt: null },
        { acceptedAt: new Date(), acceptedBy: userId },
      );
      if (claimed !== 1) throw inviteInvalid(HttpStatus.BAD_REQUEST);
      em.create(Membership, { crew: invite.crew, user: em.getReference(User, userId), role: invite.role });
      await em.flush();
      return { crewId };
    });
  }
}
