import type { UnitPreferences } from '@shoalbook/shared';
import { Label } from '@primer/react';
import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { DataTable } from '../../../components/data-table/data-table';
import type { CsvPreviewRow } from '../../../lib/journal-types';
import { clockTime } from '../../../lib/lake-time';
import { formatLength, formatWeight } from '../../../lib/units';

const column = createColumnHelper<CsvPreviewRow>();

/** Which catch, already logged or earlier in this file, a row repeats (same day, minute, species and weight). */
export function duplicateText(row: CsvPreviewRow): string {
  const d = row.duplicateOf;
  if (!d) return '';
  return d.catchId
    ? 'Same day, minute, species and weight as a catch already logged; skipped'
    : `Repeats line ${d.line}; skipped`;
}

/** Every row of a catch CSV as the server read it: its values in the user's units, or what is wrong with it. */
export function CsvPreviewTable({
  rows,
  prefs,
  timeZone,
}: {
  rows: CsvPreviewRow[];
  prefs: UnitPreferences;
  timeZone: string;
}) {
  const columns = useMemo(
    () => [
      column.accessor('line', { header: 'Line', meta: { numeric: true } }),
      column.accessor((r) => (r.errors.length ? 'error' : r.duplicateOf ? 'duplicate' : 'ready'), {
        id: 'status',
        header: 'Status',
        meta: {
          filterOptions: [
            { value: 'ready', label: 'Ready' },
            { value: 'duplicate', label: 'Already logged' },
            { value: 'error', label: 'Needs fixing' },
          ],
        },
        cell: (info) =>
          info.getValue() === 'error' ? (
            <Label variant="danger">Needs fixing</Label>
          ) : info.getValue() === 'duplicate' ? (
            <Label variant="attention">Already logged</Label>
          ) : (
            <Label variant="success">Ready</Label>
          ),
      }),
      column.accessor(
        (r) =>
          r.errors.length
            ? r.errors.map((e) => (e.field ? `${e.field}: ${e.message}` : e.message)).join('; ')
            : duplicateText(r),
        { id: 'problems', header: 'What to look at', enableSorting: false },
      ),
      column.accessor((r) => r.caughtAt ?? '', {
        id: 'caughtAt',
        header: 'Time',
        cell: (info) => (info.getValue() ? clockTime(info.getValue(), timeZone) : '—'),
      }),
      column.accessor((r) => r.species ?? '', { id: 'species', header: 'Species' }),
      column.accessor((r) => r.weightLb ?? undefined, {
        id: 'weight',
        header: 'Weight',
        sortUndefined: 'last',
        meta: { numeric: true },
        cell: (info) => (
          <>
            {formatWeight(info.row.original.weightLb, prefs.weight)}
            {info.row.original.weightFlagged ? (
              <>
                {' '}
                <Label variant="attention">Check this weight</Label>
              </>
            ) : null}
          </>
        ),
      }),
      column.accessor((r) => r.lengthIn ?? undefined, {
        id: 'length',
        header: 'Length',
        sortUndefined: 'last',
        meta: { numeric: true },
        cell: (info) => formatLength(info.row.original.lengthIn, prefs.length),
      }),
      column.accessor(
        (r) =>
          r.attributionDistanceM !== null
            ? `${Math.round(r.attributionDistanceM)} m to a find`
            : r.findId
              ? 'Find by name'
              : '',
        {
          id: 'find',
          header: 'Find',
        },
      ),
    ],
    [prefs, timeZone],
  );
  return (
    <DataTable
      data={rows}
      columns={columns}
      caption="Rows of the CSV file"
      getRowId={(r) => String(r.index)}
      initialSorting={[{ id: 'line', desc: false }]}
      height={400}
    />
  );
}
