import { randomUUID } from 'node:crypto';
import { Entity, OptionalProps, Index, PrimaryKey, Property } from '@mikro-orm/core';

/** A lake or reservoir a crew fishes; its time zone decides the local days of its events. */
@Entity({ tableName: 'lakes' })
@Index({ name: 'lakes_crew_name_index', properties: ['crewId', 'name'] })
export class Lake {
  [OptionalProps]?: 'region' | 'areaAcres' | 'notes' | 'version' | 'createdAt' | 'updatedAt';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'uuid' })
  crewId: string;

  @Property({ type: 'string', length: 120 })
  name: string;

  @Property({ type: 'string', length: 120 })
  region: string = '';

  /** IANA zone, e.g. "America/Chicago". */
  @Property({ type: 'string', length: 64 })
  timeZone: string;

  /** Reference point, WGS 84 decimal degrees. */
  @Property({ type: 'double' })
  lat: number;

  @Property({ type: 'double' })
  lon: number;

  @Property({ type: 'double', nullable: true })
  areaAcres: number | null = null;

  @Property({ type: 'text' })
  notes: string = '';

  /** Optimistic lock: MikroORM checks it on every update. */
  @Property({ type: 'integer', version: true })
  version: number = 1;

  @Property({ type: 'datetime', length: 3 })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', length: 3, onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}
