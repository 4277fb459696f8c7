import type { EntityManager } from '@mikro-orm/mariadb';
import type { JournalRecord } from './journal-record';

/** The next `limit` journal events after `afterSeq`, in seq order. */
export async function readJournal(em: EntityManager, afterSeq: number, limit: number): Promise<JournalRecord[]> {
  const rows: Record<string, unknown>[] = await em.execute(
    `SELECT seq, crew_id, type, aggregate_type, aggregate_id, payload FROM journal_event WHERE seq > ${Math.floor(afterSeq)} ORDER BY seq LIMIT ${Math.floor(limit)}`,
  );
  return rows.map((r) => ({
    seq: Number(r.seq),
    crewId: String(r.crew_id),
    type: String(r.type),
    aggregateType: String(r.aggregate_type),
    aggregateId: String(r.aggregate_id),
    payload: (typeof r.payload === 'string' ? JSON.parse(r.payload) : r.payload) as Record<string, unknown>,
  }));
}

/** Seq ranges known to hold no event that could still commit (inclusive). */
export type SettledRanges = readonly (readonly [number, number])[];

/**
 * The gaps in `records` after `afterSeq` that no open transaction holds: their events were deleted (a crew's
 * removal) or rolled back, so the projector may pass them at once instead of waiting out the gap timeout. A
 * share-mode read waits for a transaction still inserting into the range; an empty answer means none will.
 */
export async function settledGaps(
  em: EntityManager,
  records: readonly JournalRecord[],
  afterSeq: number,
): Promise<SettledRanges> {
  const settled: [number, number][] = [];
  let last = Math.floor(afterSeq);
  for (const r of records) {
    if (r.seq > last + 1) {
      const rows: unknown[] = await em.execute(
        `SELECT seq FROM journal_event WHERE seq BETWEEN ${last + 1} AND ${r.seq - 1} LOCK IN SHARE MODE`,
      );
      if (rows.length === 0) settled.push([last + 1, r.seq - 1]);
    }
    last = Math.max(last, r.seq);
  }
  return settled;
}

/**
 * Seq values are taken at INSERT time but become visible at COMMIT, so a later seq can be seen before an earlier
 * one whose transaction is still open. The projector applies only the gap-free run after its checkpoint; a gap
 * that stays open longer than `timeoutMs` belongs to a transaction that rolled back (its seq is never used) and
 * is skipped.
 */
export class GapPolicy {
  private readonly firstSeen = new Map<number, number>();

  constructor(
    readonly timeoutMs: number,
    private readonly now: () => number = Date.now,
  ) {}

  /** The usable prefix of `records` after `lastSeq`, the checkpoint it reaches, and whether a gap holds it back. */
  contiguous(
    records: readonly JournalRecord[],
    lastSeq: number,
    settled: SettledRanges = [],
  ): { usable: JournalRecord[]; last: number; waiting: boolean } {
    const usable: JournalRecord[] = [];
    let last = lastSeq;
    for (const r of records) {
      if (r.seq <= last) continue;
      const gapSettled = settled.some(([from, to]) => from === last + 1 && to === r.seq - 1);
      if (r.seq !== last + 1 && !gapSettled) {
        const gapStart = last + 1;
        const seen = this.firstSeen.get(gapStart) ?? this.now();
        this.firstSeen.set(gapStart, seen);
        if (this.now() - seen < this.timeoutMs) return { usable, last, waiting: true };
        this.firstSeen.delete(gapStart);
      }
      usable.push(r);
      last = r.seq;
    }
    for (const seq of this.firstSeen.keys()) if (seq <= last) this.firstSeen.delete(seq);
    return { usable, last, waiting: false };
  }
}
