import { SPECIES, SPECIES_LABELS, FATES, type FindView, type UnitPreferences } from '@shoalbook/shared';
import { TrashIcon } from '@primer/octicons-react';
import { IconButton, Label } from '@primer/react';
import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { DataTable } from '../../../components/data-table/data-table';
import { EmptyState } from '../../../components/feedback/query-states';
import { clockTime } from '../../../lib/lake-time';
import type { CatchWithSky } from '../../../lib/journal-types';
import { formatDepth, formatLength, formatTemperature, formatWeight } from '../../../lib/units';
import { useDeleteCatch } from '../api/catches-api';
import { FATE_SHORT } from './catch-labels';

const column = createColumnHelper<CatchWithSky>();

/** The catches of a day or an event, in the user's units, with a badge where the weight needs a second look. */
export function CatchesTable({
  crewId,
  catches,
  finds,
  prefs,
  timeZone,
  canWrite,
  caption = 'Catches',
}: {
  crewId: string;
  catches: CatchWithSky[];
  finds: FindView[];
  prefs: UnitPreferences;
  timeZone: string;
  canWrite: boolean;
  caption?: string;
}) {
  const remove = useDeleteCatch(crewId);
  const findNames = useMemo(() => new Map(finds.map((f) => [f.id, f.name])), [finds]);
  const columns = useMemo(
    () => [
      column.accessor('caughtAt', { header: 'Time', cell: (info) => clockTime(info.getValue(), timeZone) }),
      column.accessor('competitionDate', { header: 'Day' }),
      column.accessor('species', {
        header: 'Species',
        cell: (info) => SPECIES_LABELS[info.getValue()],
        meta: { filterOptions: SPECIES.map((s) => ({ value: s, label: SPECIES_LABELS[s] })) },
      }),
      column.accessor('weightLb', {
        header: 'Weight',
        meta: { numeric: true },
        cell: (info) => (
          <>
            {formatWeight(info.getValue(), prefs.weight)}
            {info.row.original.weightFlagged ? (
              <>
                {' '}
                <Label variant="attention" size="small">
                  Check this weight
                </Label>
              </>
            ) : null}
          </>
        ),
      }),
      column.accessor((c) => c.lengthIn ?? undefined, {
        id: 'length',
        header: 'Length',
        sortUndefined: 'last',
        meta: { numeric: true },
        cell: (info) => formatLength(info.row.original.lengthIn, prefs.length),
      }),
      column.accessor((c) => (c.findId ? findNames.get(c.findId) ?? 'Find' : ''), {
        id: 'find',
        header: 'Find',
        cell: (info) => {
          const c = info.row.original;
          if (!c.findId) return '—';
          const name = findNames.get(c.findId) ?? 'Find';
          return c.attributionDistanceM !== null ? `${name} (${Math.round(c.attributionDistanceM)} m)` : name;
        },
      }),
      column.accessor('fate', {
        header: 'Fate',
        cell: (info) => FATE_SHORT[info.getValue()],
        meta: { filterOptions: FATES.map((f) => ({ value: f, label: FATE_SHORT[f] })) },
      }),
      column.accessor('lure', { header: 'Lure' }),
      column.accessor('technique', { header: 'Technique' }),
      column.accessor((c) => c.depthFt ?? undefined, {
        id: 'depth',
        header: 'Depth',
        sortUndefined: 'last',
        meta: { numeric: true },
        cell: (info) => formatDepth(info.row.original.depthFt, prefs.depth),
      }),
      column.accessor((c) => c.waterTempF ?? undefined, {
        id: 'waterTemp',
        header: 'Water',
        sortUndefined: 'last',
        meta: { numeric: true, label: 'Water temperature' },
        cell: (info) => formatTemperature(info.row.original.waterTempF, prefs.temperature),
      }),
      ...(canWrite
        ? [
            column.display({
              id: 'actions',
              header: 'Actions',
              meta: { label: 'Actions' },
              enableHiding: false,
              cell: (info) => (
                <IconButton
                  icon={TrashIcon}
                  size="small"
                  variant="invisible"
                  aria-label={`Delete the catch at ${clockTime(info.row.original.caughtAt, timeZone)}`}
                  onClick={() => {
                    if (window.confirm('Delete this catch? Its weigh-in is recounted.')) remove.mutate(info.row.original.id);
                  }}
                />
              ),
            }),
          ]
        : []),
    ],
    [findNames, prefs, timeZone, canWrite, remove],
  );
  if (catches.length === 0) {
    return (
      <EmptyState title="No catches logged yet">
        {canWrite ? 'Log each fish with the form above: time, weight and the find it came from.' : 'Catches appear here once an angler logs them.'}
      </EmptyState>
    );
  }
  return (
    <DataTable
      data={catches}
      columns={columns}
      caption={caption}
      getRowId={(c) => c.id}
      initialSorting={[{ id: 'caughtAt', desc: false }]}
      initialHidden={{ competitionDate: false, technique: false, depth: false, waterTemp: false }}
      filterPlaceholder="Filter by lure, technique or find"
      height={420}
    />
  );
}
