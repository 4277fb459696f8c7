import { randomUUID } from 'node:crypto';
import { Entity, Enum, ManyToOne, PrimaryKey, Property, OptionalProps } from '@mikro-orm/core';
import { User } from '../users/user.entity';

/** What a one-time token may be used for; a token is only ever accepted for its own purpose. */
export const AUTH_TOKEN_PURPOSES = ['password_reset'] as const;
export type AuthTokenPurpose = (typeof AUTH_TOKEN_PURPOSES)[number];

/** A single-use token e-mailed to an account (password reset). Only its SHA-256 is stored. */
@Entity({ tableName: 'auth_tokens' })
export class AuthToken {
  [OptionalProps]?: 'createdAt' | 'usedAt';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'string', length: 64, unique: 'auth_tokens_token_hash_unique' })
  tokenHash: string;

  @Enum({ items: [...AUTH_TOKEN_PURPOSES] })
  purpose: AuthTokenPurpose;

  @ManyToOne({ entity: () => User, deleteRule: 'cascade' })
  user: User;

  @Property({ type: 'datetime', length: 3 })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', length: 3 })
  expiresAt: Date;

  @Property({ type: 'datetime', length: 3, nullable: true })
  usedAt: Date | null = null;
}
