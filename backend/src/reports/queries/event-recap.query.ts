import { Query } from '@nestjs/cqrs';
import type { EventRecapView } from '@shoalbook/shared';

/** GET reports/events/:eventId/recap. Resolves to null when the event is not the crew's. */
export class GetEventRecapQuery extends Query<EventRecapView | null> {
  constructor(
    readonly crewId: string,
    readonly eventId: string,
  ) {
    super();
  }
}
