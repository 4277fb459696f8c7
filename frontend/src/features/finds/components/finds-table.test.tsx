import type { FindKind, FindView, UnitPreferences } from '@shoalbook/shared';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { withTestViewport } from '../../../components/data-table/test-viewport';
import { renderWithApp } from '../../../testing/render';
import { FindsTable } from './finds-table';

withTestViewport();

let n = 0;
function find(name: string, kind: FindKind, depthFt: number | null, subKind: string, notes = ''): FindView {
  n += 1;
  return {
    id: `f${n}`,
    lakeId: 'l1',
    eventId: null,
    practiceDate: null,
    name,
    markedAt: `2025-04-10T1${n % 10}:00:00Z`,
    lat: 34.5,
    lon: -86.2,
    depthFt,
    kind,
    subKind,
    hardness: null,
    vegetationDensity: null,
    baitSeen: false,
    fishMarked: null,
    frequencyKhz: null,
    foundHow: null,
    waterTempF: null,
    notes,
    photoId: null,
  };
}

const finds = [
  find('North shell bar', 'hard-bottom', 14, 'shell'),
  find('Grass edge', 'vegetation', 8.5, 'eelgrass', 'thick on the inside turn'),
  find('Deep rock', 'hard-bottom', 22, 'rock'),
  find('Bait ball', 'bait', null, 'shad school'),
  find('Creek hump', 'contour', 11, 'hump'),
];
const feet: UnitPreferences = { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' };

const bodyRows = () => within(screen.getByRole('table')).getAllByRole('row').slice(1);
const firstCells = () => bodyRows().map((r) => within(r).getAllByRole('cell')[0].textContent);

describe('FindsTable', () => {
  it('sorts by depth, deepest first on the first click, finds without a depth last either way', async () => {
    const user = userEvent.setup();
    renderWithApp(<FindsTable crewId="c1" finds={finds} prefs={feet} timeZoneOf={() => 'America/Chicago'} />);

    await user.click(screen.getByRole('button', { name: 'Depth' }));
    expect(screen.getByRole('columnheader', { name: /Depth/ })).toHaveAttribute('aria-sort', 'descending');
    expect(firstCells()).toEqual(['Deep rock', 'North shell bar', 'Creek hump', 'Grass edge', 'Bait ball']);

    await user.click(screen.getByRole('button', { name: 'Depth' }));
    expect(screen.getByRole('columnheader', { name: /Depth/ })).toHaveAttribute('aria-sort', 'ascending');
    expect(firstCells()).toEqual(['Grass edge', 'Creek hump', 'North shell bar', 'Deep rock', 'Bait ball']);
  });

  it('filters by free text (name, sub-kind) and by kind, and says how many rows match', async () => {
    const user = userEvent.setup();
    renderWithApp(<FindsTable crewId="c1" finds={finds} prefs={feet} timeZoneOf={() => 'America/Chicago'} />);

    await user.type(screen.getByRole('textbox', { name: 'Filter' }), 'rock');
    expect(firstCells()).toEqual(['Deep rock']);
    expect(screen.getByText('1 of 5 rows match')).toBeInTheDocument();

    await user.clear(screen.getByRole('textbox', { name: 'Filter' }));
    await user.selectOptions(screen.getByRole('combobox', { name: 'Kind' }), 'hard-bottom');
    expect(firstCells().sort()).toEqual(['Deep rock', 'North shell bar']);

    await user.type(screen.getByRole('textbox', { name: 'Filter' }), 'eelgrass');
    expect(bodyRows()).toHaveLength(0);
    expect(screen.getByText(/No rows match the filter/)).toBeInTheDocument();
  });

  it('shows depths in the user’s unit (20 ft = 6.096 m, shown 6.1 m)', () => {
    const metric: UnitPreferences = { weight: 'kg', length: 'mm', depth: 'm', temperature: 'C' };
    renderWithApp(
      <FindsTable
        crewId="c1"
        finds={[find('Twenty-foot shelf', 'contour', 20, 'ledge')]}
        prefs={metric}
        timeZoneOf={() => 'UTC'}
      />,
    );
    expect(within(bodyRows()[0]).getByText('6.1 m')).toBeInTheDocument();
  });

  it('draws only the rows in view when there are thousands', () => {
    const many = Array.from({ length: 5000 }, (_, i) => find(`Waypoint ${i}`, 'hard-bottom', i % 40, 'shell'));
    renderWithApp(<FindsTable crewId="c1" finds={many} prefs={feet} timeZoneOf={() => 'UTC'} />);
    const table = screen.getByRole('table');
    expect(table).toHaveAttribute('aria-rowcount', '5001');
    const drawn = within(table).getAllByRole('row').length - 1;
    expect(drawn).toBeGreaterThan(5);
    expect(drawn).toBeLessThan(100);
    expect(screen.getByText('5000 rows')).toBeInTheDocument();
  });

  it('chooses rows one by one, or every row the filters match at once', async () => {
    const user = userEvent.setup();
    let chosen: Record<string, boolean> = {};
    function Chooser() {
      const [selected, setSelected] = useState<Record<string, boolean>>({});
      chosen = selected;
      return (
        <FindsTable
          crewId="c1"
          finds={finds}
          prefs={feet}
          timeZoneOf={() => 'UTC'}
          selection={{ selected, onChange: setSelected }}
        />
      );
    }
    renderWithApp(<Chooser />);
    await user.click(screen.getByRole('checkbox', { name: 'Select Bait ball' }));
    expect(Object.keys(chosen)).toEqual([finds[3]!.id]);

    await user.selectOptions(screen.getByRole('combobox', { name: 'Kind' }), 'hard-bottom');
    await user.click(screen.getByRole('checkbox', { name: 'Select all 2 rows that match' }));
    expect(Object.keys(chosen).sort()).toEqual([finds[0]!.id, finds[2]!.id, finds[3]!.id].sort());
  });
});
