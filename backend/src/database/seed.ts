// `node dist/database/seed.js`: seed the demo data when the database has no users yet.
import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/mariadb';
import { DatabaseEnv, validateEnvAs } from '../config/env.validation';
import { User } from '../users/user.entity';
import { buildOrmConfig } from './mikro-orm.config';
import { DatabaseSeeder } from './seeders/database.seeder';
import { JournalDemoSeeder } from './seeders/journal-demo.seeder';

async function main(): Promise<void> {
  const orm = await MikroORM.init({ ...buildOrmConfig(validateEnvAs(DatabaseEnv, process.env)), debug: false });
  try {
    const users = await orm.em.fork().count(User, {});
    if (users > 0) {
      process.stdout.write('already seeded\n');
      // A database seeded before the journal existed still gets the demo journal (the seeder checks).
      await orm.getSeeder().seed(JournalDemoSeeder);
      return;
    }
    await orm.getSeeder().seed(DatabaseSeeder);
    process.stdout.write('seeded the demo accounts and crews\n');
  } finally {
    await orm.close(true);
  }
}

// Exit at once: the driver's idle timers would otherwise keep the process alive for a while.
main().then(
  () => process.exit(0),
  (e: unknown) => {
    process.stderr.write(`seeding failed: ${e instanceof Error ? e.message : String(e)}\n`);
    process.exit(1);
  },
);
