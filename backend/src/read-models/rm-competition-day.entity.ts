import { Entity, Index, PrimaryKey, Property } from '@mikro-orm/core';

/** Read model: a competition day with its official weigh-in figures (null until recorded). */
@Entity({ tableName: 'rm_competition_day' })
@Index({ name: 'rm_competition_day_event_index', properties: ['eventId'] })
export class RmCompetitionDay {
  @PrimaryKey({ type: 'uuid' })
  id: string;

  @Property({ type: 'uuid' })
  crewId: string;

  @Property({ type: 'uuid' })
  eventId: string;

  /** Lake-local YYYY-MM-DD. */
  @Property({ type: 'string', columnType: 'char(10)' })
  date: string;

  @Property({ type: 'boolean' })
  hasOfficial: boolean = false;

  @Property({ type: 'double', nullable: true })
  officialGrossLb: number | null = null;

  @Property({ type: 'double', nullable: true })
  officialPenaltyLb: number | null = null;

  @Property({ type: 'double', nullable: true })
  officialLb: number | null = null;

  @Property({ type: 'integer', nullable: true })
  dayPlace: number | null = null;

  @Property({ type: 'integer', nullable: true })
  lateMinutes: number | null = null;

  /** The field from the results sheet: its size, the winning and the cut weight (lb). */
  @Property({ type: 'integer', nullable: true })
  fieldSize: number | null = null;

  @Property({ type: 'double', nullable: true })
  winningLb: number | null = null;

  @Property({ type: 'double', nullable: true })
  cutLb: number | null = null;
}
