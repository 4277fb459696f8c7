import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '../../../testing/render';
import type { EventFindRow } from '../api/report-types';
import { withLaidOutElements } from '../testing/report-test-kit';
import { PaidOffFindsTable } from './paid-off-finds-table';

withLaidOutElements(1000, 600);

function row(
  findId: string,
  name: string,
  kind: EventFindRow['kind'],
  outcome: EventFindRow['outcome'],
  fishCount: number,
  weightLb: number,
  depthFt: number | null,
): EventFindRow {
  return {
    findId,
    name,
    kind,
    subKind: '',
    depthFt,
    hardness: 3,
    waterTempF: 84,
    practiced: true,
    fished: outcome !== 'not-fished',
    stopCount: outcome === 'not-fished' ? 0 : 1,
    minutesFished: outcome === 'not-fished' ? 0 : 45,
    fishPerHour: outcome === 'not-fished' ? null : fishCount / 0.75,
    fishCount,
    weighedCount: outcome === 'weighed' ? fishCount : 0,
    weightLb,
    firstBiteAt: null,
    outcome,
  };
}

const finds = [
  row('f1', 'Shell flat', 'hard-bottom', 'weighed', 4, 14.2, 18),
  row('f2', 'Grass line', 'vegetation', 'fished-blank', 0, 0, 7),
  row('f3', 'Rock pile', 'hard-bottom', 'caught', 1, 1.9, 22),
  row('f4', 'Bait ball', 'bait', 'not-fished', 0, 0, null),
  row('f5', 'Channel swing', 'contour', 'weighed', 2, 7.1, 16),
];
const units = { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' } as const;
const names = () =>
  within(screen.getByRole('table'))
    .getAllByRole('row')
    .slice(1)
    .map((r) => within(r).getAllByRole('cell')[0].textContent);

describe('PaidOffFindsTable', () => {
  it('opens with what paid off first and links every find to its journal page', () => {
    renderWithApp(<PaidOffFindsTable finds={finds} crewId="crew-1" units={units} timeZone="America/Chicago" />);
    expect(names().slice(0, 2).sort()).toEqual(['Channel swing', 'Shell flat']);
    expect(names().at(-1)).toBe('Bait ball');
    expect(screen.getByRole('link', { name: 'Rock pile' })).toHaveAttribute('href', '/crews/crew-1/finds/f3');
  });

  it('sorts by fish caught, most first on the first click, then fewest first', async () => {
    const user = userEvent.setup();
    renderWithApp(<PaidOffFindsTable finds={finds} crewId="crew-1" units={units} timeZone="America/Chicago" />);
    await user.click(screen.getByRole('button', { name: 'Fish' }));
    expect(screen.getByRole('columnheader', { name: /^Fish(?! per hour)/ })).toHaveAttribute('aria-sort', 'descending');
    expect(names().slice(0, 3)).toEqual(['Shell flat', 'Channel swing', 'Rock pile']);
    await user.click(screen.getByRole('button', { name: 'Fish' }));
    expect(names().at(-1)).toBe('Shell flat');
  });

  it('filters by outcome and by kind, and by free text', async () => {
    const user = userEvent.setup();
    renderWithApp(<PaidOffFindsTable finds={finds} crewId="crew-1" units={units} timeZone="America/Chicago" />);
    await user.selectOptions(screen.getByRole('combobox', { name: 'Outcome' }), 'weighed');
    expect(names().sort()).toEqual(['Channel swing', 'Shell flat']);
    expect(screen.getByText('2 of 5 rows match')).toBeInTheDocument();
    await user.selectOptions(screen.getByRole('combobox', { name: 'Kind' }), 'hard-bottom');
    expect(names()).toEqual(['Shell flat']);
    await user.selectOptions(screen.getByRole('combobox', { name: 'Outcome' }), '');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Kind' }), '');
    await user.type(screen.getByRole('textbox', { name: 'Filter' }), 'grass');
    expect(names()).toEqual(['Grass line']);
    // The outcome is spelled out, not shown by colour alone.
    expect(within(screen.getByRole('table')).getByText('Fished, no bite')).toBeInTheDocument();
  });
});
