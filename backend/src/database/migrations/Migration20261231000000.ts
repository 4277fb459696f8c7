import { Migration } from '@mikro-orm/migrations';

/**
 * Stops (visits) on competition days, their read model, and the second denominator on the outcome and
 * group-statistics read models: the stops on a find and the time fished there (whole seconds, so sums are exact
 * in any order). "Fished" changes meaning (a stop or a catch, no longer a practice mark), so the read models are
 * emptied and the checkpoint reset: the projector replays the journal into them on start.
 */
export class Migration20261231000000 extends Migration {
  override async up(): Promise<void> {
    const t = 'default character set utf8mb4 engine = InnoDB';
    this.addSql(
      `create table \`stops\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`event_id\` varchar(36) not null, \`competition_day_id\` varchar(36) not null, \`find_id\` varchar(36) null, \`lat\` double null, \`lon\` double null, \`arrived_at\` datetime(3) not null, \`left_at\` datetime(3) null, \`water_temp_f\` double null, \`lure\` varchar(120) not null default '', \`technique\` varchar(120) not null default '', \`notes\` text not null default (''), \`logged_by_id\` varchar(36) null, \`version\` int not null default 1, \`created_at\` datetime(3) not null, \`updated_at\` datetime(3) not null, primary key (\`id\`), index \`stops_crew_day_index\` (\`crew_id\`, \`competition_day_id\`, \`arrived_at\`), index \`stops_crew_event_index\` (\`crew_id\`, \`event_id\`), index \`stops_find_index\` (\`find_id\`)) ${t};`,
    );
    this.addSql(
      'alter table `stops` add constraint `stops_crew_id_foreign` foreign key (`crew_id`) references `crews` (`id`) on update cascade on delete cascade;',
    );
    this.addSql(
      'alter table `stops` add constraint `stops_event_id_foreign` foreign key (`event_id`) references `events` (`id`) on update cascade on delete restrict;',
    );
    this.addSql(
      'alter table `stops` add constraint `stops_competition_day_id_foreign` foreign key (`competition_day_id`) references `competition_days` (`id`) on update cascade on delete restrict;',
    );
    this.addSql(
      'alter table `stops` add constraint `stops_find_id_foreign` foreign key (`find_id`) references `finds` (`id`) on update cascade on delete restrict;',
    );
    this.addSql(
      `create table \`rm_stop\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`lake_id\` varchar(36) not null, \`event_id\` varchar(36) not null, \`competition_day_id\` varchar(36) not null, \`find_id\` varchar(36) null, \`arrived_at\` datetime(3) not null, \`left_at\` datetime(3) null, \`seconds\` int not null, primary key (\`id\`), index \`rm_stop_event_index\` (\`event_id\`), index \`rm_stop_find_index\` (\`find_id\`), index \`rm_stop_crew_lake_index\` (\`crew_id\`, \`lake_id\`)) ${t};`,
    );
    this.addSql(
      'alter table `rm_find_outcome` add `stop_count` int not null default 0, add `seconds_fished` bigint not null default 0;',
    );
    this.addSql('alter table `rm_group_stats` add `seconds_fished` bigint not null default 0;');
    for (const table of [
      'rm_lake',
      'rm_event',
      'rm_competition_day',
      'rm_find',
      'rm_catch_fact',
      'rm_find_outcome',
      'rm_group_stats',
    ])
      this.addSql(`truncate table \`${table}\`;`);
    this.addSql("delete from `projection_checkpoint` where `name` = 'journal';");
  }

  override async down(): Promise<void> {
    this.addSql('alter table `rm_group_stats` drop column `seconds_fished`;');
    this.addSql('alter table `rm_find_outcome` drop column `stop_count`, drop column `seconds_fished`;');
    this.addSql('drop table if exists `rm_stop`;');
    this.addSql('drop table if exists `stops`;');
  }
}
