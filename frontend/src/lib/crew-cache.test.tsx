import type { FindView, PaidOffFindView, UnitPreferences } from '@shoalbook/shared';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeAll, describe, expect, it } from 'vitest';
import { MemoryRouter, Outlet, Route, Routes } from 'react-router-dom';
import { AppProvider } from '../app/provider';
import { CatchEntryForm } from '../features/catches';
import { LeaveCrew } from '../features/crews/components/leave-crew';
import { Component as PaidOffFindsReport } from '../features/reports/routes/paid-off-finds-report';
import type { ReportsContext } from '../features/reports/components/reports-context';
import { fakeNetwork, type SeenRequest } from '../testing/fake-network';
import { deviceDb, useSendQueueDrain } from './send-queue';
import { journalKeys } from './journal-keys';
import { createQueryClient } from './query-client';
import { testLake, testFind } from '../testing/journal-fixtures';

const lake = testLake;
const find: FindView = testFind({ id: 'f1', name: 'North shell bar', eventId: 'e1' });
const prefs: UnitPreferences = { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' };
const day = { id: 'd1', date: '2025-04-12' };
// 12:42 UTC is 07:42 in Chicago (CDT, UTC−5, IANA tz database).
const now = () => new Date('2025-04-12T12:42:00Z');
const csrf = { status: 200, body: { csrfToken: 'tok' } };
const context = {
  crew: { id: 'c1', name: 'Test Crew', role: 'angler' },
  lakes: [lake],
  events: [{ id: 'e1', lakeId: 'l1', name: 'Spring Open', practiceDates: [], competitionDates: ['2025-04-12'] }],
} as unknown as ReportsContext;

/** The server's paid-off report for the one find: it paid off once a catch on it has been logged. */
function paidOffReport(catches: number): { finds: PaidOffFindView[]; paidOff: Record<string, number | null> } {
  return {
    finds: [
      {
        findId: 'f1',
        name: 'North shell bar',
        kind: 'hard-bottom',
        subKind: 'shell',
        depthFt: 14,
        hardness: 4,
        waterTempF: null,
        practiced: true,
        fished: true,
        fishCount: catches,
        weighedCount: catches,
        weightLb: catches * 3.45,
        firstBiteAt: null,
        outcome: catches ? 'weighed' : 'fished-blank',
      } as PaidOffFindView,
    ],
    paidOff: { successes: catches ? 1 : 0, trials: 1, rate: catches ? 1 : 0, lower: 0, upper: 1, shrunk: null },
  };
}

/** The competition day (with the send queue running, as in the app's shell) beside the paid-off report. */
function DayBesideReport() {
  useSendQueueDrain('u1');
  return (
    <>
      <PaidOffFindsReport />
      <CatchEntryForm userId="u1" crewId="c1" day={day} lake={lake} finds={[find]} prefs={prefs} now={now} />
    </>
  );
}

// jsdom has no document.adoptedStyleSheets; Primer's popover polyfill (the dialog's close-button tooltip)
// spreads it, so give the document the empty list browsers start with.
beforeAll(() => {
  if (!Array.isArray((document as { adoptedStyleSheets?: unknown }).adoptedStyleSheets)) {
    Object.defineProperty(document, 'adoptedStyleSheets', { configurable: true, writable: true, value: [] });
  }
});

describe('queries follow writes', () => {
  it('shows a logged catch in the paid-off report at once, though the report is well within its 30 s stale time', async () => {
    const posted: SeenRequest[] = [];
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'GET /api/crews/c1/reports/events/e1/finds': () => ({ status: 200, body: paidOffReport(posted.length) }),
      'POST /api/crews/c1/catches': (request) => {
        posted.push(request);
        const body = request.body as { id: string };
        return {
          status: 201,
          body: { id: body.id, caughtAt: '2025-04-12T12:42:00.000Z', species: 'largemouth', weightLb: 3.45 },
        };
      },
    }).install();
    // The app's own query client: a report stays fresh for 30 s unless a write says otherwise.
    const queryClient = createQueryClient();
    render(
      <AppProvider queryClient={queryClient}>
        <MemoryRouter initialEntries={['/crews/c1/reports/events/e1/finds']}>
          <Routes>
            <Route element={<Outlet context={context} />}>
              <Route path="/crews/c1/reports/events/:eventId/finds" element={<DayBesideReport />} />
            </Route>
          </Routes>
        </MemoryRouter>
      </AppProvider>,
    );
    expect(await screen.findByText(/0 of 1 finds fished .*gave fish/)).toBeInTheDocument();

    const user = userEvent.setup();
    await user.click(screen.getByRole('textbox', { name: /weight/i }));
    await user.keyboard('3.45');
    await user.click(screen.getByRole('combobox', { name: /find/i }));
    await user.keyboard('North shell bar{Enter}');

    await waitFor(() => expect(posted).toHaveLength(1));
    expect(await screen.findByText(/1 of 1 finds fished .*gave fish/)).toBeInTheDocument();
    expect(net.to('GET /api/crews/c1/reports/events/e1/finds')).toHaveLength(2);
  });

  it("forgets the crew's journal on leaving it: the query cache and the answers kept on the device", async () => {
    fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'DELETE /api/crews/c1/members/u1': { status: 204 },
      'GET /api/crews': { status: 200, body: [] },
      'GET /api/auth/me': { status: 401, body: { statusCode: 401, message: 'x', error: 'unauthorized' } },
    }).install();
    const queryClient = createQueryClient();
    queryClient.setQueryData(journalKeys.catches('c1', { eventId: 'e1' }), [{ id: 'k1' }]);
    queryClient.setQueryData(['crew', 'c1', 'reports', 'event-finds', {}], paidOffReport(1));
    queryClient.setQueryData(['crews', 'c1'], { id: 'c1' });
    queryClient.setQueryData(journalKeys.catches('c2', { eventId: 'e9' }), [{ id: 'k9' }]);
    await deviceDb.keptReads.bulkPut([
      { path: '/crews/c1', data: {}, savedAt: 1 },
      { path: '/crews/c1/catches?eventId=e1', data: [], savedAt: 1 },
      { path: '/crews/c2/finds', data: [], savedAt: 1 },
    ]);
    let left = false;
    render(
      <AppProvider queryClient={queryClient}>
        <LeaveCrew crewId="c1" crewName="Test Crew" ownUserId="u1" onLeft={() => (left = true)} />
      </AppProvider>,
    );
    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: 'Leave this crew' }));
    await user.click(await screen.findByRole('button', { name: 'Leave crew' }));

    await waitFor(() => expect(left).toBe(true));
    expect(queryClient.getQueryCache().findAll({ queryKey: journalKeys.crew('c1') })).toHaveLength(0);
    expect(queryClient.getQueryData(['crews', 'c1'])).toBeUndefined();
    // Another crew's data stays.
    expect(queryClient.getQueryData(journalKeys.catches('c2', { eventId: 'e9' }))).toEqual([{ id: 'k9' }]);
    expect((await deviceDb.keptReads.toArray()).map((r) => r.path)).toEqual(['/crews/c2/finds']);
  });
});
