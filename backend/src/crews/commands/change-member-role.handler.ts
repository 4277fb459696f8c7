import { EntityManager } from '@mikro-orm/mariadb';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { MemberView } from '@shoalbook/shared';
import { toMemberView } from '../crew-views';
import { ChangeMemberRoleCommand } from './change-member-role.command';
import { assertOwnersRemain, memberOr404 } from './owners-remain';

@CommandHandler(ChangeMemberRoleCommand)
export class ChangeMemberRoleHandler implements ICommandHandler<ChangeMemberRoleCommand> {
  constructor(private readonly em: EntityManager) {}

  execute({ crewId, userId, role }: ChangeMemberRoleCommand): Promise<MemberView> {
    return this.em.transactional(async (em) => {
      const member = await memberOr404(em, crewId, userId, true);
      await assertOwnersRemain(em, crewId, member, role);
      member.role = role;
      await em.flush();
      return toMemberView(member);
    });
  }
}
