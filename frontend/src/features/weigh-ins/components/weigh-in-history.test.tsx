import type { RecordChange, UnitPreferences, WeighInHistoryField } from '@shoalbook/shared';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { fakeNetwork } from '../../../testing/fake-network';
import { renderWithApp } from '../../../testing/render';
import { WeighInHistory } from './weigh-in-history';

const prefs: UnitPreferences = { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' };
// 20:00 and 20:05 UTC are 15:00 and 15:05 in Chicago on 12 April 2025 (CDT, UTC−5, IANA tz database).
const changes: RecordChange<WeighInHistoryField>[] = [
  { field: 'officialLb', from: null, to: 17.75, at: '2025-04-12T20:00:00.000Z', byName: 'Dana Whitlock', first: true },
  { field: 'dayPlace', from: null, to: 30, at: '2025-04-12T20:00:00.000Z', byName: 'Dana Whitlock', first: true },
  { field: 'officialLb', from: 17.75, to: 17.62, at: '2025-04-12T20:05:00.000Z', byName: 'Ray Okafor', first: false },
  { field: 'dayPlace', from: 30, to: 26, at: '2025-04-12T20:05:00.000Z', byName: 'Ray Okafor', first: false },
];

describe('WeighInHistory', () => {
  it("names each official figure as the form does, weights in the user's unit and places as counts", async () => {
    fakeNetwork({ 'GET /api/crews/c1/competition-days/d1/weigh-in/history': { status: 200, body: changes } }).install();
    renderWithApp(
      <WeighInHistory crewId="c1" eventId="e1" dayId="d1" date="2025-04-12" prefs={prefs} timeZone="America/Chicago" />,
    );

    const list = await screen.findByRole('list');
    expect(
      within(list)
        .getAllByRole('listitem')
        .map((li) => li.textContent),
    ).toEqual([
      'Official weight: 17.75 lb as first recorded, by Dana Whitlock, 15:00',
      'Day place: 30 as first recorded, by Dana Whitlock, 15:00',
      'Official weight: 17.75 lb → 17.62 lb, by Ray Okafor, 15:05',
      'Day place: 30 → 26, by Ray Okafor, 15:05',
    ]);
  });
});
