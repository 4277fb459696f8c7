import type { CompetitionDayView, StopView, UnitPreferences } from '@shoalbook/shared';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import { deviceDb, sendQueue, useSendQueueDrain } from '../../../lib/send-queue';
import { fakeNetwork, type SeenRequest } from '../../../testing/fake-network';
import { renderWithApp } from '../../../testing/render';
import { StopsPanel } from './stops-panel';
import { testLake } from '../../../testing/journal-fixtures';

const lake = testLake;
const day: CompetitionDayView = {
  id: 'd1',
  eventId: 'e1',
  date: '2025-04-12',
  startTime: '06:30',
  checkInTime: '15:00',
  weatherNotes: '',
  waterTempF: null,
  entered: { waterTemp: null },
  version: 1,
};
const finds = [{ id: 'f1', name: 'Rock pile' }] as never[];
const prefs: UnitPreferences = { weight: 'lb-oz', length: 'in', depth: 'ft', temperature: 'F' };
const csrf = { status: 200, body: { csrfToken: 'tok' } };
// Uuid v7 (RFC 9562 §5.7): version nibble 7, variant 10xx.
const UUID_V7 = /^[0-9a-f]{8}-[0-9a-f]{4}-7[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

/**
 * A server that keeps the stops it is sent (by their client-made id) while `online`, and fails to answer otherwise.
 * The day's list is answered once `reads` has settled (a test holds it to keep the list as first read).
 */
function stopServer() {
  const state = { online: false, stops: new Map<string, StopView>(), reads: Promise.resolve() };
  // 07:15 and 09:40 on 2025-04-12 in Chicago are 12:15 and 14:40 UTC (CDT, UTC−5, IANA tz database).
  const instant = (hhmm: string) => {
    const [h, m] = hhmm.split(':').map(Number);
    return new Date(Date.UTC(2025, 3, 12, h + 5, m)).toISOString();
  };
  const routes: Parameters<typeof fakeNetwork>[0] = {
    'GET /api/auth/csrf': csrf,
    'GET /api/crews/c1/stops': async () => {
      await state.reads;
      return { status: 200, body: [...state.stops.values()] };
    },
    'POST /api/crews/c1/stops': (r: SeenRequest) => {
      if (!state.online) throw new TypeError('Failed to fetch');
      const b = r.body as { id: string; findId: string; arrivedAt: string };
      const stop: StopView = {
        id: b.id,
        eventId: 'e1',
        competitionDayId: 'd1',
        competitionDate: day.date,
        findId: b.findId,
        findName: 'Rock pile',
        lat: null,
        lon: null,
        arrivedAt: instant(b.arrivedAt),
        leftAt: null,
        minutes: null,
        waterTempF: null,
        lure: '',
        technique: '',
        notes: '',
        loggedBy: { userId: 'u1', displayName: 'Ann' },
        catchIds: [],
        catchesToCheck: [],
        version: 1,
      };
      state.stops.set(stop.id, stop);
      // From now on the stop can be changed at its own path.
      routes[`PATCH /api/crews/c1/stops/${stop.id}`] = (p: SeenRequest) => {
        if (!state.online) throw new TypeError('Failed to fetch');
        const now = state.stops.get(stop.id)!;
        const changes = p.body as { leftAt?: string; lure?: string; version: number };
        if (changes.version !== now.version)
          return { status: 409, body: { statusCode: 409, error: 'Conflict', message: 'stale', code: 'stale_version' } };
        const changed = {
          ...now,
          ...(changes.leftAt ? { leftAt: instant(changes.leftAt), minutes: 145 } : {}),
          ...(changes.lure !== undefined ? { lure: changes.lure } : {}),
          version: now.version + 1,
        };
        state.stops.set(stop.id, changed);
        return { status: 200, body: changed };
      };
      return { status: 201, body: stop };
    },
  };
  const net = fakeNetwork(routes).install();
  return { net, state };
}

// Each test starts with an empty queue on the device.
beforeEach(() => deviceDb.sendQueue.clear());

function Panel() {
  return <StopsPanel crewId="c1" userId="u1" day={day} lake={lake} finds={finds} catches={[]} prefs={prefs} canWrite />;
}

/** The panel in the app's shell: the queue's sends read the day's lists again, as in the app. */
function PanelInShell() {
  useSendQueueDrain('u1');
  return <Panel />;
}

/** "Arrived here" at the find Rock pile at `time` on the lake clock, through the stop form. */
async function arriveAtRockPile(user: ReturnType<typeof userEvent.setup>, form: HTMLElement, time: string) {
  await user.selectOptions(within(form).getByRole('combobox', { name: 'Where' }), 'Rock pile');
  await user.clear(within(form).getByRole('textbox', { name: /Arrived at/ }));
  await user.type(within(form).getByRole('textbox', { name: /Arrived at/ }), time);
  await user.click(within(form).getByRole('button', { name: 'Arrived here' }));
}

function renderPanel({ inShell = false } = {}) {
  return renderWithApp(inShell ? <PanelInShell /> : <Panel />);
}

describe('StopsPanel without signal', () => {
  it('opens a stop kept on the phone, leaves that same stop, and sends both in order once there is signal', async () => {
    const { net, state } = stopServer();
    const user = userEvent.setup();
    renderPanel();

    const form = await screen.findByRole('form', { name: 'Log a stop' });
    await arriveAtRockPile(user, form, '07:15');

    // Shown at once as the open stop, marked waiting; the form turns into "Left" for it.
    expect(
      await screen.findByText(/Arrived at Rock pile at 07:15: saved on this phone, waiting to send/),
    ).toBeVisible();
    const list = screen.getByRole('list', { name: `Stops of ${day.date}` });
    expect(within(list).getByText('Waiting to send')).toBeVisible();
    expect(within(list).getByText(/since 07:15, still there/)).toBeVisible();
    const leave = await screen.findByRole('form', { name: 'Leave this stop' });
    await user.clear(within(leave).getByRole('textbox', { name: /Left at/ }));
    await user.type(within(leave).getByRole('textbox', { name: /Left at/ }), '09:40');
    await user.click(within(leave).getByRole('button', { name: 'Left' }));
    expect(await screen.findByText(/Left Rock pile at 09:40: saved on this phone, waiting to send/)).toBeVisible();
    expect(await within(list).findByText(/07:15–09:40 \(145 min\)/)).toBeVisible();
    expect(await screen.findByRole('form', { name: 'Log a stop' })).toBeVisible();

    const queued = await sendQueue.entries('u1');
    expect(queued.map((e) => [e.kind, e.method, e.state])).toEqual([
      ['stop', 'POST', 'waiting'],
      ['stop', 'PATCH', 'waiting'],
    ]);
    const stopId = queued[0].recordId!;
    expect(stopId).toMatch(UUID_V7);
    expect((queued[0].body as { id: string }).id).toBe(stopId);
    // "Left" names the stop made on the phone, at the version it has once its arrival is in.
    expect(queued[1].path).toBe(`/crews/c1/stops/${stopId}`);
    expect(queued[1].body).toEqual({ leftAt: '09:40', version: 1 });
    // The PATCH waits behind the arrival: it was never tried while the arrival could not go.
    expect(net.to(`PATCH /api/crews/c1/stops/${stopId}`)).toHaveLength(0);

    state.online = true;
    await sendQueue.drain('u1', { now: true });

    expect(await sendQueue.entries('u1')).toEqual([]);
    // One stop on the server, with both times; every attempt of an entry carried that entry's one key.
    expect(state.stops.size).toBe(1);
    expect(state.stops.get(stopId)).toMatchObject({ leftAt: '2025-04-12T14:40:00.000Z', version: 2 });
    const posts = net.to('POST /api/crews/c1/stops');
    expect(new Set(posts.map((r) => r.headers['idempotency-key']))).toEqual(new Set([`"${queued[0].key}"`]));
    expect(net.to(`PATCH /api/crews/c1/stops/${stopId}`).map((r) => r.headers['idempotency-key'])).toEqual([
      `"${queued[1].key}"`,
    ]);
    await waitFor(() => expect(within(list).queryByText('Waiting to send')).not.toBeInTheDocument());
  });
});

describe('StopsPanel when the server refuses a stop sent later', () => {
  it('keeps the stop on the phone as "needs you" with the server\'s message', async () => {
    const { state } = stopServer();
    const user = userEvent.setup();
    renderPanel();
    const form = await screen.findByRole('form', { name: 'Log a stop' });
    await arriveAtRockPile(user, form, '05:10');
    await screen.findByText(/saved on this phone, waiting to send/);

    // Back in signal, the server refuses it (before the day's start, say): it stays, for the angler to act on.
    const message = 'Arrival 05:10 is before the day starts (06:30).';
    fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'GET /api/crews/c1/stops': { status: 200, body: [] },
      'POST /api/crews/c1/stops': {
        status: 400,
        body: { statusCode: 400, error: 'Bad Request', message, fieldErrors: { arrivedAt: [message] } },
      },
    }).install();
    await sendQueue.drain('u1', { now: true });

    const list = screen.getByRole('list', { name: `Stops of ${day.date}` });
    expect(await within(list).findByText('Needs you')).toBeVisible();
    expect(
      within(list).getByText(new RegExp(`The server refused it: ${message.replace(/[().]/g, '\\$&')}`)),
    ).toBeVisible();
    const [entry] = await sendQueue.entries('u1');
    expect(entry).toMatchObject({ state: 'needs-you', lastError: { statusCode: 400, message } });
    expect(state.stops.size).toBe(0);
  });
});

