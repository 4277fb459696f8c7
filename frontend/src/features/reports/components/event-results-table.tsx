import type { EventTotals, UnitPreferences } from '@shoalbook/shared';
import { createColumnHelper } from '@tanstack/react-table';
import { formatWeight } from '../../../lib/units';
import type { ComparedEvent } from '../api/report-types';
import { eventLabel } from './lake-comparison-chart';
import { ReportTable } from './report-table';

type EventResultRow = { event: ComparedEvent; result: EventTotals | undefined };
const column = createColumnHelper<EventResultRow>();

/**
 * How each event on the lake went against its own field (the place and weights from the results sheet), so a
 * hit rate from a hard event is not read like one from an easy one.
 */
export function EventResultsTable({
  events,
  results,
  units,
}: {
  events: ComparedEvent[];
  results: Record<string, EventTotals>;
  units: UnitPreferences;
}) {
  const columns = [
    column.accessor((r) => eventLabel(r.event), { id: 'event', header: 'Event' }),
    column.accessor((r) => r.result?.officialLb ?? null, {
      id: 'bag',
      header: 'Bags in all',
      sortUndefined: 'last',
      cell: ({ row: { original: r } }) => {
        if (!r.result) return '—';
        const ours = r.result.differenceLb !== 0 ? `; our count ${formatWeight(r.result.netLb, units.weight)}` : '';
        return `${formatWeight(r.result.officialLb, units.weight)}${ours}`;
      },
      meta: { numeric: true },
    }),
    column.accessor((r) => r.result?.finalPlace ?? null, {
      id: 'place',
      header: 'Final place',
      sortUndefined: 'last',
      cell: ({ row: { original: r } }) => r.result?.standing.place ?? '—',
      meta: { numeric: true },
    }),
    column.accessor((r) => r.result?.standing.readings.slice(r.result.standing.place ? 1 : 0).join('; ') || '—', {
      id: 'field',
      header: 'Against the field',
      enableSorting: false,
    }),
  ];
  return (
    <ReportTable
      data={events.map((event) => ({ event, result: results[event.id] }))}
      columns={columns}
      caption="Each event's counted bags (official weights where recorded) and its final place against the field entered from the results sheet."
      getRowId={(r) => r.event.id}
    />
  );
}
