import { Query } from '@nestjs/cqrs';
import type { EventFindsView } from '@shoalbook/shared';

/** GET reports/events/:eventId/finds: every find of the event with its outcome. Null when not the crew's event. */
export class GetEventFindsQuery extends Query<EventFindsView | null> {
  constructor(
    readonly crewId: string,
    readonly eventId: string,
  ) {
    super();
  }
}
