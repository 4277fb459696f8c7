import type { FindImportRow, UnitPreferences } from '@shoalbook/shared';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { withTestViewport } from '../../../components/data-table/test-viewport';
import { renderWithApp } from '../../../testing/render';
import { GpxPreviewTable } from './gpx-preview-table';

withTestViewport();

const row = (index: number, name: string, extra: Partial<FindImportRow> = {}): FindImportRow => ({
  index,
  name,
  lat: 34.5 + index / 1000,
  lon: -86.2,
  markedAt: '2025-04-10T13:05:00Z',
  depthFt: 12,
  kind: null,
  notes: '',
  error: null,
  duplicateOf: null,
  ...extra,
});

const rows: FindImportRow[] = [
  row(0, 'Shell flat', { kind: 'hard-bottom' }),
  row(1, 'Old bar', { duplicateOf: { findId: 'f9', name: 'North shell bar', distanceM: 8.6 } }),
  row(2, 'Broken one', {
    lat: null,
    lon: null,
    markedAt: null,
    depthFt: null,
    error: 'Latitude 95.2 is outside -90 to 90.',
  }),
  row(3, 'Shell flat again', {
    duplicateOf: { findId: null, name: 'Shell flat', distanceM: 3.2, inFile: true, rowIndex: 0 },
  }),
];
const prefs: UnitPreferences = { weight: 'lb', length: 'in', depth: 'm', temperature: 'F' };

const rowNamed = (name: string) =>
  screen.getAllByRole('row').find((r) => within(r).queryByText(name, { exact: true }))!;

describe('GpxPreviewTable', () => {
  it('marks each waypoint ready, near an existing find (which, how far) or refused (why)', () => {
    renderWithApp(<GpxPreviewTable rows={rows} prefs={prefs} timeZone="America/Chicago" defaultKind="vegetation" />);

    expect(within(rowNamed('Shell flat')).getByText('Ready')).toBeInTheDocument();
    const dup = rowNamed('Old bar');
    expect(within(dup).getByText('Near an existing find')).toBeInTheDocument();
    expect(within(dup).getByText('9 m from the find “North shell bar”')).toBeInTheDocument();
    const inFile = rowNamed('Shell flat again');
    expect(within(inFile).getByText(/3 m from waypoint 1 “Shell flat” earlier in this file/)).toBeInTheDocument();
    const broken = rowNamed('Broken one');
    expect(within(broken).getByText('Cannot import')).toBeInTheDocument();
    expect(within(broken).getByText('Latitude 95.2 is outside -90 to 90.')).toBeInTheDocument();
  });

  it('shows the kind the file names, and the import’s kind for the waypoints that name none', () => {
    renderWithApp(<GpxPreviewTable rows={rows} prefs={prefs} timeZone="UTC" defaultKind="vegetation" />);
    expect(within(rowNamed('Shell flat')).getByText('Hard bottom (from the file)')).toBeInTheDocument();
    expect(within(rowNamed('Old bar')).getByText('Vegetation')).toBeInTheDocument();
  });

  it('shows depth in the user’s unit and the time on the lake’s clock', () => {
    renderWithApp(<GpxPreviewTable rows={rows} prefs={prefs} timeZone="America/Chicago" defaultKind="vegetation" />);
    const ready = rowNamed('Shell flat');
    // 12 ft × 0.3048 = 3.6576 m; 13:05 UTC is 08:05 CDT
    expect(within(ready).getByText('3.7 m')).toBeInTheDocument();
    expect(within(ready).getByText('2025-04-10 08:05')).toBeInTheDocument();
  });

  it('filters to the rows that need a look', async () => {
    const user = userEvent.setup();
    renderWithApp(<GpxPreviewTable rows={rows} prefs={prefs} timeZone="UTC" defaultKind="vegetation" />);
    await user.selectOptions(screen.getByRole('combobox', { name: 'Status' }), 'error');
    const body = within(screen.getByRole('table')).getAllByRole('row').slice(1);
    expect(body).toHaveLength(1);
    expect(within(body[0]).getByText('Broken one')).toBeInTheDocument();
    expect(screen.getByText('1 of 4 rows match')).toBeInTheDocument();
  });
});
