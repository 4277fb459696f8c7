import { Label } from '@primer/react';
import { createColumnHelper } from '@tanstack/react-table';
import type { UnitPreferences } from '@shoalbook/shared';
import { formatWeight } from '../../../lib/units';
import type { HitRateGroup, Rate } from '../api/report-types';
import { FEW_FINDS, hoursMinutes, percent, percentRange, perHour } from './report-labels';
import { ReportTable } from './report-table';
import styles from './reports.module.css';

const column = createColumnHelper<HitRateGroup>();

/** The numbers behind the hit-rate chart: one row per group, sortable by any column. */
export function HitRatesTable({
  groups,
  catchBased,
  units,
}: {
  groups: HitRateGroup[];
  catchBased: boolean;
  units: UnitPreferences;
}) {
  const columns = catchBased ? catchColumns(units) : findColumns();
  return (
    <ReportTable
      data={groups}
      columns={columns}
      caption={
        catchBased
          ? 'Fish by group. Share of fish: this group’s fish out of all fish, with its likely range; adjusted share pulled toward an even split when few fish stand behind it.'
          : "Hit rates by group. Adjusted rate: pulled toward the crew's overall rate when few finds stand behind a group; rank follows it."
      }
      getRowId={(g) => g.key ?? 'not-recorded'}
      initialSorting={[{ id: 'rank', desc: false }]}
    />
  );
}

/** The group's name, flagged when too few finds or fish stand behind it. */
function groupColumn(count: (g: HitRateGroup) => number, few: string) {
  return column.accessor('label', {
    header: 'Group',
    cell: (info) => (
      <span className={styles.groupCell}>
        {info.getValue()}
        {count(info.row.original) < FEW_FINDS ? (
          <Label variant="attention" size="small">
            {few}
          </Label>
        ) : null}
      </span>
    ),
  });
}

/** A rate, its likely range and its small-sample-adjusted value. */
function rateColumns(
  rate: (g: HitRateGroup) => Rate,
  headers: { id: string; rate: string; range: string; adjusted: string },
) {
  return [
    column.accessor((g) => rate(g).rate, {
      id: headers.id,
      header: headers.rate,
      cell: (info) => percent(info.getValue()),
      meta: { numeric: true },
    }),
    column.accessor((g) => rate(g).upper - rate(g).lower, {
      id: 'interval',
      header: headers.range,
      cell: (info) => percentRange(rate(info.row.original).lower, rate(info.row.original).upper),
      meta: { numeric: true },
    }),
    column.accessor((g) => rate(g).shrunk, {
      id: 'shrunk',
      header: headers.adjusted,
      cell: (info) => percent(info.getValue()),
      meta: { numeric: true },
    }),
  ];
}

const rankColumn = column.accessor('rank', { header: 'Rank', meta: { numeric: true }, sortDescFirst: false });

function findColumns() {
  return [
    groupColumn((g) => g.findsFished, 'few finds'),
    column.accessor('findsFished', { header: 'Fished', meta: { numeric: true } }),
    column.accessor('findsProducing', { header: 'Produced', meta: { numeric: true } }),
    column.accessor('findsWeighed', { header: 'With a counted fish', meta: { numeric: true } }),
    ...rateColumns((g) => g.producing, { id: 'rate', rate: 'Hit rate', range: 'Range', adjusted: 'Adjusted' }),
    rankColumn,
  ];
}

function catchColumns(units: UnitPreferences) {
  return [
    groupColumn((g) => g.fishCount, 'few fish'),
    column.accessor('fishCount', { header: 'Fish', meta: { numeric: true } }),
    column.accessor('weighedCount', { header: 'Counted', meta: { numeric: true } }),
    column.accessor('weightLb', {
      header: 'Weight',
      cell: (info) => formatWeight(info.getValue(), units.weight),
      meta: { numeric: true },
    }),
    ...rateColumns((g) => g.shareOfFish, {
      id: 'share',
      rate: 'Share of fish',
      range: 'Likely range',
      adjusted: 'Adjusted share',
    }),
    rankColumn,
  ];
}

/**
 * Time fished in each group and the fish per hour of it (over the stops logged), beside the hit rates: a table of
 * its own, so the hit-rate table keeps fitting beside its chart. For the find groupings the time is on the group's
 * finds; for the sun-and-moon and clock groupings it is every stop's time within the period or band.
 */
export function HitRatesTimeTable({ groups, catchBased }: { groups: HitRateGroup[]; catchBased: boolean }) {
  return (
    <ReportTable
      data={groups}
      columns={[
        column.accessor('label', { header: 'Group' }),
        column.accessor('secondsFished', {
          header: 'Time fished',
          cell: (info) => (info.getValue() ? hoursMinutes(info.getValue()) : '—'),
          meta: { numeric: true },
        }),
        column.accessor('fishPerHour', {
          header: 'Fish per hour',
          cell: (info) => perHour(info.getValue()),
          meta: { numeric: true },
          sortUndefined: 'last',
        }),
      ]}
      caption={
        catchBased
          ? 'Time on the water in each period, over the stops logged (a stop running across a period edge is split at it), and the fish caught per hour of it. A dash: no stop with a leaving time in it (or figures derived from catches).'
          : 'Time on the finds by group, over the stops logged, and the fish caught per hour of it. A dash: no stop with a leaving time (or figures derived from catches).'
      }
      getRowId={(g) => g.key ?? 'not-recorded'}
    />
  );
}
