import { randomUUID } from 'node:crypto';
import { Entity, OptionalProps, PrimaryKey, Property, Unique } from '@mikro-orm/core';

/** One practice (pre-fishing) day of an event; created from the event's practice dates. */
@Entity({ tableName: 'practice_days' })
@Unique({ name: 'practice_days_event_date_unique', properties: ['eventId', 'date'] })
export class PracticeDay {
  [OptionalProps]?: 'notes' | 'waterTempF' | 'waterTempValue' | 'waterTempUnit' | 'version';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'uuid', index: 'practice_days_crew_index' })
  crewId: string;

  @Property({ type: 'uuid' })
  eventId: string;

  /** Lake-local date YYYY-MM-DD. */
  @Property({ type: 'string', columnType: 'char(10)' })
  date: string;

  @Property({ type: 'text' })
  notes: string = '';

  @Property({ type: 'double', nullable: true })
  waterTempF: number | null = null;

  @Property({ type: 'double', nullable: true })
  waterTempValue: number | null = null;

  @Property({ type: 'string', length: 2, nullable: true })
  waterTempUnit: string | null = null;

  @Property({ type: 'integer', version: true })
  version: number = 1;
}
