import { EntityManager } from '@mikro-orm/mariadb';
import { HttpStatus } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { MemberView } from '@shoalbook/shared';
import { ApiException } from '../../common/errors/api-errors';
import { CrewsService } from '../crews.service';
import { HandOverCrewCommand } from './hand-over-crew.command';
import { memberOr404 } from './owners-remain';

@CommandHandler(HandOverCrewCommand)
export class HandOverCrewHandler implements ICommandHandler<HandOverCrewCommand> {
  constructor(
    private readonly em: EntityManager,
    private readonly crews: CrewsService,
  ) {}

  async execute({ crewId, fromUserId, toUserId, stayAs }: HandOverCrewCommand): Promise<MemberView[]> {
    if (toUserId === fromUserId)
      throw new ApiException(
        HttpStatus.BAD_REQUEST,
        'Choose another member to hand the crew to.',
        'validation_failed',
        {
          userId: ['Choose another member to hand the crew to.'],
        },
      );
    await this.em.transactional(async (em) => {
      // Both rows locked: a second hand-over or a role change at the same moment waits for this one.
      const from = await memberOr404(em, crewId, fromUserId, true);
      const to = await memberOr404(em, crewId, toUserId, true);
      to.role = 'owner';
      if (stayAs) from.role = stayAs;
      else em.remove(from);
      await em.flush();
    });
    return this.crews.members(crewId);
  }
}
