import { randomUUID } from 'node:crypto';
import { Entity, Enum, Index, PrimaryKey, Property, OptionalProps } from '@mikro-orm/core';
import { DEFAULT_UNITS, SITE_ROLES, type SiteRole, type UnitPreferences } from '@shoalbook/shared';

/** An account. E-mail addresses are stored trimmed and lower-cased, so uniqueness ignores case. */
@Entity({ tableName: 'users' })
export class User {
  [OptionalProps]?: 'siteRole' | 'disabled' | 'units' | 'createdAt' | 'updatedAt';

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
}
