import { Command } from '@nestjs/cqrs';

/** Use an invite token (once) to join its crew; returns the crew's id. */
export class AcceptInviteCommand extends Command<{ crewId: string }> {
  constructor(
    readonly token: string,
    readonly userId: string,
    readonly userEmail: string,
  ) {
    super();
  }
}