describe('StopsPanel when the queue sends a stop before the day is read again', () => {
  it("shows the server's answer at once, so an edit form open on the stop keeps what was typed", async () => {
    const { net, state } = stopServer();
    const user = userEvent.setup();
    const { queryClient } = renderPanel({ inShell: true });
    const form = await screen.findByRole('form', { name: 'Log a stop' });
    await arriveAtRockPile(user, form, '07:15');
    await screen.findByText(/saved on this phone, waiting to send/);

    const list = screen.getByRole('list', { name: `Stops of ${day.date}` });
    await user.click(within(list).getByRole('button', { name: 'Edit the stop at 07:15' }));
    const edit = screen.getByRole('form', { name: 'Edit the stop at 07:15' });
    await user.type(within(edit).getByRole('textbox', { name: 'Lure' }), 'Jig');

    // Signal again, but the day's list is slow to come: the queue's entry is gone before the list knows the stop.
    let release = () => {};
    state.reads = new Promise((resolve) => (release = resolve));
    state.online = true;
    await sendQueue.drain('u1', { now: true });
    expect(await sendQueue.entries('u1')).toEqual([]);
    await waitFor(() => expect(within(list).queryByText('Waiting to send')).not.toBeInTheDocument());
    // The server's stop: it can be deleted now, and the form open on it still holds the lure typed.
    expect(within(list).getByRole('button', { name: 'Delete the stop at Rock pile, 07:15' })).toBeInTheDocument();
    expect(within(edit).getByRole('textbox', { name: 'Lure' })).toHaveValue('Jig');

    // The send has the day read again; once that answer comes it knows the stop, and the form stays as typed.
    await waitFor(() => expect(net.to('GET /api/crews/c1/stops').length).toBeGreaterThan(1));
    release();
    await waitFor(() => expect(queryClient.isFetching()).toBe(0));
    expect(within(edit).getByRole('textbox', { name: 'Lure' })).toHaveValue('Jig');
    await user.click(within(edit).getByRole('button', { name: 'Save stop' }));
    await waitFor(() => expect([...state.stops.values()][0]).toMatchObject({ lure: 'Jig', version: 2 }));
    const [stopId] = state.stops.keys();
    expect(net.to(`PATCH /api/crews/c1/stops/${stopId}`).map((r) => r.body)).toEqual([{ lure: 'Jig', version: 1 }]);
  });
});

