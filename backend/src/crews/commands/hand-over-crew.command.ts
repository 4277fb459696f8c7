import { Command } from '@nestjs/cqrs';
import type { CrewRole, MemberView } from '@shoalbook/shared';

/**
 * One owner hands the crew to another member in one step: the member becomes an owner and the one
 * handing over steps down to `stayAs` (or leaves the crew when `stayAs` is null). Answers the members after it.
 */
export class HandOverCrewCommand extends Command<MemberView[]> {
  constructor(
    readonly crewId: string,
    readonly fromUserId: string,
    readonly toUserId: string,
    readonly stayAs: Exclude<CrewRole, 'owner'> | null,
  ) {
    super();
  }
}
