import type { CatchImportRow, UnitPreferences } from '@shoalbook/shared';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { withTestViewport } from '../../../components/data-table/test-viewport';
import { renderWithApp } from '../../../testing/render';
import { CsvPreviewTable } from './csv-preview-table';

withTestViewport();

const row = (line: number, extra: Partial<CatchImportRow> = {}): CatchImportRow => ({
  index: line - 2,
  line,
  caughtAt: '2024-04-12T12:30:00Z',
  species: 'largemouth',
  weightLb: 3.25,
  lengthIn: 18,
  findId: null,
  attributionDistanceM: null,
  weightFlagged: false,
  duplicateOf: null,
  errors: [],
  ...extra,
});
const prefs: UnitPreferences = { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' };
const rowOfLine = (line: number) =>
  screen.getAllByRole('row').find((r) => within(r).queryByText(String(line), { exact: true }))!;

describe('CsvPreviewTable', () => {
  it('marks rows ready, already logged (which) or needing a fix (why)', () => {
    renderWithApp(
      <CsvPreviewTable
        rows={[
          row(2),
          row(3, { duplicateOf: { catchId: 'c1' } }),
          row(4, { duplicateOf: { catchId: null, line: 2 } }),
          row(5, { errors: [{ field: 'species', message: 'must be one of …' }] }),
        ]}
        prefs={prefs}
        timeZone="America/Chicago"
      />,
    );
    expect(within(rowOfLine(2)).getByText('Ready')).toBeInTheDocument();
    expect(within(rowOfLine(3)).getByText('Already logged')).toBeInTheDocument();
    expect(within(rowOfLine(3)).getByText(/as a catch already logged; skipped/)).toBeInTheDocument();
    expect(within(rowOfLine(4)).getByText('Repeats line 2; skipped')).toBeInTheDocument();
    expect(within(rowOfLine(5)).getByText('Needs fixing')).toBeInTheDocument();
    expect(within(rowOfLine(5)).getByText('species: must be one of …')).toBeInTheDocument();
  });
});
