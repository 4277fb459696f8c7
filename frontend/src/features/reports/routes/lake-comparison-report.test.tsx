import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { fakeNetwork } from '../../../testing/fake-network';
import type { LakeComparisonReport } from '../api/report-types';
import { comparison, lakes, me, events, rate, renderReports, withLaidOutElements } from '../testing/report-test-kit';

withLaidOutElements(1200, 700);

const withFished = (k: number, n: number) => ({ ...rate(k, n), findsFished: n, fishPerHour: null });
const vegetationChange = comparison(
  'vegetation',
  'Vegetation',
  'ev-1',
  'ev-2',
  3,
  25,
  14,
  31,
  'Vegetation did better in Summer 2024 than in Summer 2023: 45 % against 12 % of finds fished; more than chance.',
);
const hardChange = comparison(
  'hard-bottom',
  'Hard bottom',
  'ev-1',
  'ev-2',
  14,
  40,
  12,
  38,
  'Hard bottom did about the same in both events: 35 % and 32 %; could be chance.',
);

const report: LakeComparisonReport = {
  lake: { id: 'lake-a', name: 'Test Reservoir' },
  by: 'kind',
  events: [
    {
      id: 'ev-1',
      name: 'Summer Test Open',
      firstDate: '2023-06-10',
      season: 'summer',
      year: 2023,
      derivedFromCatches: false,
    },
    {
      id: 'ev-2',
      name: 'Summer Test Open',
      firstDate: '2024-06-15',
      season: 'summer',
      year: 2024,
      derivedFromCatches: false,
    },
  ],
  groups: [
    { key: 'hard-bottom', label: 'Hard bottom', perEvent: { 'ev-1': withFished(14, 40), 'ev-2': withFished(12, 38) } },
    { key: 'vegetation', label: 'Vegetation', perEvent: { 'ev-1': withFished(3, 25), 'ev-2': withFished(14, 31) } },
  ],
  comparisons: [hardChange, vegetationChange],
  // Invented figures: a hard first event against a field of 180, an easy second one with no field entered.
  results: {
    'ev-1': {
      netLb: 14.5,
      officialLb: 14.42,
      differenceLb: -0.08,
      finalPlace: 26,
      standing: {
        place: '26th of 180 (top 15 %)',
        topPercent: 15,
        behindWinnerLb: 16.98,
        overCutLb: null,
        readings: ['26th of 180 (top 15 %)', '16.98 lb behind the winner'],
      },
    },
    'ev-2': {
      netLb: 21.3,
      officialLb: 21.3,
      differenceLb: 0,
      finalPlace: null,
      standing: { place: null, topPercent: null, behindWinnerLb: null, overCutLb: null, readings: [] },
    },
  },
};

describe('Same-lake comparison', () => {
  it('opens the lake with the most events, badges each change, and draws a whisker per event and group', async () => {
    const net = fakeNetwork({
      'GET /api/auth/me': { status: 200, body: me },
      'GET /api/crews/crew-1/lakes': { status: 200, body: lakes },
      'GET /api/crews/crew-1/events': { status: 200, body: events },
      'GET /api/crews/crew-1/reports/lake-comparison': { status: 200, body: report },
    }).install();
    const { router, container } = await renderReports('/crews/crew-1/reports/lake-comparison');
    await waitFor(() => expect(new URLSearchParams(router.state.location.search).get('lakeId')).toBe('lake-a'));

    const list = await screen.findByRole('list', { name: 'Changes between events' });
    const items = within(list).getAllByRole('listitem');
    // The change that is more than chance comes first (by the analytics library's p-value, Newcombe 1998).
    expect(vegetationChange.moreThanChance).toBe(true);
    expect(hardChange.moreThanChance).toBe(false);
    expect(items[0]).toHaveTextContent('more than chance');
    expect(items[0]).toHaveTextContent(vegetationChange.reading);
    expect(items[1]).toHaveTextContent('could be chance');
    expect(items[1]).toHaveTextContent(hardChange.reading);

    expect(container.querySelectorAll('.sb-whisker')).toHaveLength(4);
    const legend = screen.getByRole('list', { name: 'Events in the chart' });
    expect(within(legend).getByText('Summer Test Open 2023')).toBeInTheDocument();
    expect(within(legend).getByText('Summer Test Open 2024')).toBeInTheDocument();

    const table = screen.getByRole('table', { name: /^Hit rate per event/ });
    const veg = within(table).getByRole('rowheader', { name: 'Vegetation' }).closest('tr')!;
    expect(veg).toHaveTextContent('12 %');
    expect(veg).toHaveTextContent('3 of 25');
    expect(veg).toHaveTextContent('14 of 31');
    expect(net.to('GET /api/crews/crew-1/reports/lake-comparison').length).toBeGreaterThan(0);

    // Each event against its own field, official weight first and our own count beside it when they differ.
    const results = screen.getByRole('table', { name: /^Each event's counted bags/ });
    const hard = within(results).getByRole('rowheader', { name: 'Summer Test Open 2023' }).closest('tr')!;
    expect(hard).toHaveTextContent('14.42 lb; our count 14.50 lb');
    expect(hard).toHaveTextContent('26th of 180 (top 15 %)');
    expect(hard).toHaveTextContent('16.98 lb behind the winner');
    const easy = within(results).getByRole('rowheader', { name: 'Summer Test Open 2024' }).closest('tr')!;
    expect(easy).toHaveTextContent('21.30 lb');
    expect(easy).not.toHaveTextContent('our count');
  });

  it('says what to enter when the lake has a single event', async () => {
    fakeNetwork({
      'GET /api/auth/me': { status: 200, body: me },
      'GET /api/crews/crew-1/lakes': { status: 200, body: lakes },
      'GET /api/crews/crew-1/events': { status: 200, body: events },
      'GET /api/crews/crew-1/reports/lake-comparison': {
        status: 200,
        body: {
          ...report,
          lake: { id: 'lake-b', name: 'Second Test Lake' },
          events: [report.events[0]],
          comparisons: [],
        },
      },
    }).install();
    await renderReports('/crews/crew-1/reports/lake-comparison?lakeId=lake-b');
    expect(await screen.findByText('Second Test Lake has one event for these filters')).toBeInTheDocument();
  });
});
