import { Command } from '@nestjs/cqrs';
import type { CrewRole, InviteView } from '@shoalbook/shared';

/** Invite an e-mail address into a crew and send the link. */
export class CreateInviteCommand extends Command<InviteView> {
  constructor(
    readonly crewId: string,
    readonly invitedByUserId: string,
    readonly email: string,
    readonly role: CrewRole,
  ) {
    super();
  }
}
