import { Label } from '@primer/react';
import { createColumnHelper } from '@tanstack/react-table';
import type { UnitPreferences } from '@shoalbook/shared';
import { formatWeight } from '../../../lib/units';
import type { HitRateGroup } from '../api/report-types';
import { FEW_FINDS, percent, percentRange } from './report-labels';
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

function findColumns() {
  return [
    column.accessor('label', {
      header: 'Group',
      cell: (info) => (
        <span className={styles.groupCell}>
          {info.getValue()}
          {info.row.original.findsFished < FEW_FINDS ? (
            <Label variant="attention" size="small">
              few finds
            </Label>
          ) : null}
        </span>
      ),
    }),
    column.accessor('findsFished', { header: 'Fished', meta: { numeric: true } }),
    column.accessor('findsProducing', { header: 'Produced', meta: { numeric: true } }),
    column.accessor('findsWeighed', { header: 'Weighed', meta: { numeric: true } }),
    column.accessor((g) => g.producing.rate, {
      id: 'rate',
      header: 'Hit rate',
      cell: (info) => percent(info.getValue()),
      meta: { numeric: true },
    }),
    column.accessor((g) => g.producing.upper - g.producing.lower, {
      id: 'interval',
      header: 'Range',
      cell: (info) => percentRange(info.row.original.producing.lower, info.row.original.producing.upper),
      meta: { numeric: true },
    }),
    column.accessor((g) => g.producing.shrunk, {
      id: 'shrunk',
      header: 'Adjusted',
      cell: (info) => percent(info.getValue()),
      meta: { numeric: true },
    }),
    rankColumn,
  ];
}

const rankColumn = column.accessor('rank', { header: 'Rank', meta: { numeric: true }, sortDescFirst: false });

function catchColumns(units: UnitPreferences) {
  return [
    column.accessor('label', {
      header: 'Group',
      cell: (info) => (
        <span className={styles.groupCell}>
          {info.getValue()}
          {info.row.original.fishCount < FEW_FINDS ? (
            <Label variant="attention" size="small">
              few fish
            </Label>
          ) : null}
        </span>
      ),
    }),
    column.accessor('fishCount', { header: 'Fish', meta: { numeric: true } }),
    column.accessor('weighedCount', { header: 'Weighed', meta: { numeric: true } }),
    column.accessor('weightLb', {
      header: 'Weight',
      cell: (info) => formatWeight(info.getValue(), units.weight),
      meta: { numeric: true },
    }),
    column.accessor((g) => g.shareOfFish.rate, {
      id: 'share',
      header: 'Share of fish',
      cell: (info) => percent(info.getValue()),
      meta: { numeric: true },
    }),
    column.accessor((g) => g.shareOfFish.upper - g.shareOfFish.lower, {
      id: 'interval',
      header: 'Likely range',
      cell: (info) => percentRange(info.row.original.shareOfFish.lower, info.row.original.shareOfFish.upper),
      meta: { numeric: true },
    }),
    column.accessor((g) => g.shareOfFish.shrunk, {
      id: 'shrunk',
      header: 'Adjusted share',
      cell: (info) => percent(info.getValue()),
      meta: { numeric: true },
    }),
    rankColumn,
  ];
}
