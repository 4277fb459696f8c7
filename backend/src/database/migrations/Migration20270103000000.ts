import { Migration } from '@mikro-orm/migrations';

/**
 * Idempotency keys of journal writes (draft-ietf-httpapi-idempotency-key-header): one row per (crew, user,
 * key), written in the same transaction as the write it answers, with the request's fingerprint and the first
 * answer. Deleting a crew or an account removes its keys with it.
 */
export class Migration20270103000000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      'create table `idempotency_keys` (`crew_id` varchar(36) not null, `user_id` varchar(36) not null, `idem_key` varchar(255) character set utf8mb4 collate utf8mb4_bin not null, `fingerprint` char(64) not null, `status_code` smallint null, `response_body` longtext null, `created_at` datetime(3) not null, primary key (`crew_id`, `user_id`, `idem_key`)) default character set utf8mb4 engine = InnoDB;',
    );
    this.addSql('alter table `idempotency_keys` add index `idempotency_keys_created_index` (`created_at`);');
    this.addSql(
      'alter table `idempotency_keys` add constraint `idempotency_keys_crew_id_foreign` foreign key (`crew_id`) references `crews` (`id`) on update cascade on delete cascade;',
    );
    this.addSql(
      'alter table `idempotency_keys` add constraint `idempotency_keys_user_id_foreign` foreign key (`user_id`) references `users` (`id`) on update cascade on delete cascade;',
    );
  }

  override async down(): Promise<void> {
    this.addSql('drop table if exists `idempotency_keys`;');
  }
}
