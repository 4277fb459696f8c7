import { Migration } from '@mikro-orm/migrations';
import { canonicalEmail } from '../../common/canonical-email';

/**
 * Accounts and invites keep the canonical e-mail (NFKC, trimmed, case-folded) in a binary-collated column:
 * the server's utf8mb4_unicode_ci folds accents, so `pröbe@` matched `probe@`'s account while the rate limit
 * counted it apart. Existing rows are rewritten to the canonical form.
 */
export class Migration20270102000000 extends Migration {
  override async up(): Promise<void> {
    this.addSql('alter table `users` modify `email` varchar(254) character set utf8mb4 collate utf8mb4_bin not null;');
    this.addSql(
      'alter table `invites` modify `email` varchar(254) character set utf8mb4 collate utf8mb4_bin not null;',
    );
    for (const table of ['users', 'invites']) {
      const rows = (await this.execute(`select \`id\`, \`email\` from \`${table}\``)) as {
        id: string;
        email: string;
      }[];
      for (const { id, email } of rows) {
        const canonical = canonicalEmail(email);
        if (canonical !== email)
          this.addSql(this.getKnex()(table).update({ email: canonical }).where({ id }).toQuery() + ';');
      }
    }
  }

  override async down(): Promise<void> {
    this.addSql('alter table `users` modify `email` varchar(254) not null;');
    this.addSql('alter table `invites` modify `email` varchar(254) not null;');
  }
}
