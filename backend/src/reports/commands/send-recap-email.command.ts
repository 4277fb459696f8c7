import { Command } from '@nestjs/cqrs';
import type { RecapEmailResult } from '@shoalbook/shared';
import type { CrewAccess } from '../../crews/access/request-context';

/** POST reports/events/:eventId/recap-email: send the recap to chosen members of the same crew. */
export class SendRecapEmailCommand extends Command<RecapEmailResult> {
  constructor(
    readonly access: CrewAccess,
    readonly eventId: string,
    readonly userIds: string[],
  ) {
    super();
  }
}
