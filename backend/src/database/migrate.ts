// `node dist/database/migrate.js`: apply pending migrations, then exit. Never schema sync.
import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/mariadb';
import { DatabaseEnv, validateEnvAs } from '../config/env.validation';
import { buildOrmConfig } from './mikro-orm.config';

async function main(): Promise<void> {
  const orm = await MikroORM.init({ ...buildOrmConfig(validateEnvAs(DatabaseEnv, process.env)), debug: false });
  try {
    if (!(await orm.isConnected()))
      throw new Error(`cannot reach the database at ${process.env.DB_HOST}:${process.env.DB_PORT}`);
    const applied = await orm.getMigrator().up();
    process.stdout.write(
      applied.length
        ? `applied ${applied.length} migration(s): ${applied.map((m) => m.name).join(', ')}\n`
        : 'database schema is up to date\n',
    );
  } finally {
    await orm.close(true);
  }
}

// Exit at once: the driver's idle timers would otherwise keep the process alive for a while.
main().then(
  () => process.exit(0),
  (e: unknown) => {
    process.stderr.write(`migration failed: ${e instanceof Error ? e.message : String(e)}\n`);
    process.exit(1);
  },
);
