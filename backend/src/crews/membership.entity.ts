import { randomUUID } from 'node:crypto';
import { Entity, Enum, ManyToOne, PrimaryKey, Property, Unique, OptionalProps } from '@mikro-orm/core';
import { CREW_ROLES, type CrewRole } from '@shoalbook/shared';
import { User } from '../users/user.entity';
import { Crew } from './crew.entity';

/** A user's role in one crew; at most one per (crew, user). */
@Entity({ tableName: 'memberships' })
@Unique({ name: 'memberships_crew_user_unique', properties: ['crew', 'user'] })
export class Membership {
  [OptionalProps]?: 'joinedAt';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne({ entity: () => Crew, deleteRule: 'cascade' })
  crew: Crew;

  @ManyToOne({ entity: () => User, deleteRule: 'cascade' })
  user: User;

  @Enum({ items: [...CREW_ROLES] })
  role: CrewRole;

  @Property({ type: 'datetime', length: 3 })
  joinedAt: Date = new Date();
}
