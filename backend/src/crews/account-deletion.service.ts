import { LockMode } from '@mikro-orm/core';
import { HttpStatus, Injectable } from '@nestjs/common';
import { ApiException, ErrorCode, fieldError } from '../common/errors/api-errors';
import { CrewRemovalService } from './crew-removal.service';
import { Membership } from './membership.entity';
import { verifyPassword } from '../users/passwords/password-hasher';
import { User } from '../users/user.entity';

/**
 * Deleting one's own account: the user row goes, and with it (foreign keys, ON DELETE CASCADE) every
 * membership, session, reset token and invite the user sent. Crews where the user is the only member
 * go too, with all their data. Journal events and photos in other crews keep only the user's id, which
 * then names nobody.
 */
@Injectable()
export class AccountDeletionService {
  constructor(private readonly removal: CrewRemovalService) {}

  /** @throws 400 wrong_password; 409 last_owner when a crew with other members would be left without an owner */
  async deleteAccount(user: User, password: string): Promise<void> {
    if (!(await verifyPassword(user.passwordHash, password)))
      throw fieldError('password', 'The password is wrong.', ErrorCode.wrongPassword);
    await this.removal.run(async (tx, purge) => {
      const memberships = await tx.find(
        Membership,
        { user: user.id },
        { populate: ['crew'], lockMode: LockMode.PESSIMISTIC_WRITE },
      );
      const aloneIn: string[] = [];
      const lastOwnerOf: string[] = [];
      for (const m of memberships) {
        const others = await tx.find(
          Membership,
          { crew: m.crew.id, user: { $ne: user.id } },
          { lockMode: LockMode.PESSIMISTIC_WRITE },
        );
        if (others.length === 0) aloneIn.push(m.crew.id);
        else if (m.role === 'owner' && !others.some((o) => o.role === 'owner')) lastOwnerOf.push(m.crew.name);
      }
      if (lastOwnerOf.length) {
        const names = lastOwnerOf.map((n) => `“${n}”`).join(', ');
        throw new ApiException(
          HttpStatus.CONFLICT,
          `You are the last owner of ${names}. Make another member an owner, or delete the crew, first.`,
          ErrorCode.lastOwner,
        );
      }
      for (const crewId of aloneIn) await purge(crewId);
      await tx.nativeDelete(User, { id: user.id });
    });
  }
}
