import { Command } from '@nestjs/cqrs';
import type { CrewRole, MemberView } from '@shoalbook/shared';

export class ChangeMemberRoleCommand extends Command<MemberView> {
  constructor(
    readonly crewId: string,
    readonly userId: string,
    readonly role: CrewRole,
  ) {
    super();
  }
}
