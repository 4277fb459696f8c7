import { Migration } from '@mikro-orm/migrations';

/**
 * When someone last tried to sign up with a taken address: the sign-up handler writes it (one UPDATE, as a free
 * address costs one INSERT) and sends the owner at most one "account exists" e-mail an hour by it.
 */
export class Migration20270113000000 extends Migration {
  override async up(): Promise<void> {
    this.addSql('alter table `users` add `sign_up_attempted_at` datetime(3) null;');
  }

  override async down(): Promise<void> {
    this.addSql('alter table `users` drop column `sign_up_attempted_at`;');
  }
}
