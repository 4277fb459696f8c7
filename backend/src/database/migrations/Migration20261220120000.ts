import { Migration } from '@mikro-orm/migrations';

/**
 * The read models of the reports and the projection checkpoint. No foreign keys: these tables are derived
 * from journal_event alone and are truncated and refilled by a rebuild.
 */
export class Migration20261220120000 extends Migration {
  override async up(): Promise<void> {
    const t = 'default character set utf8mb4 engine = InnoDB';
    this.addSql(
      `create table \`projection_checkpoint\` (\`name\` varchar(60) not null, \`last_seq\` bigint not null, \`updated_at\` datetime(3) not null, primary key (\`name\`)) ${t};`,
    );
    this.addSql(
      `create table \`rm_lake\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`name\` varchar(120) not null, \`time_zone\` varchar(64) not null, \`lat\` double not null, \`lon\` double not null, primary key (\`id\`), index \`rm_lake_crew_index\` (\`crew_id\`)) ${t};`,
    );
    this.addSql(
      `create table \`rm_event\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`lake_id\` varchar(36) not null, \`name\` varchar(160) not null, \`practice_dates\` json not null, \`competition_dates\` json not null, \`first_date\` char(10) null, \`season\` varchar(6) null, \`year\` int null, \`rules\` json not null, \`final_place\` int null, primary key (\`id\`), index \`rm_event_crew_lake_index\` (\`crew_id\`, \`lake_id\`)) ${t};`,
    );
    this.addSql(
      `create table \`rm_competition_day\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`event_id\` varchar(36) not null, \`date\` char(10) not null, \`has_official\` tinyint(1) not null default false, \`official_gross_lb\` double null, \`official_penalty_lb\` double null, \`official_lb\` double null, \`day_place\` int null, \`late_minutes\` int null, primary key (\`id\`), index \`rm_competition_day_event_index\` (\`event_id\`)) ${t};`,
    );
    this.addSql(
      `create table \`rm_find\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`lake_id\` varchar(36) not null, \`event_id\` varchar(36) null, \`name\` varchar(120) not null, \`kind\` varchar(20) not null, \`sub_kind\` varchar(40) not null default '', \`depth_ft\` double null, \`hardness\` tinyint null, \`water_temp_f\` double null, \`lat\` double not null, \`lon\` double not null, primary key (\`id\`), index \`rm_find_crew_lake_index\` (\`crew_id\`, \`lake_id\`), index \`rm_find_crew_event_index\` (\`crew_id\`, \`event_id\`)) ${t};`,
    );
    this.addSql(
      `create table \`rm_catch_fact\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`lake_id\` varchar(36) not null, \`event_id\` varchar(36) not null, \`competition_day_id\` varchar(36) not null, \`day_date\` char(10) not null, \`find_id\` varchar(36) null, \`caught_at\` datetime(3) not null, \`weight_lb\` double not null, \`weight_ulb\` bigint not null, \`length_in\` double null, \`species\` varchar(12) not null, \`fate\` varchar(10) not null, \`lure\` varchar(120) not null default '', \`lat\` double null, \`lon\` double null, \`local_minutes\` smallint not null, \`minutes_from_sunrise\` smallint null, \`solunar_period\` varchar(5) not null, \`time_of_day\` varchar(10) not null, primary key (\`id\`), index \`rm_catch_fact_event_index\` (\`event_id\`), index \`rm_catch_fact_find_index\` (\`find_id\`), index \`rm_catch_fact_crew_lake_index\` (\`crew_id\`, \`lake_id\`)) ${t};`,
    );
    this.addSql(
      `create table \`rm_find_outcome\` (\`find_id\` varchar(36) not null, \`event_id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`lake_id\` varchar(36) not null, \`kind\` varchar(20) not null, \`sub_kind\` varchar(40) not null, \`depth_band\` varchar(16) not null, \`hardness\` varchar(2) not null, \`temperature_band\` varchar(16) not null, \`practiced\` tinyint(1) not null, \`fished\` tinyint(1) not null, \`fish_count\` int not null, \`weighed_count\` int not null, \`weight_ulb\` bigint not null, \`weighed_weight_ulb\` bigint not null, \`first_bite_at\` datetime(3) null, primary key (\`find_id\`, \`event_id\`), index \`rm_find_outcome_crew_event_index\` (\`crew_id\`, \`event_id\`), index \`rm_find_outcome_crew_lake_index\` (\`crew_id\`, \`lake_id\`)) ${t};`,
    );
    this.addSql(
      `create table \`rm_group_stats\` (\`event_id\` varchar(36) not null, \`grouping\` varchar(16) not null, \`group_key\` varchar(40) not null, \`crew_id\` varchar(36) not null, \`lake_id\` varchar(36) not null, \`finds\` int not null, \`finds_fished\` int not null, \`finds_producing\` int not null, \`finds_weighed\` int not null, \`fish_count\` int not null, \`weighed_count\` int not null, \`weight_ulb\` bigint not null, \`weighed_weight_ulb\` bigint not null, primary key (\`event_id\`, \`grouping\`, \`group_key\`), index \`rm_group_stats_crew_lake_index\` (\`crew_id\`, \`lake_id\`, \`grouping\`)) ${t};`,
    );
  }

  override async down(): Promise<void> {
    for (const table of [
      'rm_group_stats',
      'rm_find_outcome',
      'rm_catch_fact',
      'rm_find',
      'rm_competition_day',
      'rm_event',
      'rm_lake',
      'projection_checkpoint',
    ]) {
      this.addSql(`drop table if exists \`${table}\`;`);
    }
  }
}
