// Projection rebuild throughput against a bulk INSERT of the same number of rows, in one process, one after the
// other on the same database. Prints JSON. (DB_* from the environment.)
import 'reflect-metadata';
import { randomUUID } from 'node:crypto';
import { MikroORM } from '@mikro-orm/mariadb';
import { DatabaseEnv, validateEnvAs } from '../src/config/env.validation';
import { buildOrmConfig } from '../src/database/mikro-orm.config';
import { rebuildReadModels } from '../src/projections/rebuild.service';
import type { CatchRow } from '../src/projections/rows';
import { insertChunks } from '../src/projections/sql-values';
import { CATCH_TABLE } from '../src/projections/tables';

async function main(): Promise<void> {
  const orm = await MikroORM.init({ ...buildOrmConfig(validateEnvAs(DatabaseEnv, process.env)), debug: false });
  try {
    const rebuild = await rebuildReadModels(orm.em.fork());

    // Baseline: the same number of rows, shaped like the widest read-model row, written with the same statements.
    const em = orm.em.fork();
    await em.execute('DROP TABLE IF EXISTS bench_bulk');
    await em.execute('CREATE TABLE bench_bulk LIKE rm_catch_fact');
    const spec = { ...CATCH_TABLE, table: 'bench_bulk' };
    const crewId = randomUUID();
    // Ids in key order, as the rebuild writes its rows.
    const ids = Array.from({ length: rebuild.events }, () => randomUUID()).sort();
    const started = Date.now();
    const chunk = 20_000;
    for (let i = 0; i < rebuild.events; i += chunk) {
      const rows: CatchRow[] = [];
      for (let j = i; j < Math.min(rebuild.events, i + chunk); j++) {
        rows.push({
          id: ids[j]!,
          crewId,
          lakeId: crewId,
          eventId: crewId,
          competitionDayId: crewId,
          dayDate: '2026-10-10',
          findId: crewId,
          caughtAtMs: 1_790_000_000_000 + j * 1000,
          weightLb: 2.5,
          weightUlb: 2_500_000,
          lengthIn: null,
          species: 'largemouth',
          fate: 'weighed',
          lure: 'jig',
          lat: null,
          lon: null,
          localMinutes: 420,
          minutesFromSunrise: 35,
          solunarPeriod: 'none',
          timeOfDay: 'early',
          loggedBy: null,
          bagState: 'counted',
          bagCounted: true,
        });
      }
      await em.transactional(async (tx) => {
        for (const sql of insertChunks(spec, rows)) await tx.execute(sql);
      });
    }
    const bulkMs = Date.now() - started;
    await em.execute('DROP TABLE bench_bulk');
    process.stdout.write(
      JSON.stringify({ events: rebuild.events, rebuildMs: rebuild.durationMs, bulkRows: rebuild.events, bulkMs }) +
        '\n',
    );
  } finally {
    await orm.close(true);
  }
}

main().then(
  () => process.exit(0),
  (e: unknown) => {
    process.stderr.write(`rebuild bench failed: ${e instanceof Error ? e.stack : String(e)}\n`);
    process.exit(1);
  },
);
