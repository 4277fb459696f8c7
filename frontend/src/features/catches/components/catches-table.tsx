import { SPECIES, SPECIES_LABELS, FATES, type FindView, type UnitPreferences } from '@shoalbook/shared';
import { PencilIcon } from '@primer/octicons-react';
import { IconButton, Label, Link as PrimerLink } from '@primer/react';
import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { DataTable } from '../../../components/data-table/data-table';
import { EmptyState } from '../../../components/feedback/query-states';
import { DeleteRecordButton } from '../../../components/journal-forms/confirm-delete-dialog';
import { solunarText, solunarWord } from '../../../components/sky/solunar-label';
import { journalPaths } from '../../../config/journal-paths';
import { clockTime } from '../../../lib/lake-time';
import type { CatchWithSky } from '../../../lib/journal-types';
import { formatDepth, formatLength, formatTemperature, formatWeight } from '../../../lib/units';
import { useDeleteCatch } from '../api/catches-api';
import styles from './catches-table.module.css';
import { FATE_SHORT } from './catch-labels';
import { catchName } from './catch-names';

const SOLUNAR_OPTIONS = ['Major', 'Minor', 'Outside'].map((w) => ({ value: w, label: w }));

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
      column.accessor('caughtAt', {
        header: 'Time',
        enableHiding: false,
        // The time opens the catch: its sun and moon, its photo, and (for writers) the edit form.
        cell: (info) => (
          <PrimerLink as={Link} to={journalPaths.catch.href(crewId, info.row.original.id)}>
            {clockTime(info.getValue(), timeZone)}
          </PrimerLink>
        ),
      }),
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
      column.accessor((c) => (c.findId ? (findNames.get(c.findId) ?? 'Find') : ''), {
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
      column.accessor((c) => c.loggedBy?.name ?? '', {
        id: 'loggedBy',
        header: 'Logged by',
        cell: (info) => info.getValue() || '—',
      }),
      column.accessor((c) => solunarWord(c.sky), {
        id: 'solunar',
        header: 'Solunar',
        meta: { filterOptions: SOLUNAR_OPTIONS, label: 'Solunar period' },
        cell: (info) => <span title={solunarText(info.row.original.sky, timeZone)}>{info.getValue()}</span>,
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
              cell: (info) => {
                const c = info.row.original;
                const name = catchName(c, prefs, timeZone);
                return (
                  <span className={styles.rowActions}>
                    <IconButton
                      as={Link}
                      to={journalPaths.catch.href(crewId, c.id)}
                      icon={PencilIcon}
                      size="small"
                      variant="invisible"
                      aria-label={`Edit ${name}`}
                    />
                    <DeleteRecordButton
                      compact
                      record={name}
                      consequence="The day's counted bag and weigh-in are worked out again without it."
                      onDelete={() => remove.mutateAsync(c.id)}
                    />
                  </span>
                );
              },
            }),
          ]
        : []),
    ],
    [crewId, findNames, prefs, timeZone, canWrite, remove],
  );
  if (catches.length === 0) {
    return (
      <EmptyState title="No catches logged yet">
        {canWrite
          ? 'Log each fish with the form above: time, weight and the find it came from.'
          : 'Catches appear here once an angler logs them.'}
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
