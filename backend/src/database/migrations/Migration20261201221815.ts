import { Migration } from '@mikro-orm/migrations';

export class Migration20261201221815 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table \`crews\` (\`id\` varchar(36) not null, \`name\` varchar(80) not null, \`viewers_see_positions\` tinyint(1) not null default false, \`created_at\` datetime(3) not null, \`updated_at\` datetime(3) not null, primary key (\`id\`)) default character set utf8mb4 engine = InnoDB;`,
    );

    this.addSql(
      `create table \`users\` (\`id\` varchar(36) not null, \`email\` varchar(254) not null, \`display_name\` varchar(80) not null, \`password_hash\` varchar(255) not null, \`site_role\` enum('user', 'admin') not null default 'user', \`disabled\` tinyint(1) not null default false, \`units\` json not null, \`created_at\` datetime(3) not null, \`updated_at\` datetime(3) not null, primary key (\`id\`)) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`users\` add unique \`users_email_unique\`(\`email\`);`);
    this.addSql(`alter table \`users\` add index \`users_created_at_index\`(\`created_at\`);`);

    this.addSql(
      `create table \`sessions\` (\`token_hash\` varchar(64) not null, \`user_id\` varchar(36) not null, \`created_at\` datetime(3) not null, \`last_seen_at\` datetime(3) not null, \`expires_at\` datetime(3) not null, primary key (\`token_hash\`)) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`sessions\` add index \`sessions_user_id_index\`(\`user_id\`);`);

    this.addSql(
      `create table \`memberships\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`user_id\` varchar(36) not null, \`role\` enum('owner', 'angler', 'viewer') not null, \`joined_at\` datetime(3) not null, primary key (\`id\`)) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`memberships\` add index \`memberships_crew_id_index\`(\`crew_id\`);`);
    this.addSql(`alter table \`memberships\` add index \`memberships_user_id_index\`(\`user_id\`);`);
    this.addSql(`alter table \`memberships\` add unique \`memberships_crew_user_unique\`(\`crew_id\`, \`user_id\`);`);

    this.addSql(
      `create table \`invites\` (\`id\` varchar(36) not null, \`crew_id\` varchar(36) not null, \`email\` varchar(254) not null, \`role\` enum('owner', 'angler', 'viewer') not null, \`token_hash\` varchar(64) not null, \`invited_by_id\` varchar(36) not null, \`created_at\` datetime(3) not null, \`expires_at\` datetime(3) not null, \`accepted_at\` datetime(3) null, \`accepted_by_id\` varchar(36) null, primary key (\`id\`)) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`invites\` add index \`invites_crew_id_index\`(\`crew_id\`);`);
    this.addSql(`alter table \`invites\` add unique \`invites_token_hash_unique\`(\`token_hash\`);`);
    this.addSql(`alter table \`invites\` add index \`invites_invited_by_id_index\`(\`invited_by_id\`);`);
    this.addSql(`alter table \`invites\` add index \`invites_accepted_by_id_index\`(\`accepted_by_id\`);`);
    this.addSql(`alter table \`invites\` add index \`invites_crew_email_index\`(\`crew_id\`, \`email\`);`);

    this.addSql(
      `create table \`auth_tokens\` (\`id\` varchar(36) not null, \`token_hash\` varchar(64) not null, \`purpose\` enum('password_reset') not null, \`user_id\` varchar(36) not null, \`created_at\` datetime(3) not null, \`expires_at\` datetime(3) not null, \`used_at\` datetime(3) null, primary key (\`id\`)) default character set utf8mb4 engine = InnoDB;`,
    );
    this.addSql(`alter table \`auth_tokens\` add unique \`auth_tokens_token_hash_unique\`(\`token_hash\`);`);
    this.addSql(`alter table \`auth_tokens\` add index \`auth_tokens_user_id_index\`(\`user_id\`);`);

    this.addSql(
      `alter table \`sessions\` add constraint \`sessions_user_id_foreign\` foreign key (\`user_id\`) references \`users\` (\`id\`) on update cascade on delete cascade;`,
    );

    this.addSql(
      `alter table \`memberships\` add constraint \`memberships_crew_id_foreign\` foreign key (\`crew_id\`) references \`crews\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`memberships\` add constraint \`memberships_user_id_foreign\` foreign key (\`user_id\`) references \`users\` (\`id\`) on update cascade on delete cascade;`,
    );

    this.addSql(
      `alter table \`invites\` add constraint \`invites_crew_id_foreign\` foreign key (\`crew_id\`) references \`crews\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`invites\` add constraint \`invites_invited_by_id_foreign\` foreign key (\`invited_by_id\`) references \`users\` (\`id\`) on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table \`invites\` add constraint \`invites_accepted_by_id_foreign\` foreign key (\`accepted_by_id\`) references \`users\` (\`id\`) on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table \`auth_tokens\` add constraint \`auth_tokens_user_id_foreign\` foreign key (\`user_id\`) references \`users\` (\`id\`) on update cascade on delete cascade;`,
    );
  }
}
