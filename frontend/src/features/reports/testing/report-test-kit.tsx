import { compareProportions, shrinkRates, wilsonInterval } from '@shoalbook/analytics';
import type { CrewView, EventView, LakeView, MeResponse } from '@shoalbook/shared';
import { QueryClient } from '@tanstack/react-query';
import { act, render } from '@testing-library/react';
import { Outlet, RouterProvider, createMemoryRouter } from 'react-router-dom';
import { afterAll, beforeAll, vi } from 'vitest';
import { AppProvider } from '../../../app/provider';
import type { HitRateGroup, HitRatesReport, Rate } from '../api/report-types';
import { reportRoutes } from '../routes/report-routes';

/**
 * jsdom lays nothing out: give every element a size for one test file, so the charts (which measure their
 * box with getBoundingClientRect) and the virtualised tables (clientHeight) draw.
 */
export function withLaidOutElements(width = 1000, height = 600) {
  const rect = { x: 0, y: 0, top: 0, left: 0, right: width, bottom: height, width, height, toJSON: () => ({}) };
  const originals = {
    clientHeight: Object.getOwnPropertyDescriptor(HTMLElement.prototype, 'clientHeight'),
    clientWidth: Object.getOwnPropertyDescriptor(HTMLElement.prototype, 'clientWidth'),
  };
  beforeAll(() => {
    vi.spyOn(HTMLElement.prototype, 'getBoundingClientRect').mockReturnValue(rect as DOMRect);
    Object.defineProperty(HTMLElement.prototype, 'clientHeight', { configurable: true, get: () => height });
    Object.defineProperty(HTMLElement.prototype, 'clientWidth', { configurable: true, get: () => width });
  });
  afterAll(() => {
    vi.restoreAllMocks();
    if (originals.clientHeight) Object.defineProperty(HTMLElement.prototype, 'clientHeight', originals.clientHeight);
    if (originals.clientWidth) Object.defineProperty(HTMLElement.prototype, 'clientWidth', originals.clientWidth);
  });
}

export const crew: CrewView = { id: 'crew-1', name: 'Test Crew', role: 'angler', viewersSeePositions: false };

export const me: MeResponse = {
  user: {
    id: 'user-1',
    email: 'angler@example.test',
    displayName: 'Test Angler',
    siteRole: 'user',
    units: { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' },
  },
  crews: [{ crewId: crew.id, crewName: crew.name, role: 'angler' }],
};

export const lakes: LakeView[] = [
  {
    id: 'lake-a',
    name: 'Test Reservoir',
    region: 'Test',
    timeZone: 'America/Chicago',
    lat: 31.5,
    lon: -94.3,
    areaAcres: null,
    notes: '',
  },
  {
    id: 'lake-b',
    name: 'Second Test Lake',
    region: 'Test',
    timeZone: 'America/New_York',
    lat: 34.4,
    lon: -82.1,
    areaAcres: null,
    notes: '',
  },
];

const rules = {
  fishPerDay: 5,
  minLengthIn: 12,
  deadFishPenaltyLb: 0.25,
  shortFishPenaltyLb: 1,
  latePenaltyLbPerMinute: 1,
  format: 'team' as const,
};
export const events: EventView[] = [
  {
    id: 'ev-1',
    lakeId: 'lake-a',
    name: 'Summer Test Open',
    organiser: '',
    practiceDates: ['2023-06-07'],
    competitionDates: ['2023-06-10'],
    rules,
    entryFee: null,
    payout: null,
    finalPlace: 4,
    notes: '',
  },
  {
    id: 'ev-2',
    lakeId: 'lake-a',
    name: 'Summer Test Open',
    organiser: '',
    practiceDates: ['2024-06-12'],
    competitionDates: ['2024-06-15'],
    rules,
    entryFee: null,
    payout: null,
    finalPlace: 2,
    notes: '',
  },
  {
    id: 'ev-3',
    lakeId: 'lake-b',
    name: 'Fall Test Shootout',
    organiser: '',
    practiceDates: ['2023-10-11'],
    competitionDates: ['2023-10-14'],
    rules,
    entryFee: null,
    payout: null,
    finalPlace: 6,
    notes: '',
  },
];

/** A rate object as the API builds it: Wilson 95 % interval from @shoalbook/analytics. */
export function rate(successes: number, trials: number, shrunk?: number): Rate {
  const w = wilsonInterval(successes, trials);
  return {
    successes,
    trials,
    rate: trials ? successes / trials : 0,
    lower: w.lower,
    upper: w.upper,
    shrunk: shrunk ?? (trials ? successes / trials : 0),
  };
}

/** A hit-rate answer for groups of [key, label, produced, fished], shrunk and ranked with the analytics library. */
export function hitRates(groups: Array<[string, string, number, number]>, readings: string[]): HitRatesReport {
  const totalFish = groups.reduce((acc, g) => acc + g[2] * 2, 0);
  const shrunk = shrinkRates(groups.map(([key, , successes, trials]) => ({ key, successes, trials })));
  const order = [...shrunk].sort((a, b) => b.shrunk - a.shrunk).map((s) => s.key);
  const rows: HitRateGroup[] = groups.map(([key, label, successes, trials], i) => ({
    key,
    label,
    finds: trials + 2,
    findsFished: trials,
    findsProducing: successes,
    findsWeighed: Math.max(0, successes - 1),
    fishCount: successes * 2,
    weighedCount: successes,
    weightLb: successes * 6.5,
    producing: rate(successes, trials, shrunk[i].shrunk),
    weighed: rate(Math.max(0, successes - 1), trials),
    shareOfFish: rate(successes * 2, Math.max(1, totalFish)),
    // Half an hour on each find fished.
    secondsFished: trials * 1800,
    fishPerHour: trials ? (successes * 2) / (trials / 2) : null,
    rank: order.indexOf(key) + 1,
  }));
  const s = groups.reduce((acc, g) => acc + g[2], 0);
  const t = groups.reduce((acc, g) => acc + g[3], 0);
  return {
    by: 'kind',
    unit: 'find',
    groups: rows,
    overall: {
      finds: t,
      findsFished: t,
      findsProducing: s,
      fishCount: totalFish,
      countedCount: s,
      weightLb: s * 6.5,
      producing: rate(s, t),
      secondsFished: t * 1800,
      fishPerHour: t ? totalFish / (t / 2) : null,
    },
    readings,
    eventCount: 2,
    derivedEvents: 0,
  };
}

/** A comparison between two events as the API builds it, with compareProportions from @shoalbook/analytics. */
export function comparison(
  key: string,
  label: string,
  a: string,
  b: string,
  ka: number,
  na: number,
  kb: number,
  nb: number,
  reading: string,
) {
  const c = compareProportions({ successes: ka, trials: na }, { successes: kb, trials: nb });
  return {
    key,
    label,
    a,
    b,
    difference: c.difference,
    lower: c.lower,
    upper: c.upper,
    pValue: c.pValue,
    moreThanChance: c.pValue < 0.05,
    reading,
  };
}

/** Render the report routes at `url` inside a crew route that hands them the crew, as the app's crew layout does. */
export async function renderReports(url: string) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  const router = createMemoryRouter(
    [{ path: '/crews/:crewId', element: <Outlet context={{ crew }} />, children: reportRoutes }],
    { initialEntries: [url] },
  );
  let result!: ReturnType<typeof render>;
  await act(async () => {
    result = render(
      <AppProvider queryClient={queryClient}>
        <RouterProvider router={router} />
      </AppProvider>,
    );
  });
  return { ...result, router, queryClient };
}
