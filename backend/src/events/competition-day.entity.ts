import { randomUUID } from 'node:crypto';
import { Entity, OptionalProps, PrimaryKey, Property, Unique } from '@mikro-orm/core';

/** One competition day of an event; created from the event's competition dates. */
@Entity({ tableName: 'competition_days' })
@Unique({ name: 'competition_days_event_date_unique', properties: ['eventId', 'date'] })
export class CompetitionDay {
  [OptionalProps]?:
    'startTime' | 'checkInTime' | 'weatherNotes' | 'waterTempF' | 'waterTempValue' | 'waterTempUnit' | 'version';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'uuid', index: 'competition_days_crew_index' })
  crewId: string;

  @Property({ type: 'uuid' })
  eventId: string;

  /** Lake-local date YYYY-MM-DD. */
  @Property({ type: 'string', columnType: 'char(10)' })
  date: string;

  /** Lake-local "HH:MM". */
  @Property({ type: 'string', columnType: 'char(5)', nullable: true })
  startTime: string | null = null;

  @Property({ type: 'string', columnType: 'char(5)', nullable: true })
  checkInTime: string | null = null;

  @Property({ type: 'text' })
  weatherNotes: string = '';

  @Property({ type: 'double', nullable: true })
  waterTempF: number | null = null;

  @Property({ type: 'double', nullable: true })
  waterTempValue: number | null = null;

  @Property({ type: 'string', length: 2, nullable: true })
  waterTempUnit: string | null = null;

  @Property({ type: 'integer', version: true })
  version: number = 1;
}