describe('StopsPanel when the server refuses an arrival on its first try', () => {
  it('keeps the form as it was, with the values typed and the message beside the field, and nothing queued', async () => {
    const message = 'Arrival 05:10 lies outside the competition day 2025-04-12 (06:30 to 15:00).';
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'GET /api/crews/c1/stops': { status: 200, body: [] },
      'POST /api/crews/c1/stops': {
        status: 400,
        body: { statusCode: 400, error: 'Bad Request', message, fieldErrors: { arrivedAt: [message] } },
      },
    }).install();
    const user = userEvent.setup();
    renderPanel();
    const form = await screen.findByRole('form', { name: 'Log a stop' });
    await arriveAtRockPile(user, form, '05:10');

    expect(await within(form).findAllByText(message)).not.toHaveLength(0);
    expect(net.to('POST /api/crews/c1/stops')).toHaveLength(1);
    // The same form, as typed: the stop shown while the queue held it is gone again.
    expect(screen.getByRole('form', { name: 'Log a stop' })).toBe(form);
    expect(within(form).getByRole('combobox', { name: 'Where' })).toHaveValue('f1');
    expect(within(form).getByRole('textbox', { name: /Arrived at/ })).toHaveValue('05:10');
    expect(await sendQueue.entries('u1')).toEqual([]);
    expect(screen.queryByRole('list', { name: `Stops of ${day.date}` })).not.toBeInTheDocument();
  });
});
