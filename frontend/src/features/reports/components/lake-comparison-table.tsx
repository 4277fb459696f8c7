import { createColumnHelper } from '@tanstack/react-table';
import type { ComparedEvent, LakeComparisonGroup } from '../api/report-types';
import { eventLabel } from './lake-comparison-chart';
import { percent, percentRange, perHour } from './report-labels';
import { ReportTable } from './report-table';

const column = createColumnHelper<LakeComparisonGroup>();

/** One row per group, one column per event: rate, likely range and how many finds were fished. */
export function LakeComparisonTable({ events, groups }: { events: ComparedEvent[]; groups: LakeComparisonGroup[] }) {
  const columns = [
    column.accessor('label', { header: 'Group' }),
    ...events.map((event) =>
      column.accessor((g) => g.perEvent[event.id]?.rate ?? null, {
        id: event.id,
        // The header says when an event's "fished" is derived from catches (no stops logged).
        header: event.derivedFromCatches ? `${eventLabel(event)} (derived from catches)` : eventLabel(event),
        sortUndefined: 'last',
        cell: (info) => {
          const rate = info.row.original.perEvent[event.id];
          if (!rate || rate.findsFished === 0) return '—';
          const hourly = rate.fishPerHour !== null ? `; ${perHour(rate.fishPerHour)}` : '';
          return `${percent(rate.rate)} (${percentRange(rate.lower, rate.upper)}; ${rate.successes} of ${rate.findsFished}${hourly})`;
        },
        meta: { numeric: true },
      }),
    ),
  ];
  return (
    <ReportTable
      data={groups}
      columns={columns}
      caption="Hit rate per event: share of finds fished that produced, likely range, produced of fished, and fish per hour fished where stops were logged."
      getRowId={(g) => g.key ?? 'not-recorded'}
    />
  );
}
