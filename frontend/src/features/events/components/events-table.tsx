import type { EventView, LakeView } from '@shoalbook/shared';
import { Button, Link as PrimerLink } from '@primer/react';
import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { DataTable } from '../../../components/data-table/data-table';
import { EmptyState, ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { journalPaths } from '../../../config/journal-paths';
import { dayLabel } from '../../../lib/lake-time';
import { useUnitPreferences } from '../../../lib/journal-access';
import { formatWeight } from '../../../lib/units';
import { useEventTallies, useEvents } from '../api/events-api';

const column = createColumnHelper<EventView>();

/** Events of one lake (or of every lake), newest first, sortable and filterable. */
export function EventsTable({
  crewId,
  lakeId,
  lakes,
  canWrite,
}: {
  crewId: string;
  lakeId?: string;
  lakes: LakeView[];
  canWrite: boolean;
}) {
  const events = useEvents(crewId, lakeId);
  const tallies = useEventTallies(crewId, lakeId);
  const prefs = useUnitPreferences();
  const lakeNames = useMemo(() => new Map(lakes.map((l) => [l.id, l.name])), [lakes]);
  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Event',
        enableHiding: false,
        cell: (info) => (
          <PrimerLink as={Link} to={journalPaths.event.href(crewId, info.row.original.id)}>
            {info.getValue()}
          </PrimerLink>
        ),
      }),
      column.accessor((e) => e.competitionDates[0] ?? e.practiceDates[0] ?? '', {
        id: 'firstDay',
        header: 'Competition',
        cell: (info) => {
          const e = info.row.original;
          if (!e.competitionDates.length) return '—';
          const first = dayLabel(e.competitionDates[0]);
          return e.competitionDates.length > 1 ? `${first} + ${e.competitionDates.length - 1} more` : first;
        },
      }),
      column.accessor((e) => lakeNames.get(e.lakeId) ?? '', {
        id: 'lake',
        header: 'Lake',
        meta: lakeId ? undefined : { filterOptions: lakes.map((l) => ({ value: l.name, label: l.name })) },
      }),
      column.accessor('organiser', { header: 'Organiser' }),
      column.accessor((e) => e.practiceDates.length, {
        id: 'practice',
        header: 'Practice days',
        meta: { numeric: true },
      }),
      column.accessor((e) => tallies.data?.get(e.id)?.fishCaught, {
        id: 'fish',
        header: 'Fish',
        meta: { numeric: true, label: 'Fish caught (counted)' },
        sortUndefined: 'last',
        cell: (info) => {
          const t = tallies.data?.get(info.row.original.id);
          return t ? `${t.fishCaught} (${t.fishCounted} counted)` : '—';
        },
      }),
      column.accessor((e) => tallies.data?.get(e.id)?.totalLb, {
        id: 'weight',
        header: 'Weight',
        meta: { numeric: true, label: 'Total weight' },
        sortUndefined: 'last',
        cell: (info) => {
          const t = tallies.data?.get(info.row.original.id);
          if (!t || (t.fishCaught === 0 && t.totalLb === 0)) return '—';
          return `${formatWeight(t.totalLb, prefs.weight)}${t.allOfficial ? ' (official)' : ''}`;
        },
      }),
      column.accessor('finalPlace', {
        header: 'Final place',
        meta: { numeric: true },
        cell: (info) => info.getValue() ?? '—',
        sortUndefined: 'last',
      }),
    ],
    [crewId, lakeNames, lakes, lakeId, tallies.data, prefs],
  );

  if (events.isPending) return <LoadingState label="Loading events…" />;
  if (events.isError) return <ErrorState error={events.error} onRetry={() => events.refetch()} />;
  if (events.data.length === 0) {
    return (
      <EmptyState
        title="No events yet"
        action={
          canWrite && lakes.length ? (
            <Button as={Link} to={journalPaths.newEvent.href(crewId, lakeId)} variant="primary">
              Add an event
            </Button>
          ) : undefined
        }
      >
        {lakes.length
          ? 'Add an event with its practice and competition days and its rules; catches and weigh-ins are logged per day.'
          : 'Add a lake first; every event takes place on one.'}
      </EmptyState>
    );
  }
  return (
    <DataTable
      data={events.data}
      columns={columns}
      caption="Events"
      getRowId={(e) => e.id}
      initialSorting={[{ id: 'firstDay', desc: true }]}
      initialHidden={{ lake: !lakeId, practice: false, organiser: false }}
      filterPlaceholder="Filter by name or organiser"
      height={400}
    />
  );
}
