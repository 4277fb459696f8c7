import { randomUUID } from 'node:crypto';
import { Entity, Enum, Index, ManyToOne, PrimaryKey, Property, OptionalProps } from '@mikro-orm/core';
import { CREW_ROLES, type CrewRole } from '@shoalbook/shared';
import { User } from '../users/user.entity';
import { Crew } from './crew.entity';

/** An e-mailed invitation to join a crew: single use, expires after 7 days, only the token's hash kept. */
@Entity({ tableName: 'invites' })
@Index({ name: 'invites_crew_email_index', properties: ['crew', 'email'] })
export class Invite {
  [OptionalProps]?: 'createdAt' | 'acceptedAt' | 'acceptedBy';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne({ entity: () => Crew, deleteRule: 'cascade' })
  crew: Crew;

  /** Canonical form (canonicalEmail), compared exactly like the account's. */
  @Property({ type: 'string', length: 254 })
  email: string;

  @Enum({ items: [...CREW_ROLES] })
  role: CrewRole;

  @Property({ type: 'string', length: 64, unique: 'invites_token_hash_unique' })
  tokenHash: string;

  @ManyToOne({ entity: () => User, deleteRule: 'cascade' })
  invitedBy: User;

  @Property({ type: 'datetime', length: 3 })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', length: 3 })
  expiresAt: Date;

  @Property({ type: 'datetime', length: 3, nullable: true })
  acceptedAt: Date | null = null;

  @ManyToOne({ entity: () => User, nullable: true, deleteRule: 'set null' })
  acceptedBy: User | null = null;
}
