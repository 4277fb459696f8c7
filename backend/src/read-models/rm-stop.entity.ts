import { Entity, Index, PrimaryKey, Property } from '@mikro-orm/core';

/**
 * Read model: one stop of a competition day with its lake (through the event) and its length in whole seconds
 * (0 while the angler is still there), so time on a find sums exactly in any order.
 */
@Entity({ tableName: 'rm_stop' })
@Index({ name: 'rm_stop_event_index', properties: ['eventId'] })
@Index({ name: 'rm_stop_find_index', properties: ['findId'] })
@Index({ name: 'rm_stop_crew_lake_index', properties: ['crewId', 'lakeId'] })
export class RmStop {
  @PrimaryKey({ type: 'uuid' })
  id: string;

  @Property({ type: 'uuid' })
  crewId: string;

  @Property({ type: 'uuid' })
  lakeId: string;

  @Property({ type: 'uuid' })
  eventId: string;

  @Property({ type: 'uuid' })
  competitionDayId: string;

  @Property({ type: 'uuid', nullable: true })
  findId: string | null = null;

  @Property({ type: 'datetime', length: 3 })
  arrivedAt: Date;

  @Property({ type: 'datetime', length: 3, nullable: true })
  leftAt: Date | null = null;

  @Property({ type: 'integer' })
  seconds: number;
}
