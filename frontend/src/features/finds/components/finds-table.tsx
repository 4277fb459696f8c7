import { FIND_KINDS, FIND_KIND_LABELS, type UnitPreferences } from '@shoalbook/shared';
import { Link as PrimerLink } from '@primer/react';
import { createColumnHelper } from '@tanstack/react-table';
import { useMemo, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { DataTable, type RowSelection } from '../../../components/data-table/data-table';
import { journalPaths } from '../../../config/journal-paths';
import { clockTime, localDate } from '../../../lib/lake-time';
import type { FindWithSky } from '../../../lib/journal-types';
import { formatDepth, formatTemperature } from '../../../lib/units';
import { foundHowLabel, kindLabel, positionText, VEGETATION_LABELS } from './find-labels';

const column = createColumnHelper<FindWithSky>();
const findLabel = (f: FindWithSky) => f.name || 'unnamed find';

/**
 * Every find of a lake or event: sortable by any column, filterable by text and by kind, columns chosen
 * by the reader; virtualised, so a season's thousands of waypoints scroll smoothly.
 */
export function FindsTable({
  crewId,
  finds,
  prefs,
  timeZoneOf,
  toolbar,
  selection,
}: {
  crewId: string;
  finds: FindWithSky[];
  prefs: UnitPreferences;
  /** The lake's zone for a find (times are shown on the lake's clock). */
  timeZoneOf: (find: FindWithSky) => string;
  toolbar?: ReactNode;
  /** Chosen finds for a bulk action (writers only). */
  selection?: Omit<RowSelection<FindWithSky>, 'rowLabel'>;
}) {
  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        enableHiding: false,
        cell: (info) => (
          <PrimerLink as={Link} to={journalPaths.find.href(crewId, info.row.original.id)}>
            {info.getValue() || 'Unnamed find'}
          </PrimerLink>
        ),
      }),
      column.accessor('kind', {
        header: 'Kind',
        cell: (info) => kindLabel(info.getValue()),
        meta: { filterOptions: FIND_KINDS.map((k) => ({ value: k, label: FIND_KIND_LABELS[k] })) },
      }),
      column.accessor('subKind', { header: 'Sub-kind' }),
      column.accessor((f) => f.depthFt ?? undefined, {
        id: 'depth',
        header: 'Depth',
        sortUndefined: 'last',
        meta: { numeric: true },
        cell: (info) => formatDepth(info.row.original.depthFt, prefs.depth),
      }),
      column.accessor((f) => f.hardness ?? undefined, {
        id: 'hardness',
        header: 'Hardness',
        sortUndefined: 'last',
        meta: { numeric: true },
        cell: (info) => info.getValue() ?? '—',
      }),
      column.accessor((f) => (f.vegetationDensity ? VEGETATION_LABELS[f.vegetationDensity] : ''), {
        id: 'vegetation',
        header: 'Vegetation',
      }),
      column.accessor((f) => (f.baitSeen ? 'Yes' : 'No'), { id: 'bait', header: 'Bait' }),
      column.accessor((f) => f.fishMarked ?? undefined, {
        id: 'fishMarked',
        header: 'Fish marked',
        sortUndefined: 'last',
        meta: { numeric: true },
        cell: (info) => info.getValue() ?? '—',
      }),
      column.accessor((f) => f.frequencyKhz ?? undefined, {
        id: 'frequency',
        header: 'kHz',
        sortUndefined: 'last',
        meta: { numeric: true, label: 'Frequency (kHz)' },
        cell: (info) => info.getValue() ?? '—',
      }),
      column.accessor((f) => foundHowLabel(f.foundHow), { id: 'foundHow', header: 'Found by' }),
      column.accessor((f) => f.waterTempF ?? undefined, {
        id: 'waterTemp',
        header: 'Water',
        sortUndefined: 'last',
        meta: { numeric: true, label: 'Water temperature' },
        cell: (info) => formatTemperature(info.row.original.waterTempF, prefs.temperature),
      }),
      column.accessor((f) => f.markedAt ?? undefined, {
        id: 'markedAt',
        header: 'Marked',
        sortUndefined: 'last',
        cell: (info) => {
          const f = info.row.original;
          if (!f.markedAt) return f.practiceDate ?? '—';
          const zone = timeZoneOf(f);
          return `${localDate(f.markedAt, zone)} ${clockTime(f.markedAt, zone)}`;
        },
      }),
      column.accessor((f) => positionText(f.lat, f.lon), { id: 'position', header: 'Position', enableSorting: false }),
      column.accessor('notes', { header: 'Notes', enableSorting: false }),
    ],
    [crewId, prefs, timeZoneOf],
  );
  return (
    <DataTable
      data={finds}
      columns={columns}
      caption="Practice finds"
      getRowId={(f) => f.id}
      initialSorting={[{ id: 'markedAt', desc: true }]}
      initialHidden={{ frequency: false, foundHow: false, waterTemp: false, notes: false, position: false }}
      filterPlaceholder="Filter by name, sub-kind or notes"
      toolbar={toolbar}
      selection={selection ? { ...selection, rowLabel: findLabel } : undefined}
    />
  );
}
