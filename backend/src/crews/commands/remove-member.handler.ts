import { EntityManager } from '@mikro-orm/mariadb';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { Membership } from '../membership.entity';
import { RemoveMemberCommand } from './remove-member.command';
import { assertOwnersRemain, memberOr404 } from './owners-remain';

@CommandHandler(RemoveMemberCommand)
export class RemoveMemberHandler implements ICommandHandler<RemoveMemberCommand> {
  constructor(private readonly em: EntityManager) {}

  async execute({ crewId, userId }: RemoveMemberCommand): Promise<void> {
    await this.em.transactional(async (em) => {
      const member = await memberOr404(em, crewId, userId, true);
      await assertOwnersRemain(em, crewId, member, null);
      await em.nativeDelete(Membership, { id: member.id, crew: crewId });
    });
  }
}
