import { Entity, OptionalProps, Index, PrimaryKey, Property } from '@mikro-orm/core';

/**
 * The append-only journal: one row per change, written in the same transaction as the change itself.
 * The read-model projections consume it in `seq` order. There is no update or delete path for it.
 */
@Entity({ tableName: 'journal_event' })
@Index({ name: 'journal_event_crew_seq_index', properties: ['crewId', 'seq'] })
@Index({ name: 'journal_event_aggregate_index', properties: ['aggregateId'] })
export class JournalEvent {
  [OptionalProps]?: 'seq' | 'actorId' | 'occurredAt';

  @PrimaryKey({ type: 'bigint', autoincrement: true })
  seq: string;

  @Property({ type: 'uuid' })
  crewId: string;

  /** e.g. 'CatchLogged' (see JOURNAL_EVENT_TYPES in @shoalbook/shared). */
  @Property({ type: 'string', length: 40 })
  type: string;

  /** 'lake' | 'event' | 'practiceDay' | 'competitionDay' | 'find' | 'catch' | 'stop' | 'weighIn' | 'photo'. */
  @Property({ type: 'string', length: 20 })
  aggregateType: string;

  @Property({ type: 'uuid' })
  aggregateId: string;

  @Property({ type: 'json' })
  payload: Record<string, unknown>;

  @Property({ type: 'uuid', nullable: true })
  actorId: string | null = null;

  @Property({ type: 'datetime', length: 3 })
  occurredAt: Date = new Date();
}
