import type { FindKind } from '@shoalbook/shared';
import { useQueryClient } from '@tanstack/react-query';
import { API_BASE } from '../../../lib/api-client';
import { crewApiPath, queryString } from '../../../lib/journal-keys';
import { refreshCrewJournal } from '../../../lib/crew-cache';
import type { CsvPreview, GpxPreview, ImportResult } from '../../../lib/journal-types';
import { uploadFile, type UploadProgress } from '../../../lib/upload';

/** Largest files the import screens send (the server's limits: GPX 20 MB, CSV 5 MB); the server checks again. */
export const MAX_IMPORT_BYTES = { gpx: 20 * 1024 * 1024, csv: 5 * 1024 * 1024 } as const;

export interface GpxTarget {
  lakeId: string;
  eventId?: string;
}

/** POST /finds/import/preview: nothing is written; every waypoint comes back with its error or duplicate. */
export function previewGpx(crewId: string, file: File, target: GpxTarget, onProgress?: (p: UploadProgress) => void) {
  return uploadFile<GpxPreview>(crewApiPath(crewId, `/finds/import/preview${queryString({ ...target })}`), file, {
    onProgress,
  });
}

/** POST /finds/import: all accepted waypoints in one transaction, or none. */
export function commitGpx(
  crewId: string,
  file: File,
  options: GpxTarget & { kind: FindKind; subKind: string; skipDuplicates: boolean },
  onProgress?: (p: UploadProgress) => void,
) {
  const { lakeId, eventId, kind, subKind, skipDuplicates } = options;
  return uploadFile<ImportResult>(crewApiPath(crewId, `/finds/import${queryString({ lakeId, eventId })}`), file, {
    onProgress,
    fields: { kind, subKind, skipDuplicates: String(skipDuplicates) },
  });
}

export function previewCatchesCsv(
  crewId: string,
  file: File,
  eventId: string,
  onProgress?: (p: UploadProgress) => void,
) {
  return uploadFile<CsvPreview>(crewApiPath(crewId, `/catches/import/preview${queryString({ eventId })}`), file, {
    onProgress,
  });
}

export function commitCatchesCsv(
  crewId: string,
  file: File,
  eventId: string,
  onProgress?: (p: UploadProgress) => void,
) {
  return uploadFile<ImportResult>(crewApiPath(crewId, `/catches/import${queryString({ eventId })}`), file, {
    onProgress,
  });
}

/** The CSV header to fill in, as a download link (a plain GET with the session cookie). */
export function catchesTemplateUrl(crewId: string): string {
  return `${API_BASE}${crewApiPath(crewId, '/catches/import/template')}`;
}

/** After an import: the lists it changed must be read again. */
export function useAfterImport(crewId: string) {
  const queryClient = useQueryClient();
  return () => refreshCrewJournal(queryClient, crewId);
}

/** A file the import should refuse before sending it: wrong type or too big. */
export function fileProblem(file: File, kind: 'gpx' | 'csv'): string | null {
  const extension = file.name.toLowerCase().split('.').pop();
  if (kind === 'gpx' && extension !== 'gpx') return 'Choose a GPX file (its name ends in .gpx).';
  if (kind === 'csv' && extension !== 'csv') return 'Choose a CSV file (its name ends in .csv).';
  if (file.size === 0) return 'The file is empty.';
  const limit = MAX_IMPORT_BYTES[kind];
  if (file.size > limit)
    return `The file is ${(file.size / 1024 / 1024).toFixed(1)} MB; the limit is ${limit / 1024 / 1024} MB.`;
  return null;
}
