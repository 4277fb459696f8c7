import { Migration } from '@mikro-orm/migrations';

/**
 * The journal: lakes, events and their days, finds, catches, weigh-ins, photos and the append-only
 * journal_event table. Foreign keys restrict deletes the handlers must resolve first (so no row vanishes
 * without its own journal event); only deleting a crew cascades, erasing its data on purpose.
 */
export class Migration20261215000000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table \`lakes\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`name\` varchar(120) not null, \`region\` varchar(120) not null default '', \`time_zone\` varchar(64) not null, \`lat\` double not null, \`lon\` double not null, \`area_acres\` double null, \`notes\` text not null default (''), \`version\` int not null default 1, \`created_at\` datetime(3) not null, \`updated_at\` datetime(3) not null, primary key (\`id\`)) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`lakes\` add index \`lakes_crew_name_index\`(\`crew_id\`, \`name\`);`);
    this.addSql(
      `create table \`events\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`lake_id\` varchar(36) not null, \`name\` varchar(160) not null, \`organiser\` varchar(160) not null default '', \`practice_dates\` json not null, \`competition_dates\` json not null, \`fish_per_day\` int not null default 5, \`min_length_in\` double null default 12, \`dead_fish_penalty_lb\` double not null default 0.25, \`short_fish_penalty_lb\` double not null default 1, \`late_penalty_lb_per_minute\` double not null default 1, \`entry_fee\` double null, \`payout\` double null, \`final_place\` int null, \`notes\` text not null default (''), \`version\` int not null default 1, \`created_at\` datetime(3) not null, \`updated_at\` datetime(3) not null, primary key (\`id\`)) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`events\` add index \`events_crew_lake_index\`(\`crew_id\`, \`lake_id\`);`);
    this.addSql(
      `create table \`practice_days\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`event_id\` varchar(36) not null, \`date\` char(10) not null, \`notes\` text not null default (''), \`water_temp_f\` double null, \`water_temp_value\` double null, \`water_temp_unit\` varchar(2) null, \`version\` int not null default 1, primary key (\`id\`)) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`practice_days\` add index \`practice_days_crew_index\`(\`crew_id\`);`);
    this.addSql(
      `alter table \`practice_days\` add unique \`practice_days_event_date_unique\`(\`event_id\`, \`date\`);`,
    );
    this.addSql(
      `create table \`competition_days\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`event_id\` varchar(36) not null, \`date\` char(10) not null, \`start_time\` char(5) null, \`check_in_time\` char(5) null, \`weather_notes\` text not null default (''), \`water_temp_f\` double null, \`water_temp_value\` double null, \`water_temp_unit\` varchar(2) null, \`version\` int not null default 1, primary key (\`id\`)) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`competition_days\` add index \`competition_days_crew_index\`(\`crew_id\`);`);
    this.addSql(
      `alter table \`competition_days\` add unique \`competition_days_event_date_unique\`(\`event_id\`, \`date\`);`,
    );
    this.addSql(
      `create table \`photos\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`storage_key\` varchar(80) not null, \`content_type\` varchar(40) not null, \`width\` int not null, \`height\` int not null, \`byte_size\` int not null, \`uploaded_by_id\` varchar(36) not null, \`created_at\` datetime(3) not null, primary key (\`id\`)) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`photos\` add index \`photos_crew_index\`(\`crew_id\`);`);
    this.addSql(
      `create table \`finds\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`lake_id\` varchar(36) not null, \`event_id\` varchar(36) null, \`practice_day_id\` varchar(36) null, \`name\` varchar(120) not null, \`marked_at\` datetime(3) null, \`lat\` double not null, \`lon\` double not null, \`depth_ft\` double null, \`depth_value\` double null, \`depth_unit\` varchar(2) null, \`kind\` varchar(20) not null, \`sub_kind\` varchar(40) not null default '', \`hardness\` tinyint null, \`vegetation_density\` varchar(10) null, \`bait_seen\` tinyint(1) not null default false, \`fish_marked\` int null, \`frequency_khz\` double null, \`found_how\` varchar(10) null, \`water_temp_f\` double null, \`water_temp_value\` double null, \`water_temp_unit\` varchar(2) null, \`notes\` text not null default (''), \`photo_id\` varchar(36) null, \`source\` varchar(8) not null default 'form', \`version\` int not null default 1, \`created_at\` datetime(3) not null, \`updated_at\` datetime(3) not null, primary key (\`id\`)) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`finds\` add index \`finds_crew_event_index\`(\`crew_id\`, \`event_id\`);`);
    this.addSql(`alter table \`finds\` add index \`finds_crew_lake_index\`(\`crew_id\`, \`lake_id\`);`);
    this.addSql(
      `create table \`catches\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`event_id\` varchar(36) not null, \`competition_day_id\` varchar(36) not null, \`caught_at\` datetime(3) not null, \`find_id\` varchar(36) null, \`attribution_distance_m\` double null, \`lat\` double null, \`lon\` double null, \`species\` varchar(12) not null, \`length_in\` double null, \`length_value\` double null, \`length_unit\` varchar(2) null, \`weight_lb\` double not null, \`weight_value\` double not null, \`weight_unit\` varchar(5) not null, \`weight_ounces\` double null, \`weight_flagged\` tinyint(1) not null default false, \`lure\` varchar(120) not null default '', \`technique\` varchar(120) not null default '', \`depth_ft\` double null, \`depth_value\` double null, \`depth_unit\` varchar(2) null, \`water_temp_f\` double null, \`water_temp_value\` double null, \`water_temp_unit\` varchar(2) null, \`fate\` varchar(10) not null, \`notes\` text not null default (''), \`photo_id\` varchar(36) null, \`version\` int not null default 1, \`created_at\` datetime(3) not null, \`updated_at\` datetime(3) not null, primary key (\`id\`)) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`catches\` add index \`catches_find_index\`(\`find_id\`);`);
    this.addSql(`alter table \`catches\` add index \`catches_crew_day_index\`(\`crew_id\`, \`competition_day_id\`);`);
    this.addSql(`alter table \`catches\` add index \`catches_crew_event_index\`(\`crew_id\`, \`event_id\`);`);
    this.addSql(
      `create table \`weigh_ins\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`competition_day_id\` varchar(36) not null, \`gross_lb\` double null, \`penalty_lb\` double null, \`official_lb\` double null, \`day_place\` int null, \`late_minutes\` int null, \`version\` int not null default 1, \`updated_at\` datetime(3) not null, primary key (\`id\`)) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`weigh_ins\` add index \`weigh_ins_crew_index\`(\`crew_id\`);`);
    this.addSql(`alter table \`weigh_ins\` add unique \`weigh_ins_competition_day_unique\`(\`competition_day_id\`);`);
    this.addSql(
      `create table \`journal_event\` (\`seq\` bigint unsigned not null auto_increment primary key, \`crew_id\` varchar(36) not null, \`type\` varchar(40) not null, \`aggregate_type\` varchar(20) not null, \`aggregate_id\` varchar(36) not null, \`payload\` json not null, \`actor_id\` varchar(36) null, \`occurred_at\` datetime(3) not null) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`journal_event\` add index \`journal_event_aggregate_index\`(\`aggregate_id\`);`);
    this.addSql(`alter table \`journal_event\` add index \`journal_event_crew_seq_index\`(\`crew_id\`, \`seq\`);`);
    this.addSql(
      `alter table \`lakes\` add constraint \`lakes_crew_id_foreign\` foreign key (\`crew_id\`) references \`crews\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`events\` add constraint \`events_crew_id_foreign\` foreign key (\`crew_id\`) references \`crews\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`events\` add constraint \`events_lake_id_foreign\` foreign key (\`lake_id\`) references \`lakes\` (\`id\`) on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table \`practice_days\` add constraint \`practice_days_crew_id_foreign\` foreign key (\`crew_id\`) references \`crews\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`practice_days\` add constraint \`practice_days_event_id_foreign\` foreign key (\`event_id\`) references \`events\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`competition_days\` add constraint \`competition_days_crew_id_foreign\` foreign key (\`crew_id\`) references \`crews\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`competition_days\` add constraint \`competition_days_event_id_foreign\` foreign key (\`event_id\`) references \`events\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`photos\` add constraint \`photos_crew_id_foreign\` foreign key (\`crew_id\`) references \`crews\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`finds\` add constraint \`finds_crew_id_foreign\` foreign key (\`crew_id\`) references \`crews\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`finds\` add constraint \`finds_lake_id_foreign\` foreign key (\`lake_id\`) references \`lakes\` (\`id\`) on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table \`finds\` add constraint \`finds_event_id_foreign\` foreign key (\`event_id\`) references \`events\` (\`id\`) on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table \`finds\` add constraint \`finds_practice_day_id_foreign\` foreign key (\`practice_day_id\`) references \`practice_days\` (\`id\`) on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table \`finds\` add constraint \`finds_photo_id_foreign\` foreign key (\`photo_id\`) references \`photos\` (\`id\`) on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table \`catches\` add constraint \`catches_crew_id_foreign\` foreign key (\`crew_id\`) references \`crews\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`catches\` add constraint \`catches_event_id_foreign\` foreign key (\`event_id\`) references \`events\` (\`id\`) on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table \`catches\` add constraint \`catches_competition_day_id_foreign\` foreign key (\`competition_day_id\`) references \`competition_days\` (\`id\`) on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table \`catches\` add constraint \`catches_find_id_foreign\` foreign key (\`find_id\`) references \`finds\` (\`id\`) on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table \`catches\` add constraint \`catches_photo_id_foreign\` foreign key (\`photo_id\`) references \`photos\` (\`id\`) on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table \`weigh_ins\` add constraint \`weigh_ins_crew_id_foreign\` foreign key (\`crew_id\`) references \`crews\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`weigh_ins\` add constraint \`weigh_ins_competition_day_id_foreign\` foreign key (\`competition_day_id\`) references \`competition_days\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`journal_event\` add constraint \`journal_event_crew_id_foreign\` foreign key (\`crew_id\`) references \`crews\` (\`id\`) on update cascade on delete cascade;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql('drop table if exists `journal_event`;');
    this.addSql('drop table if exists `weigh_ins`;');
    this.addSql('drop table if exists `catches`;');
    this.addSql('drop table if exists `finds`;');
    this.addSql('drop table if exists `photos`;');
    this.addSql('drop table if exists `competition_days`;');
    this.addSql('drop table if exists `practice_days`;');
    this.addSql('drop table if exists `events`;');
    this.addSql('drop table if exists `lakes`;');
  }
}
