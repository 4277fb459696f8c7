import { EntityManager } from '@mikro-orm/mariadb';
import { Injectable } from '@nestjs/common';
import type { RecordChange } from '@shoalbook/shared';
import { User } from '../users/user.entity';
import { JournalEvent } from './journal-event.entity';
import type { JournalChange } from './journal-events.service';
import { figureChanges } from './record-history';

/** Reads a record's history back from the journal (crew-scoped like every read). */
@Injectable()
export class RecordHistoryService {
  constructor(private readonly em: EntityManager) {}

  /** The changes of `fields` of one record of the crew, oldest first; null when the crew's journal never had it. */
  async changes<F extends string>(
    crewId: string,
    aggregateType: JournalChange['aggregateType'],
    aggregateId: string,
    fields: readonly F[],
  ): Promise<RecordChange<F>[] | null> {
    const events = await this.em.find(
      JournalEvent,
      { crewId, aggregateType, aggregateId },
      { orderBy: { seq: 'asc' }, fields: ['payload', 'occurredAt', 'actorId'] },
    );
    if (!events.length) return null;
    const changes = figureChanges(events, fields);
    const actorIds = [...new Set(changes.map((c) => c.actorId).filter((id): id is string => !!id))];
    const users = actorIds.length
      ? await this.em.find(User, { id: { $in: actorIds } }, { fields: ['id', 'displayName'] })
      : [];
    const names = new Map(users.map((u) => [u.id, u.displayName]));
    return changes.map(({ actorId, at, ...change }) => ({
      ...change,
      at: at.toISOString(),
      byName: actorId ? (names.get(actorId) ?? null) : null,
    }));
  }
}
