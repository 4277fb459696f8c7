import { Entity, Index, PrimaryKey, Property } from '@mikro-orm/core';

/**
 * One idempotency key of a journal write, scoped to the crew and the user who sent it. Written in the
 * write's own transaction (see idempotent-write.ts); `statusCode` and `responseBody` are the first answer.
 */
@Entity({ tableName: 'idempotency_keys' })
@Index({ name: 'idempotency_keys_created_index', properties: ['createdAt'] })
export class IdempotencyKey {
  @PrimaryKey({ type: 'uuid' })
  crewId: string;

  @PrimaryKey({ type: 'uuid' })
  userId: string;

  @PrimaryKey({ type: 'string', length: 255, fieldName: 'idem_key' })
  key: string;

  /** SHA-256 (hex) of the method, path and body, to tell a replay from a reuse with another body. */
  @Property({ type: 'string', length: 64, columnType: 'char(64)' })
  fingerprint: string;

  @Property({ type: 'smallint', nullable: true })
  statusCode: number | null = null;

  @Property({ type: 'text', columnType: 'longtext', nullable: true })
  responseBody: string | null = null;

  @Property({ type: 'datetime', length: 3 })
  createdAt: Date = new Date();
}

/** How long a key is honoured (the draft leaves it to the server; 30 days covers a long trip off-grid). */
export const IDEMPOTENCY_KEY_LIFETIME_MS = 30 * 24 * 3_600_000;
