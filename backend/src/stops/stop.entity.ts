import { randomUUID } from 'node:crypto';
import { Entity, Index, OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';

/**
 * A stop (visit) on a competition day: the angler fished at a find, or at a position with no find, from
 * `arrivedAt` to `leftAt` (null while still there). A stop with no fish is a record in its own right:
 * "fished, no bite" is what makes a find count as fished.
 */
@Entity({ tableName: 'stops' })
@Index({ name: 'stops_crew_day_index', properties: ['crewId', 'competitionDayId', 'arrivedAt'] })
@Index({ name: 'stops_crew_event_index', properties: ['crewId', 'eventId'] })
@Index({ name: 'stops_find_index', properties: ['findId'] })
export class Stop {
  [OptionalProps]?:
    | 'findId'
    | 'lat'
    | 'lon'
    | 'leftAt'
    | 'waterTempF'
    | 'lure'
    | 'technique'
    | 'notes'
    | 'loggedById'
    | 'version'
    | 'createdAt'
    | 'updatedAt';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'uuid' })
  crewId: string;

  @Property({ type: 'uuid' })
  eventId: string;

  @Property({ type: 'uuid' })
  competitionDayId: string;

  @Property({ type: 'uuid', nullable: true })
  findId: string | null = null;

  @Property({ type: 'double', nullable: true })
  lat: number | null = null;

  @Property({ type: 'double', nullable: true })
  lon: number | null = null;

  @Property({ type: 'datetime', length: 3 })
  arrivedAt: Date;

  @Property({ type: 'datetime', length: 3, nullable: true })
  leftAt: Date | null = null;

  @Property({ type: 'double', nullable: true })
  waterTempF: number | null = null;

  @Property({ type: 'string', length: 120 })
  lure: string = '';

  @Property({ type: 'string', length: 120 })
  technique: string = '';

  @Property({ type: 'text' })
  notes: string = '';

  /** The crew member who logged it: the stop's angler (stops of one angler may not overlap). */
  @Property({ type: 'uuid', nullable: true })
  loggedById: string | null = null;

  @Property({ type: 'integer', version: true })
  version: number = 1;

  @Property({ type: 'datetime', length: 3 })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', length: 3, onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}
