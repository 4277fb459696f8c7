import { Entity, Index, PrimaryKey, Property } from '@mikro-orm/core';
import type { FindKind } from '@shoalbook/shared';

/** Read model: the fields of a find the reports group and plot by. */
@Entity({ tableName: 'rm_find' })
@Index({ name: 'rm_find_crew_lake_index', properties: ['crewId', 'lakeId'] })
@Index({ name: 'rm_find_crew_event_index', properties: ['crewId', 'eventId'] })
export class RmFind {
  @PrimaryKey({ type: 'uuid' })
  id: string;

  @Property({ type: 'uuid' })
  crewId: string;

  @Property({ type: 'uuid' })
  lakeId: string;

  @Property({ type: 'uuid', nullable: true })
  eventId: string | null = null;

  @Property({ type: 'string', length: 120 })
  name: string;

  @Property({ type: 'string', length: 20 })
  kind: FindKind;

  @Property({ type: 'string', length: 40 })
  subKind: string = '';

  @Property({ type: 'double', nullable: true })
  depthFt: number | null = null;

  @Property({ type: 'tinyint', nullable: true })
  hardness: number | null = null;

  @Property({ type: 'double', nullable: true })
  waterTempF: number | null = null;

  @Property({ type: 'double' })
  lat: number;

  @Property({ type: 'double' })
  lon: number;
}
