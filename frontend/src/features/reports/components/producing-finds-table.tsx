import { Link } from '@primer/react';
import { FIND_KIND_LABELS, type UnitPreferences } from '@shoalbook/shared';
import { createColumnHelper } from '@tanstack/react-table';
import { Link as RouterLink } from 'react-router-dom';
import { formatWeight } from '../../../lib/units';
import type { EventRecap } from '../api/report-types';
import { findHref } from '../report-paths';
import { ReportTable } from './report-table';

type ProducingFind = EventRecap['producingFinds'][number];
const column = createColumnHelper<ProducingFind>();

/** The finds that gave fish during the event, heaviest first, each linking to the find. */
export function ProducingFindsTable({
  finds,
  crewId,
  units,
}: {
  finds: ProducingFind[];
  crewId: string;
  units: UnitPreferences;
}) {
  const columns = [
    column.accessor('name', {
      header: 'Find',
      cell: (info) => (
        <Link as={RouterLink} to={findHref(crewId, info.row.original.findId)}>
          {info.getValue()}
        </Link>
      ),
    }),
    column.accessor((f) => FIND_KIND_LABELS[f.kind] ?? f.kind, { id: 'kind', header: 'Kind' }),
    column.accessor((f) => f.subKind ?? '—', { id: 'subKind', header: 'Sub-kind' }),
    column.accessor('fishCount', { header: 'Fish', meta: { numeric: true } }),
    column.accessor('weightLb', {
      header: 'Weight',
      cell: (info) => formatWeight(info.getValue(), units.weight),
      meta: { numeric: true },
    }),
  ];
  return (
    <ReportTable
      data={finds}
      columns={columns}
      caption="Finds that produced fish during the event."
      getRowId={(f) => f.findId}
      initialSorting={[{ id: 'weightLb', desc: true }]}
    />
  );
}
