import { Entity, Index, PrimaryKey, Property } from '@mikro-orm/core';

/** Read model: a lake as the reports need it (name, zone, reference point). Written only by the projector. */
@Entity({ tableName: 'rm_lake' })
@Index({ name: 'rm_lake_crew_index', properties: ['crewId'] })
export class RmLake {
  @PrimaryKey({ type: 'uuid' })
  id: string;

  @Property({ type: 'uuid' })
  crewId: string;

  @Property({ type: 'string', length: 120 })
  name: string;

  @Property({ type: 'string', length: 64 })
  timeZone: string;

  /** Reference point, WGS 84 decimal degrees. */
  @Property({ type: 'double' })
  lat: number;

  @Property({ type: 'double' })
  lon: number;
}
