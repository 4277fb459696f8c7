import { Entity, Index, PrimaryKey, Property } from '@mikro-orm/core';
import type { EventRules, Season } from '@shoalbook/shared';

/** Read model: an event with the season and year of its first competition date (lake-local). */
@Entity({ tableName: 'rm_event' })
@Index({ name: 'rm_event_crew_lake_index', properties: ['crewId', 'lakeId'] })
export class RmEvent {
  @PrimaryKey({ type: 'uuid' })
  id: string;

  @Property({ type: 'uuid' })
  crewId: string;

  @Property({ type: 'uuid' })
  lakeId: string;

  @Property({ type: 'string', length: 160 })
  name: string;

  @Property({ type: 'json' })
  practiceDates: string[];

  @Property({ type: 'json' })
  competitionDates: string[];

  /** YYYY-MM-DD, lake-local; null without competition dates. */
  @Property({ type: 'string', columnType: 'char(10)', nullable: true })
  firstDate: string | null = null;

  @Property({ type: 'string', length: 6, nullable: true })
  season: Season | null = null;

  @Property({ type: 'integer', nullable: true })
  year: number | null = null;

  @Property({ type: 'json' })
  rules: EventRules;

  @Property({ type: 'integer', nullable: true })
  finalPlace: number | null = null;

  /** The field from the results sheet: its size, the winning and the cut weight (lb). */
  @Property({ type: 'integer', nullable: true })
  fieldSize: number | null = null;

  @Property({ type: 'double', nullable: true })
  winningLb: number | null = null;

  @Property({ type: 'double', nullable: true })
  cutLb: number | null = null;
}
