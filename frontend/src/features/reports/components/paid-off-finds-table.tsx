import { Link } from '@primer/react';
import { FIND_KINDS, FIND_KIND_LABELS, type UnitPreferences } from '@shoalbook/shared';
import { createColumnHelper } from '@tanstack/react-table';
import { Link as RouterLink } from 'react-router-dom';
import { DataTable } from '../../../components/data-table/data-table';
import { clockOrDash } from '../../../lib/lake-time';
import { formatDepth, formatTemperature, formatWeight } from '../../../lib/units';
import { FIND_OUTCOMES, type EventFindRow } from '../api/report-types';
import { findHref } from '../report-paths';
import { OutcomeBadge } from './outcome-badge';
import { OUTCOME_LABELS, perHour } from './report-labels';

const column = createColumnHelper<EventFindRow>();

/** How outcomes sort: what paid off most first. */
const OUTCOME_ORDER: Record<string, number> = { weighed: 0, caught: 1, 'fished-blank': 2, 'not-fished': 3 };

/**
 * Every find of an event with what it gave, sortable by any column and filterable by kind, outcome and
 * free text; each name opens the find in the journal.
 */
export function PaidOffFindsTable({
  finds,
  crewId,
  units,
  timeZone,
}: {
  finds: EventFindRow[];
  crewId: string;
  units: UnitPreferences;
  timeZone: string;
}) {
  const columns = [
    column.accessor('name', {
      header: 'Find',
      cell: (info) => (
        <Link as={RouterLink} to={findHref(crewId, info.row.original.findId)}>
          {info.getValue()}
        </Link>
      ),
      enableHiding: false,
    }),
    column.accessor('kind', {
      header: 'Kind',
      cell: (info) => FIND_KIND_LABELS[info.getValue()] ?? info.getValue(),
      meta: { filterOptions: FIND_KINDS.map((k) => ({ value: k, label: FIND_KIND_LABELS[k] })) },
    }),
    column.accessor((f) => f.subKind ?? '', {
      id: 'subKind',
      header: 'Sub-kind',
      cell: (info) => info.getValue() || '—',
    }),
    column.accessor('outcome', {
      header: 'Outcome',
      cell: (info) => <OutcomeBadge outcome={info.getValue()} />,
      sortingFn: (a, b) => OUTCOME_ORDER[a.original.outcome] - OUTCOME_ORDER[b.original.outcome],
      meta: { filterOptions: FIND_OUTCOMES.map((o) => ({ value: o, label: OUTCOME_LABELS[o] })) },
    }),
    column.accessor('stopCount', { header: 'Stops', meta: { numeric: true } }),
    column.accessor('minutesFished', {
      header: 'Time fished',
      cell: (info) => (info.getValue() === null ? '—' : `${info.getValue()} min`),
      meta: { numeric: true },
    }),
    column.accessor('fishCount', { header: 'Fish', meta: { numeric: true } }),
    column.accessor('fishPerHour', {
      header: 'Fish per hour',
      cell: (info) => perHour(info.getValue()),
      meta: { numeric: true },
    }),
    column.accessor('weighedCount', { header: 'Counted', meta: { numeric: true } }),
    column.accessor('weightLb', {
      header: 'Weight',
      cell: (info) => (info.row.original.fishCount ? formatWeight(info.getValue(), units.weight) : '—'),
      meta: { numeric: true },
    }),
    column.accessor('depthFt', {
      header: 'Depth',
      cell: (info) => formatDepth(info.getValue(), units.depth),
      meta: { numeric: true },
      sortUndefined: 'last',
    }),
    column.accessor('hardness', {
      header: 'Hardness',
      cell: (info) => info.getValue() ?? '—',
      meta: { numeric: true },
    }),
    column.accessor('waterTempF', {
      header: 'Water',
      cell: (info) => formatTemperature(info.getValue(), units.temperature),
      meta: { numeric: true },
    }),
    column.accessor('firstBiteAt', { header: 'First bite', cell: (info) => clockOrDash(info.getValue(), timeZone) }),
  ];
  return (
    <DataTable
      data={finds}
      columns={columns}
      caption="Every find of the event with its outcome"
      getRowId={(f) => f.findId}
      initialSorting={[{ id: 'outcome', desc: false }]}
      filterPlaceholder="Filter by name or sub-kind"
      height={560}
    />
  );
}
