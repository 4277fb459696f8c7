import { Entity, ManyToOne, PrimaryKey, Property, OptionalProps } from '@mikro-orm/core';
import { User } from '../users/user.entity';

/**
 * A signed-in browser. The cookie carries a random 256-bit token; only its SHA-256 is stored, so a
 * leaked table does not hand out sessions.
 */
@Entity({ tableName: 'sessions' })
export class Session {
  [OptionalProps]?: 'createdAt' | 'lastSeenAt';

  /** Hex SHA-256 of the cookie's token. */
  @PrimaryKey({ type: 'string', length: 64 })
  tokenHash: string;

  @ManyToOne({ entity: () => User, deleteRule: 'cascade' })
  user: User;

  @Property({ type: 'datetime', length: 3 })
  createdAt: Date = new Date();

  /** Moves forward as the session is used; the idle lifetime counts from here. */
  @Property({ type: 'datetime', length: 3 })
  lastSeenAt: Date = new Date();

  /** The absolute end, however active the session is. */
  @Property({ type: 'datetime', length: 3 })
  expiresAt: Date;
}
