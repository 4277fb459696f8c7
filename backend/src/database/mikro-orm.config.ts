import 'reflect-metadata';
import { join } from 'node:path';
import { defineConfig, type Options } from '@mikro-orm/mariadb';
import { Migrator } from '@mikro-orm/migrations';
import { SeedManager } from '@mikro-orm/seeder';
import type { DatabaseEnv } from '../config/env.validation';
import { ENTITIES } from './entities';

/**
 * MikroORM options for the server, the migrate/seed scripts and the CLI. Schema changes go through
 * migrations only (never schema sync). Migrations sit beside this file: `.ts` under src for the CLI,
 * compiled `.js` under dist for `node dist/database/migrate.js`.
 */
export function buildOrmConfig(env: DatabaseEnv): Options {
  return defineConfig({
    host: env.DB_HOST,
    port: env.DB_PORT,
    dbName: env.DB_NAME,
    user: env.DB_USER,
    password: env.DB_PASSWORD,
    entities: ENTITIES,
    // Migrations create the database's tables; never create or sync anything on connect.
    ensureDatabase: false,
    allowGlobalContext: false,
    forceUtcTimezone: true,
    timezone: '+00:00',
    // Fail fast when the database is unreachable instead of hanging requests.
    driverOptions: { connectTimeout: 2000 },
    pool: { min: 0, max: 10, acquireTimeoutMillis: 5000 },
    // Compiled code loads compiled migrations, even when started from vitest (whose env makes
    // MikroORM guess TypeScript support and pick the .ts files otherwise).
    preferTs: __filename.endsWith('.ts'),
    extensions: [Migrator, SeedManager],
    migrations: {
      tableName: 'mikro_orm_migrations',
      path: join(__dirname, 'migrations'),
      pathTs: join(__dirname, '..', '..', 'src', 'database', 'migrations'),
      glob: '!(*.d).{js,ts}',
      transactional: false,
      allOrNothing: false,
      snapshot: false,
      emit: 'ts',
    },
    seeder: {
      path: join(__dirname, 'seeders'),
      pathTs: join(__dirname, '..', '..', 'src', 'database', 'seeders'),
      defaultSeeder: 'DatabaseSeeder',
      emit: 'ts',
    },
  });
}
