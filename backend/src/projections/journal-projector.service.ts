import { MikroORM } from '@mikro-orm/mariadb';
import { Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { AppConfig } from '../config/app-config.service';
import { JournalApplier } from './journal-applier';
import { GapPolicy, readJournal, settledGaps } from './journal-reader';
import { ProjectionState } from './projection-state';
import { readCheckpoint, withProjectionLock, writeCheckpoint } from './projection-lock';
import { ReadModelStore } from './read-model-store';

/** Events applied per transaction. */
const BATCH_SIZE = 2000;
/** Retry delay while a gap is open or another process holds the projection lock (ms). */
const RETRY_MS = 100;
/** Longest wait between retries after failed catch-ups (the delay doubles per failure up to this, ms). */
const MAX_FAILURE_BACKOFF_MS = 10_000;

export interface CatchUpResult {
  applied: number;
  lastSeq: number;
}

/** How far the read models trail the journal, for /api/health. */
export interface ProjectionLag {
  /** Journal events not yet applied. */
  events: number;
  /** Catch-ups failed in a row since the last one that worked (0 when healthy). */
  failedRuns: number;
}

/**
 * Keeps the read models up to date with journal_event: each catch-up applies the events after the stored
 * checkpoint in seq order, batch by batch, each batch and its checkpoint in one transaction. Catch-ups are
 * serialised in the process (a queue of at most one running and one waiting) and across processes (a MariaDB
 * user lock). Runs on start-up, so events written before a crash are applied, and on every JournalEventsAppended.
 * A failed catch-up (the database went away) is retried with a doubling delay, so the read models catch up
 * once the database is back without waiting for the next write.
 * Set PROJECTOR_ENABLED=false for a process that must not project (a write-only instance).
 */
@Injectable()
export class JournalProjector implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(JournalProjector.name);
  private tail: Promise<unknown> = Promise.resolve();
  private queued: Promise<CatchUpResult> | null = null;
  private retryTimer: NodeJS.Timeout | null = null;
  private closed = false;
  private failedRuns = 0;
  readonly gaps: GapPolicy;
  readonly enabled: boolean;

  constructor(
    private readonly orm: MikroORM,
    config: AppConfig,
  ) {
    this.enabled = config.get('PROJECTOR_ENABLED') !== 'false';
    this.gaps = new GapPolicy(config.get('PROJECTION_GAP_TIMEOUT_MS'));
  }

  onApplicationBootstrap(): void {
    if (this.enabled) void this.requestCatchUp();
  }

  onModuleDestroy(): void {
    this.closed = true;
    if (this.retryTimer) clearTimeout(this.retryTimer);
  }

  /** Queue a catch-up (a request while one waits joins it); resolves when it has run. */
  requestCatchUp(): Promise<CatchUpResult> {
    if (this.queued) return this.queued;
    const run = this.tail.then(() => {
      this.queued = null;
      return this.catchUp();
    });
    this.queued = run;
    this.tail = run.then(
      () => (this.failedRuns = 0),
      (e: unknown) => {
        this.failedRuns++;
        this.logger.error(`catch-up failed (${this.failedRuns} in a row): ${e instanceof Error ? e.stack : String(e)}`);
        this.retryLater(Math.min(RETRY_MS * 2 ** this.failedRuns, MAX_FAILURE_BACKOFF_MS));
      },
    );
    return run;
  }

  /** Run `work` when no catch-up is running in this process (the rebuild uses it). */
  exclusive<T>(work: () => Promise<T>): Promise<T> {
    const run = this.tail.then(work);
    this.tail = run.catch(() => undefined);
    return run;
  }

  private async catchUp(): Promise<CatchUpResult> {
    let applied = 0;
    let lastSeq = 0;
    for (;;) {
      if (this.closed) break;
      const batch = await this.applyBatch();
      if (batch === 'busy' || batch.waiting) {
        this.retryLater();
        if (batch !== 'busy') lastSeq = batch.lastSeq;
        break;
      }
      applied += batch.applied;
      lastSeq = batch.lastSeq;
      if (batch.applied === 0 || batch.fetched < BATCH_SIZE) break;
    }
    return { applied, lastSeq };
  }

  /** Journal events after the checkpoint, and the failed runs in a row. */
  async lag(): Promise<ProjectionLag> {
    const em = this.orm.em.fork();
    const checkpoint = await readCheckpoint(em);
    const [row] = (await em.execute(`SELECT COUNT(*) AS n FROM journal_event WHERE seq > ${checkpoint}`)) as {
      n: unknown;
    }[];
    return { events: Number(row?.n ?? 0), failedRuns: this.failedRuns };
  }

  private retryLater(delayMs = RETRY_MS): void {
    if (this.retryTimer || this.closed) return;
    this.retryTimer = setTimeout(() => {
      this.retryTimer = null;
      void this.requestCatchUp().catch(() => undefined);
    }, delayMs);
    this.retryTimer.unref();
  }

  private async applyBatch(): Promise<
    { applied: number; fetched: number; lastSeq: number; waiting: boolean } | 'busy'
  > {
    const em = this.orm.em.fork();
    const result = await em.transactional((tx) =>
      withProjectionLock(tx, 0, async () => {
        const checkpoint = await readCheckpoint(tx);
        const records = await readJournal(tx, checkpoint, BATCH_SIZE);
        const { usable, last, waiting } = this.gaps.contiguous(
          records,
          checkpoint,
          await settledGaps(tx, records, checkpoint),
        );
        if (usable.length) {
          const state = new ProjectionState(true);
          const store = new ReadModelStore(tx);
          await store.preload(state, usable);
          const applier = new JournalApplier(state);
          for (const r of usable) applier.apply(r);
          await store.write(state);
        }
        if (last !== checkpoint) await writeCheckpoint(tx, last);
        return { applied: usable.length, fetched: records.length, lastSeq: last, waiting };
      }),
    );
    return result ?? 'busy';
  }
}
