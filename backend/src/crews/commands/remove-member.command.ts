import { Command } from '@nestjs/cqrs';

/** Remove a member (an owner removing someone, or a member leaving). */
export class RemoveMemberCommand extends Command<void> {
  constructor(
    readonly crewId: string,
    readonly userId: string,
  ) {
    super();
  }
}
