import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { fakeNetwork } from '../../../testing/fake-network';
import type { TimingCatch, TimingReport } from '../api/report-types';
import { events, lakes, me, renderReports, withLaidOutElements } from '../testing/report-test-kit';

withLaidOutElements(1200, 700);

const fish = (i: number, solunarPeriod: TimingCatch['solunarPeriod']): TimingCatch => ({
  catchId: `catch-${i}`,
  caughtAt: `2024-04-12T1${i}:05:00.000Z`,
  localMinutes: 6 * 60 + i * 60 + 5,
  minutesFromSunrise: i * 60 - 40,
  solunarPeriod,
  weightLb: 2 + i / 4,
  fate: 'weighed',
  eventId: 'ev-1',
  day: '2024-04-12',
});
const catches = [fish(0, 'major'), fish(1, null), fish(2, null), fish(3, 'minor')];
const byHour = [{ hour: 6, fishCount: 7214, weightLb: 18_000 }];

async function showTiming(report: TimingReport) {
  fakeNetwork({
    'GET /api/auth/me': { status: 200, body: me },
    'GET /api/crews/crew-1/lakes': { status: 200, body: lakes },
    'GET /api/crews/crew-1/events': { status: 200, body: events },
    'GET /api/crews/crew-1/reports/timing': { status: 200, body: report },
  }).install();
  const rendered = await renderReports('/crews/crew-1/reports/timing');
  await screen.findByRole('heading', { name: 'Each fish by the clock' });
  return rendered;
}

describe('Timing report', () => {
  it('says the scatter is thinned, with how many fish it shows of how many, when the back end thinned it', async () => {
    const { container } = await showTiming({ catches, totalCatches: 7214, byHour });
    expect(
      screen.getByText(/^Showing 4 of 7,214 fish, evenly thinned over time \(the first and the last kept\)/),
    ).toBeInTheDocument();
    expect(screen.getByText(/^7,214 fish; 2 of the 4 shown \(50 %\) came during a solunar period\.$/)).toBeVisible();
    expect(container.querySelectorAll('.sb-timing-node')).toHaveLength(4);
  });

  it('shows no thinning caption when every fish is drawn', async () => {
    await showTiming({ catches, totalCatches: catches.length, byHour: [{ hour: 6, fishCount: 4, weightLb: 11 }] });
    expect(screen.getByText(/^4 fish; 2 of them \(50 %\) came during a solunar period\.$/)).toBeVisible();
    expect(screen.queryByText(/evenly thinned/)).toBeNull();
  });
});
