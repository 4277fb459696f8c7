import { createColumnHelper } from '@tanstack/react-table';
import type { ComparedEvent, LakeComparisonGroup } from '../api/report-types';
import { eventLabel } from './lake-comparison-chart';
import { percent, percentRange } from './report-labels';
import { ReportTable } from './report-table';

const column = createColumnHelper<LakeComparisonGroup>();

/** One row per group, one column per event: rate, likely range and how many finds were fished. */
export function LakeComparisonTable({ events, groups }: { events: ComparedEvent[]; groups: LakeComparisonGroup[] }) {
  const columns = [
    column.accessor('label', { header: 'Group' }),
    ...events.map((event) =>
      column.accessor((g) => g.perEvent[event.id]?.rate ?? null, {
        id: event.id,
        header: eventLabel(event),
        sortUndefined: 'last',
        cell: (info) => {
          const rate = info.row.original.perEvent[event.id];
          if (!rate || rate.findsFished === 0) return '—';
          return `${percent(rate.rate)} (${percentRange(rate.lower, rate.upper)}; ${rate.successes} of ${rate.findsFished})`;
        },
        meta: { numeric: true },
      }),
    ),
  ];
  return (
    <ReportTable
      data={groups}
      columns={columns}
      caption="Hit rate per event: share of finds fished that produced, likely range, and produced of fished."
      getRowId={(g) => g.key ?? 'not-recorded'}
    />
  );
}
