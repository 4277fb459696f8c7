import { Migration } from '@mikro-orm/migrations';

/** The launch and check-in ramp of an event (WGS 84), the end point of the check-in clock's run back. */
export class Migration20270112000000 extends Migration {
  override async up(): Promise<void> {
    this.addSql('alter table `events` add `ramp_lat` double null, add `ramp_lon` double null;');
  }

  override async down(): Promise<void> {
    this.addSql('alter table `events` drop column `ramp_lat`, drop column `ramp_lon`;');
  }
}
