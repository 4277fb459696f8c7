import { EntityManager } from '@mikro-orm/mariadb';
import { Injectable } from '@nestjs/common';
import { EventBus } from '@nestjs/cqrs';
import type { JournalEventType } from '@shoalbook/shared';
import { idempotencyScope } from '../idempotency/idempotency-scope';
import { claimIdempotencyKey, storeIdempotentAnswer } from '../idempotency/idempotent-write';
import { JournalEvent } from './journal-event.entity';
import { type AppendedJournalEvent, JournalEventsAppended } from './journal-events-appended.event';

/** What a command records about one change. */
export interface JournalChange {
  type: JournalEventType;
  aggregateType: 'lake' | 'event' | 'practiceDay' | 'competitionDay' | 'find' | 'catch' | 'stop' | 'weighIn' | 'photo';
  aggregateId: string;
  /** The record's full new state, or `{ id }` for a deletion. */
  payload: Record<string, unknown>;
}

/** Collects a transaction's journal events; bulk rows go out in multi-row INSERTs. */
export class JournalRecorder {
  readonly appended: AppendedJournalEvent[] = [];
  private readonly pending: JournalChange[] = [];

  constructor(
    private readonly em: EntityManager,
    private readonly crewId: string,
    private readonly actorId: string | null,
  ) {}

  /** Queue one event; written after the command's work, in the same transaction. */
  record(change: JournalChange): void {
    this.pending.push(change);
  }

  /** Rewrite the payloads of queued events of one type (e.g. to add an aggregate's parts) before they are written. */
  replacePayloads(
    type: JournalChange['type'],
    rewrite: (aggregateId: string, payload: Record<string, unknown>) => Record<string, unknown>,
  ): void {
    for (const c of this.pending) if (c.type === type) c.payload = rewrite(c.aggregateId, c.payload);
  }

  /** Write the queued events with multi-row INSERTs (1,000 rows a statement) inside the transaction. */
  async writePending(): Promise<void> {
    const occurredAt = new Date();
    for (let i = 0; i < this.pending.length; i += JournalRecorder.CHUNK) {
      const chunk = this.pending.slice(i, i + JournalRecorder.CHUNK);
      await this.em.insertMany(
        JournalEvent,
        chunk.map((c) => ({
          crewId: this.crewId,
          type: c.type,
          aggregateType: c.aggregateType,
          aggregateId: c.aggregateId,
          payload: c.payload,
          actorId: this.actorId,
          occurredAt,
        })),
      );
    }
    this.appended.push(
      ...this.pending.map(({ type, aggregateType, aggregateId }) => ({ type, aggregateType, aggregateId })),
    );
    this.pending.length = 0;
  }

  static readonly CHUNK = 1000;
}

/**
 * The one way journal changes are written: the command's work and its journal_event rows commit in the
 * same transaction, and the EventBus hears of them only after the commit. There is deliberately no
 * method to change or remove a journal event.
 */
@Injectable()
export class JournalEventsService {
  constructor(
    private readonly em: EntityManager,
    private readonly eventBus: EventBus,
  ) {}

  /**
   * Run `work` in a transaction with a recorder. Entities persisted on `tx` are flushed first, then the
   * recorded events are inserted, then the transaction commits; on any error nothing is written. When the
   * request carries an Idempotency-Key, its first transaction claims the key before the work and stores the
   * answer after it, so the key, the write and its events commit together or not at all.
   */
  async transaction<T>(
    crewId: string,
    actorId: string | null,
    work: (tx: EntityManager, journal: JournalRecorder) => Promise<T>,
  ): Promise<T> {
    let recorder!: JournalRecorder;
    const idempotent = idempotencyScope.getStore();
    const claimsKey = !!idempotent && !idempotent.claimed && idempotent.crewId === crewId;
    if (claimsKey) idempotent.claimed = true;
    const result = await this.em.transactional(async (tx) => {
      if (claimsKey) await claimIdempotencyKey(tx, idempotent);
      recorder = new JournalRecorder(tx, crewId, actorId);
      const value = await work(tx, recorder);
      await tx.flush();
      await recorder.writePending();
      if (claimsKey) await storeIdempotentAnswer(tx, idempotent, value);
      return value;
    });
    if (recorder.appended.length) this.eventBus.publish(new JournalEventsAppended(crewId, recorder.appended));
    return result;
  }
}
