import { Migration } from '@mikro-orm/migrations';

/**
 * One bag rule, official figures and field context: the event's format (team or individual) and field (size,
 * winning and cut weight), the day's field beside its official figures, who logged each catch; in the read
 * models the same, plus each catch's state under the bag rule. The read models are emptied and the checkpoint
 * dropped, so the projector replays the journal into the new columns (they are derived from it alone).
 */
export class Migration20261230000000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      "alter table `events` add `format` varchar(10) not null default 'team', add `field_size` int null, add `winning_lb` double null, add `cut_lb` double null;",
    );
    this.addSql(
      'alter table `weigh_ins` add `field_size` int null, add `winning_lb` double null, add `cut_lb` double null;',
    );
    this.addSql('alter table `catches` add `logged_by` varchar(36) null;');
    this.addSql(
      'alter table `rm_event` add `field_size` int null, add `winning_lb` double null, add `cut_lb` double null;',
    );
    this.addSql(
      'alter table `rm_competition_day` add `field_size` int null, add `winning_lb` double null, add `cut_lb` double null;',
    );
    this.addSql(
      "alter table `rm_catch_fact` add `logged_by` varchar(36) null, add `bag_state` varchar(10) not null default '', add `bag_counted` tinyint(1) not null default false;",
    );
    // The catch-grouping sums now read bag_counted instead of fate: the covering index follows.
    this.addSql(
      'alter table `rm_catch_fact` drop index `rm_catch_fact_event_groups_index`, add index `rm_catch_fact_event_groups_index` (`event_id`, `solunar_period`, `time_of_day`, `bag_counted`, `weight_ulb`);',
    );
    for (const table of [
      'rm_group_stats',
      'rm_find_outcome',
      'rm_catch_fact',
      'rm_find',
      'rm_competition_day',
      'rm_event',
      'rm_lake',
    ])
      this.addSql(`delete from \`${table}\`;`);
    this.addSql("delete from `projection_checkpoint` where `name` = 'journal';");
  }

  override async down(): Promise<void> {
    this.addSql(
      'alter table `rm_catch_fact` drop index `rm_catch_fact_event_groups_index`, add index `rm_catch_fact_event_groups_index` (`event_id`, `solunar_period`, `time_of_day`, `fate`, `weight_ulb`);',
    );
    this.addSql('alter table `rm_catch_fact` drop `logged_by`, drop `bag_state`, drop `bag_counted`;');
    this.addSql('alter table `rm_competition_day` drop `field_size`, drop `winning_lb`, drop `cut_lb`;');
    this.addSql('alter table `rm_event` drop `field_size`, drop `winning_lb`, drop `cut_lb`;');
    this.addSql('alter table `catches` drop `logged_by`;');
    this.addSql('alter table `weigh_ins` drop `field_size`, drop `winning_lb`, drop `cut_lb`;');
    this.addSql('alter table `events` drop `format`, drop `field_size`, drop `winning_lb`, drop `cut_lb`;');
  }
}
