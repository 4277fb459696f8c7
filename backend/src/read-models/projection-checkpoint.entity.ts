import { Entity, PrimaryKey, Property } from '@mikro-orm/core';

/** How far each projection has applied the journal: updated in the same transaction as its read-model rows. */
@Entity({ tableName: 'projection_checkpoint' })
export class ProjectionCheckpoint {
  @PrimaryKey({ type: 'string', length: 60 })
  name: string;

  /** The last journal_event.seq applied (every seq up to it is applied or was a permanent gap). */
  @Property({ type: 'bigint' })
  lastSeq: number;

  @Property({ type: 'datetime', length: 3 })
  updatedAt: Date;
}
