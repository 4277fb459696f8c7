import type { EntityManager } from '@mikro-orm/mariadb';
import {
  DUPLICATE_FIND_RADIUS_M,
  type FindImportPreview,
  type FindImportRow,
  type FindKind,
  localDateOf,
} from '@shoalbook/shared';
import { PracticeDay } from '../events/practice-day.entity';
import type { TournamentEvent } from '../events/tournament-event.entity';
import { Find } from '../finds/find.entity';
import type { JournalRecorder } from '../journal-events/journal-events.service';
import type { Lake } from '../lakes/lake.entity';
import { insertRecordsBulk } from './bulk-insert';
import { DuplicateIndex } from './duplicate-index';
import type { GpxWaypoint } from './gpx-parser';

/** Rows of the preview: errors per waypoint, and duplicates of an existing find or an earlier row. */
export async function previewFindImport(
  em: EntityManager,
  crewId: string,
  lake: Lake,
  waypoints: GpxWaypoint[],
): Promise<FindImportPreview> {
  const existing = await em.find(Find, { crewId, lakeId: lake.id }, { fields: ['id', 'name', 'lat', 'lon'] });
  const index = new DuplicateIndex(DUPLICATE_FIND_RADIUS_M, lake.lat);
  for (const f of existing) index.add({ lat: f.lat, lon: f.lon, name: f.name, findId: f.id, rowIndex: null });
  const rows: FindImportRow[] = waypoints.map((w) => {
    const row: FindImportRow = {
      index: w.index,
      name: w.name,
      lat: w.lat,
      lon: w.lon,
      markedAt: w.markedAt,
      depthFt: w.depthFt,
      kind: w.kind,
      notes: w.notes,
      error: w.error,
      duplicateOf: null,
    };
    if (w.error || w.lat === null || w.lon === null) return row;
    const near = index.nearest(w.lat, w.lon);
    if (near) {
      const p = near.point;
      row.duplicateOf = {
        findId: p.findId,
        name: p.name,
        distanceM: Math.round(near.distanceM * 10) / 10,
        ...(p.rowIndex !== null ? { inFile: true, rowIndex: p.rowIndex } : {}),
      };
    } else {
      index.add({ lat: w.lat, lon: w.lon, name: w.name, findId: null, rowIndex: w.index });
    }
    return row;
  });
  const rejected = rows.filter((r) => r.error).length;
  return { rows, accepted: rows.length - rejected, rejected, duplicates: rows.filter((r) => r.duplicateOf).length };
}

export interface FindImportOptions {
  event: TournamentEvent | null;
  kind: FindKind;
  subKind: string;
  skipDuplicates: boolean;
  source: 'gpx' | 'demo';
}

/**
 * Insert the accepted rows of a preview as finds, with a FindAdded journal event each, inside the
 * caller's transaction (all or none). Returns how many were imported and skipped as duplicates.
 */
export async function commitFindImport(
  tx: EntityManager,
  log: JournalRecorder,
  crewId: string,
  lake: Lake,
  waypoints: GpxWaypoint[],
  preview: FindImportPreview,
  options: FindImportOptions,
): Promise<{ imported: number; skipped: number }> {
  const practiceDays = options.event ? await tx.find(PracticeDay, { crewId, eventId: options.event.id }) : [];
  const dayByDate = new Map(practiceDays.map((d) => [d.date, d.id]));
  const now = new Date();
  const finds: Find[] = [];
  let skipped = 0;
  preview.rows.forEach((row, i) => {
    if (row.error) return;
    if (row.duplicateOf && options.skipDuplicates) {
      skipped += 1;
      return;
    }
    const w = waypoints[i]!;
    const markedAt = w.markedAt ? new Date(w.markedAt) : null;
    finds.push(
      Object.assign(new Find(), {
        crewId,
        lakeId: lake.id,
        eventId: options.event?.id ?? null,
        practiceDayId: markedAt ? (dayByDate.get(localDateOf(markedAt, lake.timeZone)) ?? null) : null,
        name: w.name,
        markedAt,
        lat: w.lat!,
        lon: w.lon!,
        depthFt: w.depthFt,
        depthValue: w.depthM,
        depthUnit: w.depthM === null ? null : 'm',
        // A kind named in the file wins (a round trip through our own export), with its own sub-kind.
        kind: w.kind ?? options.kind,
        subKind: w.kind ? w.subKind : options.subKind,
        notes: w.notes,
        source: options.source,
        createdAt: now,
        updatedAt: now,
      }),
    );
  });
  await insertRecordsBulk(tx, log, 'Find', finds, (f) => ({
    type: 'FindAdded',
    aggregateType: 'find',
    aggregateId: f.id,
  }));
  return { imported: finds.length, skipped };
}
