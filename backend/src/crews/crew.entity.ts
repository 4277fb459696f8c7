import { randomUUID } from 'node:crypto';
import { Entity, PrimaryKey, Property, OptionalProps } from '@mikro-orm/core';

/** The unit of sharing: a crew's journal is visible to its members only. */
@Entity({ tableName: 'crews' })
export class Crew {
  [OptionalProps]?: 'viewersSeePositions' | 'createdAt' | 'updatedAt';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'string', length: 80 })
  name: string;

  /** Whether viewers (coach, sponsor) see exact positions; off unless an owner turns it on. */
  @Property({ type: 'boolean', default: false })
  viewersSeePositions: boolean = false;

  @Property({ type: 'datetime', length: 3 })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', length: 3, onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}
