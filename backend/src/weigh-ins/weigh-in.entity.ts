import { randomUUID } from 'node:crypto';
import { Entity, OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';

/** The official figures of one competition day, as the organiser announced them (all optional). */
@Entity({ tableName: 'weigh_ins' })
export class WeighIn {
  [OptionalProps]?:
    | 'grossLb'
    | 'penaltyLb'
    | 'officialLb'
    | 'dayPlace'
    | 'lateMinutes'
    | 'fieldSize'
    | 'winningLb'
    | 'cutLb'
    | 'version'
    | 'updatedAt';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'uuid', index: 'weigh_ins_crew_index' })
  crewId: string;

  @Property({ type: 'uuid', unique: 'weigh_ins_competition_day_unique' })
  competitionDayId: string;

  @Property({ type: 'double', nullable: true })
  grossLb: number | null = null;

  @Property({ type: 'double', nullable: true })
  penaltyLb: number | null = null;

  @Property({ type: 'double', nullable: true })
  officialLb: number | null = null;

  @Property({ type: 'integer', nullable: true })
  dayPlace: number | null = null;

  @Property({ type: 'integer', nullable: true })
  lateMinutes: number | null = null;

  /** The day's field from the results sheet. */
  @Property({ type: 'integer', nullable: true })
  fieldSize: number | null = null;

  @Property({ type: 'double', nullable: true })
  winningLb: number | null = null;

  @Property({ type: 'double', nullable: true })
  cutLb: number | null = null;

  @Property({ type: 'integer', version: true })
  version: number = 1;

  @Property({ type: 'datetime', length: 3, onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}
