import type { EntityManager } from '@mikro-orm/mariadb';

/** The checkpoint of the journal projection (all read-model tables move together). */
export const JOURNAL_PROJECTION = 'journal';
/** A MariaDB user lock serialising projection work across processes (servers, the rebuild command). */
const LOCK_NAME = 'shoalbook.projections';

/** Runs `work` holding the projection lock on the transaction's connection; null when it is busy after `waitSeconds`. */
export async function withProjectionLock<T>(
  tx: EntityManager,
  waitSeconds: number,
  work: () => Promise<T>,
): Promise<T | null> {
  const [row] = (await tx.execute(
    `SELECT GET_LOCK('${LOCK_NAME}', ${Math.max(0, Math.floor(waitSeconds))}) AS got`,
  )) as { got: unknown }[];
  if (Number(row?.got) !== 1) return null;
  try {
    return await work();
  } finally {
    // Released on this same connection, before it goes back to the pool.
    await tx.execute(`SELECT RELEASE_LOCK('${LOCK_NAME}')`);
  }
}

export async function readCheckpoint(tx: EntityManager): Promise<number> {
  const rows = (await tx.execute(
    `SELECT last_seq FROM projection_checkpoint WHERE name = '${JOURNAL_PROJECTION}'`,
  )) as { last_seq: unknown }[];
  return rows.length ? Number(rows[0]!.last_seq) : 0;
}

export async function writeCheckpoint(tx: EntityManager, lastSeq: number): Promise<void> {
  await tx.execute(
    `INSERT INTO projection_checkpoint (name, last_seq, updated_at) VALUES ('${JOURNAL_PROJECTION}', ${Math.floor(lastSeq)}, UTC_TIMESTAMP(3)) ON DUPLICATE KEY UPDATE last_seq = VALUES(last_seq), updated_at = VALUES(updated_at)`,
  );
}
