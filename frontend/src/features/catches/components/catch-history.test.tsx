import type { CatchHistoryField, RecordChange, UnitPreferences } from '@shoalbook/shared';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { fakeNetwork } from '../../../testing/fake-network';
import { renderWithApp } from '../../../testing/render';
import { CatchHistory } from './catch-history';

const prefs: UnitPreferences = { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' };
const path = 'GET /api/crews/c1/catches/k1/history';
// 12:45 and 19:02 UTC are 07:45 and 14:02 in Chicago on 12 April 2025, and 15:30 UTC on the 13th is 10:30
// there (CDT, UTC−5, IANA tz database).
const changes: RecordChange<CatchHistoryField>[] = [
  { field: 'weightLb', from: null, to: 3.45, at: '2025-04-12T12:45:00.000Z', byName: 'Dana Whitlock', first: true },
  { field: 'weightLb', from: 3.45, to: 3.54, at: '2025-04-12T19:02:00.000Z', byName: 'Ray Okafor', first: false },
  { field: 'lengthIn', from: null, to: 17.25, at: '2025-04-13T15:30:00.000Z', byName: null, first: false },
];

function renderHistory(unitPrefs: UnitPreferences = prefs) {
  return renderWithApp(
    <CatchHistory crewId="c1" catchId="k1" competitionDate="2025-04-12" prefs={unitPrefs} timeZone="America/Chicago" />,
  );
}

describe('CatchHistory', () => {
  it('shows each change of weight and length with who made it and when, in lake time', async () => {
    fakeNetwork({ [path]: { status: 200, body: changes } }).install();
    renderHistory();

    const list = await screen.findByRole('list');
    expect(
      within(list)
        .getAllByRole('listitem')
        .map((li) => li.textContent),
    ).toEqual([
      'Weight: 3.45 lb as first recorded, by Dana Whitlock, 07:45',
      'Weight: 3.45 lb → 3.54 lb, by Ray Okafor, 14:02',
      // Made the next day: the date is named; an account that is gone is not given a made-up name.
      'Length: none → 17.25 in, by a former member, 10:30 on Sun, 13 Apr 2025',
    ]);
    expect(screen.getByRole('heading', { name: 'History of this catch' })).toBeInTheDocument();
    expect(screen.getByText(/Times in the lake's time \(America\/Chicago\)/)).toBeInTheDocument();
  });

  it("writes the figures in the user's units: 3.45 lb is 3 lb 7.2 oz (16 oz to the pound)", async () => {
    fakeNetwork({ [path]: { status: 200, body: changes.slice(0, 1) } }).install();
    renderHistory({ ...prefs, weight: 'lb-oz' });

    expect(await screen.findByRole('listitem')).toHaveTextContent(/^Weight: 3 lb 7(\.2)? oz as first recorded/);
  });

  it('says so when nothing was recorded, and shows the server refusal when it cannot be read', async () => {
    fakeNetwork({ [path]: { status: 200, body: [] } }).install();
    const { unmount } = renderHistory();
    expect(await screen.findByText('Nothing recorded yet.')).toBeInTheDocument();
    unmount();

    fakeNetwork({
      [path]: { status: 404, body: { statusCode: 404, message: 'No such catch.', error: 'not_found', requestId: 'r' } },
    }).install();
    renderHistory();
    expect(await screen.findByText(/No such catch\./)).toBeInTheDocument();
  });
});
