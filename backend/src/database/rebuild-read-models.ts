// `npm run projections:rebuild -w @shoalbook/backend [-- --profile demo|bench|test]`: rebuild every read model
// from journal_event with a progress bar. Uses DB_* from the environment, else the named profile (default demo).
import 'reflect-metadata';
import { join } from 'node:path';
import { MikroORM } from '@mikro-orm/mariadb';
import { Presets, SingleBar } from 'cli-progress';
import { DatabaseEnv, validateEnvAs } from '../config/env.validation';
import { buildOrmConfig } from './mikro-orm.config';
import { rebuildReadModels } from '../projections/rebuild.service';

async function databaseEnv(): Promise<Record<string, unknown>> {
  if (process.env.DB_HOST && process.env.DB_NAME) return process.env;
  const i = process.argv.indexOf('--profile');
  const name = i > 0 ? process.argv[i + 1] : 'demo';
  const lib = (await import(join(__dirname, '..', '..', '..', 'scripts', 'lib', 'profile.mjs'))) as {
    profile: (n: string) => unknown;
    backendEnv: (p: unknown) => Record<string, unknown>;
  };
  return lib.backendEnv(lib.profile(name ?? 'demo'));
}

async function main(): Promise<void> {
  const orm = await MikroORM.init({ ...buildOrmConfig(validateEnvAs(DatabaseEnv, await databaseEnv())), debug: false });
  const bar = new SingleBar(
    {
      format: 'Rebuilding read models |{bar}| {percentage}% | {value}/{total} seq | {events} events | {phase}',
      hideCursor: true,
    },
    Presets.shades_classic,
  );
  let started = false;
  try {
    if (!(await orm.isConnected())) throw new Error('cannot reach the database');
    const result = await rebuildReadModels(orm.em.fork(), {
      onProgress: (p) => {
        if (!started) {
          bar.start(Math.max(1, p.maxSeq), 0, { events: 0, phase: p.phase });
          started = true;
        }
        bar.update(Math.min(p.seq, Math.max(1, p.maxSeq)), { events: p.events, phase: p.phase });
      },
    });
    if (started) bar.stop();
    const rate = result.durationMs ? Math.round((result.events / result.durationMs) * 1000) : result.events;
    process.stdout.write(
      `rebuilt the read models from ${result.events} journal events in ${result.durationMs} ms (${rate} events/s)\n`,
    );
  } finally {
    if (started) bar.stop();
    await orm.close(true);
  }
}

main().then(
  () => process.exit(0),
  (e: unknown) => {
    process.stderr.write(`rebuild failed: ${e instanceof Error ? e.message : String(e)}\n`);
    process.exit(1);
  },
);
