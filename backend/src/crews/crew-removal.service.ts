import { EntityManager } from '@mikro-orm/mariadb';
import { HttpStatus, Injectable, Logger } from '@nestjs/common';
import { Catch } from '../catches/catch.entity';
import { ApiException, ErrorCode } from '../common/errors/api-errors';
import { CompetitionDay } from '../events/competition-day.entity';
import { PracticeDay } from '../events/practice-day.entity';
import { TournamentEvent } from '../events/tournament-event.entity';
import { Find } from '../finds/find.entity';
import { JournalEvent } from '../journal-events/journal-event.entity';
import { Lake } from '../lakes/lake.entity';
import { Photo } from '../photos/photo.entity';
import { JournalProjector } from '../projections/journal-projector.service';
import { withProjectionLock } from '../projections/projection-lock';
import { StorageService } from '../storage/storage.service';
import { Stop } from '../stops/stop.entity';
import { WeighIn } from '../weigh-ins/weigh-in.entity';
import { Crew } from './crew.entity';
import { Invite } from './invite.entity';
import { Membership } from './membership.entity';

/**
 * Tables with foreign keys among themselves, children first (the journal's references are RESTRICT, so
 * the order matters). Every other table with a crew_id column (the read models) is found at run time.
 */
const ORDERED_ENTITIES = [
  Stop,
  Catch,
  WeighIn,
  Find,
  CompetitionDay,
  PracticeDay,
  TournamentEvent,
  Photo,
  Lake,
  JournalEvent,
  Invite,
  Membership,
];

/** How long a removal waits for a running projection batch to finish (s). */
const PROJECTION_LOCK_WAIT_S = 30;
const TABLE_NAME = /^[A-Za-z0-9_]+$/;

/** Removes a crew with everything it holds: journal rows, read-model rows, memberships, invites and photo files. */
@Injectable()
export class CrewRemovalService {
  private readonly logger = new Logger(CrewRemovalService.name);

  constructor(
    private readonly em: EntityManager,
    private readonly storage: StorageService,
    private readonly projector: JournalProjector,
  ) {}

  /**
   * Run `work` in one transaction that holds the projection lock, so no projection batch writes rows of a
   * crew while it goes. Inside, `purge(crewId)` deletes every row of that crew; the photo files go after
   * the commit (a rolled-back removal keeps them).
   */
  async run<T>(work: (tx: EntityManager, purge: (crewId: string) => Promise<void>) => Promise<T>): Promise<T> {
    // Apply pending journal events first, so the rows removed below leave no gap for the projector to wait out.
    if (this.projector.enabled) await this.projector.requestCatchUp().catch(() => undefined);
    const storageKeys: string[] = [];
    const outcome = await this.em.fork().transactional((tx) =>
      withProjectionLock(tx, PROJECTION_LOCK_WAIT_S, async () => ({
        value: await work(tx, async (crewId) => {
          storageKeys.push(...(await purgeCrewRows(tx, crewId)));
        }),
      })),
    );
    if (!outcome)
      throw new ApiException(
        HttpStatus.SERVICE_UNAVAILABLE,
        'The reports are being rebuilt. Try again in a minute.',
        ErrorCode.dbUnavailable,
      );
    for (const key of storageKeys) {
      await this.storage
        .delete(key)
        .catch((e: unknown) =>
          this.logger.error(
            `photo file ${key} of a removed crew stayed: ${e instanceof Error ? e.message : String(e)}`,
          ),
        );
    }
    return outcome.value;
  }
}

/** The names of the tables that have a crew_id column, read from the schema (read models included). */
export async function crewScopedTables(tx: EntityManager): Promise<string[]> {
  const rows: { table_name?: string; TABLE_NAME?: string }[] = await tx.execute(
    `SELECT c.table_name AS table_name FROM information_schema.columns c JOIN information_schema.tables t
       ON t.table_schema = c.table_schema AND t.table_name = c.table_name
     WHERE c.table_schema = DATABASE() AND c.column_name = 'crew_id' AND t.table_type = 'BASE TABLE' ORDER BY c.table_name`,
  );
  return rows.map((r) => String(r.table_name ?? r.TABLE_NAME));
}

/** A table name from our metadata or the schema, checked and quoted for SQL. */
function quoted(table: string): string {
  if (!TABLE_NAME.test(table)) throw new Error(`unexpected table name ${table}`);
  return `\`${table}\``;
}

/** Delete every row of `crewId` inside the caller's transaction; returns the storage keys of its photos. */
async function purgeCrewRows(tx: EntityManager, crewId: string): Promise<string[]> {
  const meta = tx.getMetadata();
  const crews = quoted(meta.get(Crew.name).tableName);
  if (!(await tx.execute(`SELECT id FROM ${crews} WHERE id = ? FOR UPDATE`, [crewId])).length) return [];
  const photos: { storage_key: string }[] = await tx.execute(
    `SELECT storage_key FROM ${quoted(meta.get(Photo.name).tableName)} WHERE crew_id = ?`,
    [crewId],
  );
  const ordered = ORDERED_ENTITIES.map((e) => meta.get(e.name).tableName);
  const rest = (await crewScopedTables(tx)).filter((t) => !ordered.includes(t));
  for (const table of [...ordered, ...rest])
    await tx.execute(`DELETE FROM ${quoted(table)} WHERE crew_id = ?`, [crewId]);
  await tx.execute(`DELETE FROM ${crews} WHERE id = ?`, [crewId]);
  return photos.map((p) => p.storage_key);
}
