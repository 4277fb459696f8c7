import { randomUUID } from 'node:crypto';
import { Entity, Enum, Index, PrimaryKey, Property, OptionalProps } from '@mikro-orm/core';
import { DEFAULT_UNITS, SITE_ROLES, type SiteRole, type UnitPreferences } from '@shoalbook/shared';

/**
 * An account. The e-mail address is stored in its canonical form (canonicalEmail) in a binary-collated column (utf8mb4_bin, set by Migration20270102000000; MikroORM 6 has no collation option):
 * uniqueness and lookups compare that form exactly, without the server collation's accent folding.
 */
@Entity({ tableName: 'users' })
export class User {
  [OptionalProps]?: 'siteRole' | 'disabled' | 'units' | 'createdAt' | 'updatedAt' | 'signUpAttemptedAt';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'string', length: 254, unique: 'users_email_unique' })
  email: string;

  @Property({ type: 'string', length: 80 })
  displayName: string;

  /** argon2id PHC string (carries its own salt and parameters). */
  @Property({ type: 'string', length: 255, hidden: true })
  passwordHash: string;

  @Enum({ items: [...SITE_ROLES], default: 'user' })
  siteRole: SiteRole = 'user';

  @Property({ type: 'boolean', default: false })
  disabled: boolean = false;

  @Property({ type: 'json' })
  units: UnitPreferences = { ...DEFAULT_UNITS };

  @Index({ name: 'users_created_at_index' })
  @Property({ type: 'datetime', length: 3 })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', length: 3, onUpdate: () => new Date() })
  updatedAt: Date = new Date();

  /**
   * When someone last tried to sign up with this (taken) address. It paces the "account exists" e-mail to
   * one an hour, and writing it gives a taken address the same kind of database work as a free one's INSERT.
   */
  @Property({ type: 'datetime', length: 3, nullable: true })
  signUpAttemptedAt: Date | null = null;
}
