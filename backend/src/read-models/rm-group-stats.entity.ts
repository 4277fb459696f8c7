import { Entity, Index, PrimaryKey, Property } from '@mikro-orm/core';

/**
 * Read model: per crew × lake × event × grouping × key, the counts and sums behind the hit rates. For the
 * find groupings the counts are finds (from rm_find_outcome); for the catch groupings (solunarPeriod,
 * timeOfDay) only the fish counts and weights are set. Keys are '' when not recorded.
 */
@Entity({ tableName: 'rm_group_stats' })
@Index({ name: 'rm_group_stats_crew_lake_index', properties: ['crewId', 'lakeId', 'grouping'] })
export class RmGroupStats {
  @PrimaryKey({ type: 'uuid' })
  eventId: string;

  @PrimaryKey({ type: 'string', length: 16 })
  grouping: string;

  @PrimaryKey({ type: 'string', length: 40 })
  groupKey: string;

  @Property({ type: 'uuid' })
  crewId: string;

  @Property({ type: 'uuid' })
  lakeId: string;

  @Property({ type: 'integer' })
  finds: number;

  @Property({ type: 'integer' })
  findsFished: number;

  @Property({ type: 'integer' })
  findsProducing: number;

  @Property({ type: 'integer' })
  findsWeighed: number;

  @Property({ type: 'integer' })
  fishCount: number;

  @Property({ type: 'integer' })
  weighedCount: number;

  @Property({ type: 'bigint' })
  weightUlb: number;

  @Property({ type: 'bigint' })
  weighedWeightUlb: number;

  /** Time on the group's finds (whole seconds over their stops; 0 for the catch groupings). */
  @Property({ type: 'bigint' })
  secondsFished: number = 0;
}
