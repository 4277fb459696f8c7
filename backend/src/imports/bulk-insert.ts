import type { EntityManager } from '@mikro-orm/mariadb';
import type { JournalChange, JournalRecorder } from '../journal-events/journal-events.service';
import { recordState } from '../journal-events/record-state';

export const BULK_CHUNK = 1000;

/**
 * Insert many new records with multi-row INSERTs (1,000 rows a statement) and queue one journal event

 * per record with its full state (unless `change` is null: parts journaled with their aggregate); both inside the caller's transaction. The ORM's unit of work is not
 * involved, so 10,000 rows cost ten statements rather than ten thousand.
 */
export async function insertRecordsBulk<T extends object>(
  tx: EntityManager,
  log: JournalRecorder,
  entityName: string,
  records: T[],
  change: ((record: T, state: Record<string, unknown>) => Omit<JournalChange, 'payload'>) | null,
): Promise<void> {
  const meta = tx.getMetadata().get(entityName);
  for (let i = 0; i < records.length; i += BULK_CHUNK) {
    const chunk = records.slice(i, i + BULK_CHUNK);
    const rows = chunk.map((r) => {
      const row: Record<string, unknown> = {};
      for (const prop of meta.props) row[prop.name] = (r as Record<string, unknown>)[prop.name] ?? null;
      return row;
    });
    await tx.insertMany(entityName, rows);
  }
  if (!change) return;
  for (const r of records) {
    const state = recordState(tx, entityName, r);
    log.record({ ...change(r, state), payload: state });
  }
}
