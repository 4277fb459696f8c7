import type { IEvent } from '@nestjs/cqrs';
import type { JournalEventType } from '@shoalbook/shared';

/** Summary of one committed change, as published on the EventBus. */
export interface AppendedJournalEvent {
  type: JournalEventType;
  aggregateType: string;
  aggregateId: string;
}

/**
 * Published on the EventBus after a command's transaction has committed, once per transaction. It is a
 * wake-up call: projections read the journal_event table in seq order from their checkpoint, so a
 * lost publication (a crash after commit) loses nothing.
 */
export class JournalEventsAppended implements IEvent {
  constructor(
    readonly crewId: string,
    readonly events: readonly AppendedJournalEvent[],
  ) {}
}
