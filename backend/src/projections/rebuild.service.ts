import { countBagStates } from './bag-states';
import { MikroORM } from '@mikro-orm/mariadb';
import type { EntityManager } from '@mikro-orm/mariadb';
import { Injectable, Logger, ServiceUnavailableException } from '@nestjs/common';
import { READ_MODEL_TABLES } from '../read-models';
import { catchTiming, UTC_PLACE } from './catch-timing';
import { type CatchForStats, catchGroupSums, deriveGroupStats, deriveOutcomes, stopGroupSeconds } from './derive';
import { JournalApplier } from './journal-applier';
import { GapPolicy, readJournal, settledGaps } from './journal-reader';
import { JournalProjector } from './journal-projector.service';
import { ProjectionState } from './projection-state';
import { JOURNAL_PROJECTION, withProjectionLock, writeCheckpoint } from './projection-lock';
import { groupBy } from './read-model-store';
import type { OutcomeRow } from './rows';
import { insertSql, rowKey, type TableSpec } from './sql-values';
import {
  CATCH_TABLE,
  DAY_TABLE,
  EVENT_TABLE,
  FIND_TABLE,
  GROUP_STATS_TABLE,
  LAKE_TABLE,
  OUTCOME_TABLE,
  STOP_TABLE,
} from './tables';

const READ_PAGE = 50_000;
const WRITE_CHUNK = 2000;
const LOCK_WAIT_SECONDS = 30;
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

export interface RebuildProgress {
  /** Last seq applied, and the highest seq when the rebuild started. */
  seq: number;
  maxSeq: number;
  events: number;
  phase: 'replay' | 'write';
}

export interface RebuildResult {
  events: number;
  durationMs: number;
  lastSeq: number;
}

/**
 * Rebuilds every read model from journal_event: replays all events into memory with the same applier and the
 * same derivations as the incremental projector, then truncates the tables and writes them with multi-row
 * INSERTs, the rows and the checkpoint in one transaction. A crash midway leaves empty tables and checkpoint 0,
 * which the next catch-up fills again.
 */
export async function rebuildReadModels(
  em: EntityManager,
  options: { gapTimeoutMs?: number; onProgress?: (p: RebuildProgress) => void } = {},
): Promise<RebuildResult> {
  const started = Date.now();
  const result = await em.transactional((tx) =>
    withProjectionLock(tx, LOCK_WAIT_SECONDS, async () => {
      const [maxRow] = (await tx.execute('SELECT COALESCE(MAX(seq), 0) AS max_seq FROM journal_event')) as {
        max_seq: unknown;
      }[];
      const maxSeq = Number(maxRow?.max_seq ?? 0);
      const state = new ProjectionState(false);
      const applier = new JournalApplier(state);
      const gaps = new GapPolicy(options.gapTimeoutMs ?? 5000);
      let last = 0;
      let events = 0;
      // The next page is fetched while this one is applied (MariaDB and the applier work side by side).
      let next = readJournal(tx, 0, READ_PAGE);
      for (;;) {
        const records = await next;
        if (!records.length) break;
        const { usable, last: reached, waiting } = gaps.contiguous(records, last, await settledGaps(tx, records, last));
        last = reached;
        if (waiting && last < maxSeq) await sleep(50);
        next = waiting && last >= maxSeq ? Promise.resolve([]) : readJournal(tx, last, READ_PAGE);
        for (const r of usable) applier.apply(r);
        events += usable.length;
        options.onProgress?.({ seq: last, maxSeq, events, phase: 'replay' });
      }

      countBagStates(state.catches.rows.values(), (id) => state.events.get(id)?.rules);
      const catchesByFind = groupBy(state.catches.rows.values(), (c) => c.findId);
      const stopsByFind = groupBy(state.stops.rows.values(), (s) => s.findId);
      const outcomes: OutcomeRow[] = [];
      for (const find of state.finds.rows.values())
        outcomes.push(...deriveOutcomes(find, catchesByFind.get(find.id) ?? [], stopsByFind.get(find.id) ?? []));
      const outcomesByEvent = groupBy(outcomes, (o) => o.eventId);
      const catchesByEvent = groupBy<CatchForStats>(state.catches.rows.values(), (c) => c.eventId);
      const stopsByEvent = groupBy(state.stops.rows.values(), (s) => s.eventId);
      const stats = [...state.events.rows.values()].flatMap((ev) =>
        deriveGroupStats(
          ev,
          outcomesByEvent.get(ev.id) ?? [],
          catchGroupSums(catchesByEvent.get(ev.id) ?? []),
          stopGroupSeconds(stopsByEvent.get(ev.id) ?? [], state.lakes.get(ev.lakeId) ?? UTC_PLACE, catchTiming),
        ),
      );

      options.onProgress?.({ seq: last, maxSeq, events, phase: 'write' });
      // TRUNCATE commits implicitly; the refill then runs in its own transaction, committed with the checkpoint.
      for (const table of READ_MODEL_TABLES) await tx.execute(`TRUNCATE TABLE \`${table}\``);
      await tx.execute(`DELETE FROM projection_checkpoint WHERE name = '${JOURNAL_PROJECTION}'`);
      await tx.execute('START TRANSACTION');
      // Each statement is built while the previous one runs.
      let pending: Promise<unknown> = Promise.resolve();
      // Rows go in primary-key order: InnoDB then appends to its clustered index instead of splitting pages.
      const write = async <R>(spec: TableSpec<R>, rows: Iterable<R>) => {
        const all = [...rows]
          .map((r) => ({ r, k: rowKey(spec, r) }))
          .sort((a, b) => (a.k < b.k ? -1 : a.k > b.k ? 1 : 0))
          .map((x) => x.r);
        for (let i = 0; i < all.length; i += WRITE_CHUNK) {
          const sql = insertSql(spec, all.slice(i, i + WRITE_CHUNK));
          await pending;
          pending = tx.execute(sql);
          // Awaited before the next statement; this only keeps a failure from counting as unhandled meanwhile.
          pending.catch(() => undefined);
        }
      };
      await write(LAKE_TABLE, state.lakes.rows.values());
      await write(EVENT_TABLE, state.events.rows.values());
      await write(DAY_TABLE, state.days.rows.values());
      await write(FIND_TABLE, state.finds.rows.values());
      await write(CATCH_TABLE, state.catches.rows.values());
      await write(STOP_TABLE, state.stops.rows.values());
      await write(OUTCOME_TABLE, outcomes);
      await write(GROUP_STATS_TABLE, stats);
      await pending;
      await writeCheckpoint(tx, last);
      return { events, lastSeq: last };
    }),
  );
  if (!result)
    throw new ServiceUnavailableException('Another rebuild or catch-up holds the projections; try again in a minute.');
  return { ...result, durationMs: Date.now() - started };
}

/** The rebuild inside the server: serialised with the process's catch-ups, then a catch-up for what came since. */
@Injectable()
export class ProjectionRebuildService {
  private readonly logger = new Logger(ProjectionRebuildService.name);

  constructor(
    private readonly orm: MikroORM,
    private readonly projector: JournalProjector,
  ) {}

  async rebuild(): Promise<RebuildResult> {
    const result = await this.projector.exclusive(() =>
      rebuildReadModels(this.orm.em.fork(), { gapTimeoutMs: this.projector.gaps.timeoutMs }),
    );
    this.logger.log(`rebuilt the read models from ${result.events} journal events in ${result.durationMs} ms`);
    if (this.projector.enabled) void this.projector.requestCatchUp();
    return result;
  }
}
