import { Migration } from '@mikro-orm/migrations';

/**
 * rm_catch_fact's event index also covers what the projector's catch-grouping sums read (solunar period, time
 * of day, fate, weight), so recomputing an event's statistics reads the index alone instead of every catch row.
 */
export class Migration20261221000000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      'alter table `rm_catch_fact` drop index `rm_catch_fact_event_index`, add index `rm_catch_fact_event_groups_index` (`event_id`, `solunar_period`, `time_of_day`, `fate`, `weight_ulb`);',
    );
  }

  override async down(): Promise<void> {
    this.addSql(
      'alter table `rm_catch_fact` drop index `rm_catch_fact_event_groups_index`, add index `rm_catch_fact_event_index` (`event_id`);',
    );
  }
}
