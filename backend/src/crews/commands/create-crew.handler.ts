import { EntityManager } from '@mikro-orm/mariadb';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { CrewView } from '@shoalbook/shared';
import { User } from '../../users/user.entity';
import { Crew } from '../crew.entity';
import { toCrewView } from '../crew-views';
import { Membership } from '../membership.entity';
import { CreateCrewCommand } from './create-crew.command';

@CommandHandler(CreateCrewCommand)
export class CreateCrewHandler implements ICommandHandler<CreateCrewCommand> {
  constructor(private readonly em: EntityManager) {}

  async execute({ userId, name }: CreateCrewCommand): Promise<CrewView> {
    const crew = this.em.create(Crew, { name });
    this.em.create(Membership, { crew, user: this.em.getReference(User, userId), role: 'owner' });
    await this.em.flush();
    return toCrewView(crew, 'owner');
  }
}
