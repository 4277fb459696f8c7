import { FIND_KIND_LABELS, type FindKind, type UnitPreferences } from '@shoalbook/shared';
import { Label } from '@primer/react';
import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { DataTable } from '../../../components/data-table/data-table';
import { clockTime, localDate } from '../../../lib/lake-time';
import type { GpxPreviewRow } from '../../../lib/journal-types';
import { formatDepth } from '../../../lib/units';

type RowStatus = 'ready' | 'duplicate' | 'error';

export function rowStatus(row: GpxPreviewRow): RowStatus {
  if (row.error) return 'error';
  if (row.duplicateOf) return 'duplicate';
  return 'ready';
}

const STATUS_TEXT: Record<RowStatus, string> = {
  ready: 'Ready',
  duplicate: 'Near an existing find',
  error: 'Cannot import',
};
const column = createColumnHelper<GpxPreviewRow>();

/** Which find (or which earlier waypoint of the same file) a row sits on top of, and how far away. */
export function duplicateText(row: GpxPreviewRow): string {
  const d = row.duplicateOf;
  if (!d) return '';
  const metres = `${Math.round(d.distanceM)} m`;
  if (d.inFile)
    return `${metres} from waypoint ${d.rowIndex !== undefined ? d.rowIndex + 1 : ''} “${d.name}” earlier in this file`.replace(
      '  ',
      ' ',
    );
  return `${metres} from the find “${d.name}”`;
}

/** What the GPX file holds, waypoint by waypoint: ready, within 15 m of an existing find (which, how far), or refused (why). */
export function GpxPreviewTable({
  rows,
  prefs,
  timeZone,
  defaultKind,
}: {
  rows: GpxPreviewRow[];
  prefs: UnitPreferences;
  timeZone: string;
  /** The kind chosen for the import, for waypoints whose file names none. */
  defaultKind: FindKind;
}) {
  const columns = useMemo(
    () => [
      column.accessor((r) => r.index + 1, { id: 'row', header: 'Waypoint', meta: { numeric: true } }),
      column.accessor('name', { header: 'Name', cell: (info) => info.getValue() || '(no name)' }),
      column.accessor((r) => rowStatus(r), {
        id: 'status',
        header: 'Status',
        meta: {
          filterOptions: (['ready', 'duplicate', 'error'] as const).map((s) => ({ value: s, label: STATUS_TEXT[s] })),
        },
        cell: (info) => {
          const status = info.getValue() as RowStatus;
          return (
            <Label variant={status === 'error' ? 'danger' : status === 'duplicate' ? 'attention' : 'success'}>
              {STATUS_TEXT[status]}
            </Label>
          );
        },
      }),
      column.accessor((r) => r.error ?? duplicateText(r), {
        id: 'detail',
        header: 'Detail',
        enableSorting: false,
      }),
      column.accessor((r) => FIND_KIND_LABELS[r.kind ?? defaultKind] + (r.kind ? ' (from the file)' : ''), {
        id: 'kind',
        header: 'Kind',
      }),
      column.accessor((r) => r.depthFt ?? undefined, {
        id: 'depth',
        header: 'Depth',
        sortUndefined: 'last',
        meta: { numeric: true },
        cell: (info) => formatDepth(info.row.original.depthFt, prefs.depth),
      }),
      column.accessor((r) => r.markedAt ?? undefined, {
        id: 'markedAt',
        header: 'Marked',
        sortUndefined: 'last',
        cell: (info) => {
          const at = info.row.original.markedAt;
          return at ? `${localDate(at, timeZone)} ${clockTime(at, timeZone)}` : '—';
        },
      }),
      column.accessor((r) => (r.lat !== null && r.lon !== null ? `${r.lat.toFixed(5)}, ${r.lon.toFixed(5)}` : '—'), {
        id: 'position',
        header: 'Position',
        enableSorting: false,
      }),
    ],
    [prefs, timeZone, defaultKind],
  );
  return (
    <DataTable
      data={rows}
      columns={columns}
      caption="Waypoints in the file"
      getRowId={(r) => String(r.index)}
      initialSorting={[{ id: 'row', desc: false }]}
      filterPlaceholder="Filter by name or message"
      height={440}
    />
  );
}
