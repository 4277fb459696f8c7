import type { CatchView, FindView, UnitPreferences } from '@shoalbook/shared';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { beforeEach, describe, expect, it } from 'vitest';
import { fakeNetwork, type SeenRequest } from '../../../testing/fake-network';
import { renderWithApp } from '../../../testing/render';
import { CatchEntryForm } from './catch-entry-form';
import { testLake, testFind } from '../../../testing/journal-fixtures';

const lake = testLake;
const find = (id: string, name: string): FindView => testFind({ id, name });
const finds = [find('f1', 'North shell bar'), find('f2', 'Rock pile')];
const prefs: UnitPreferences = { weight: 'lb-oz', length: 'in', depth: 'ft', temperature: 'F' };
const day = { id: 'd1', date: '2025-04-12' };
// 12:42 UTC is 07:42 in Chicago (CDT, UTC−5, per the IANA tz database).
const now = () => new Date('2025-04-12T12:42:00Z');
const csrf = { status: 200, body: { csrfToken: 'tok' } };

/** The server's answer to a logged catch, built from what was sent (as the real one is). */
function savedCatch(request: SeenRequest, extra: Partial<CatchView> = {}): CatchView {
  const body = request.body as {
    caughtAt: string;
    species: CatchView['species'];
    findId?: string;
    fate: CatchView['fate'];
    weight: { value: number; ounces?: number };
  };
  const [hh, mm] = body.caughtAt.split(':').map(Number);
  return {
    id: `c-${hh}${mm}`,
    eventId: 'e1',
    competitionDate: day.date,
    caughtAt: new Date(Date.UTC(2025, 3, 12, hh + 5, mm)).toISOString(),
    findId: body.findId ?? null,
    attributionDistanceM: null,
    lat: null,
    lon: null,
    species: body.species,
    lengthIn: null,
    weightLb: body.weight.value + (body.weight.ounces ?? 0) / 16,
    lure: '',
    technique: '',
    depthFt: null,
    waterTempF: null,
    fate: body.fate,
    photoId: null,
    weightFlagged: false,
    findName: finds.find((f) => f.id === body.findId)?.name ?? null,
    ...extra,
  };
}

function renderForm(unitPrefs: UnitPreferences = prefs) {
  return renderWithApp(
    <CatchEntryForm userId="u1" crewId="c1" day={day} lake={lake} finds={finds} prefs={unitPrefs} now={now} />,
  );
}

beforeEach(() => localStorage.clear());

describe('CatchEntryForm (fast keyboard entry)', () => {
  it('logs catch after catch by keyboard alone: Enter sends, the form clears and focus returns to the time', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/catches': (request) => ({ status: 201, body: savedCatch(request) }),
    }).install();
    const user = userEvent.setup();
    renderForm();

    const time = screen.getByRole('textbox', { name: /time/i });
    expect(time).toHaveFocus();
    expect(time).toHaveValue('07:42');

    await user.tab(); // species, already largemouth
    expect(screen.getByRole('combobox', { name: 'Species' })).toHaveFocus();
    await user.tab();
    await user.keyboard('3-7');
    await user.tab();
    await user.keyboard('16.5');
    await user.tab();
    await user.keyboard('North shell bar');
    await user.keyboard('{Enter}');

    await waitFor(() => expect(net.to('POST /api/crews/c1/catches')).toHaveLength(1));
    const sent = net.to('POST /api/crews/c1/catches')[0];
    // Every catch carries a client-made UUID v7 (RFC 9562 §5.7) and its own Idempotency-Key, an sf-string.
    expect(sent.headers['idempotency-key']).toMatch(
      /^"[0-9a-f]{8}-[0-9a-f]{4}-7[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}"$/,
    );
    expect(sent.body).toEqual({
      id: expect.stringMatching(/^[0-9a-f]{8}-[0-9a-f]{4}-7[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/),
      competitionDayId: 'd1',
      caughtAt: '07:42',
      findId: 'f1',
      species: 'largemouth',
      weight: { value: 3, unit: 'lb-oz', ounces: 7 },
      length: { value: 16.5, unit: 'in' },
      lure: '',
      technique: '',
      depth: null,
      waterTemp: null,
      fate: 'weighed',
    });
    expect(
      await screen.findByText(/Logged 3 lb 7\.0 oz largemouth at 07:42, from North shell bar/),
    ).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: /weight/i })).toHaveValue('');
    expect(screen.getByRole('combobox', { name: /find/i })).toHaveValue('');
    expect(time).toHaveFocus();

    // Second fish: a new time typed over the prefilled one, a smallmouth chosen by keyboard, Enter from the fate select.
    await user.clear(time);
    await user.keyboard('08:05');
    await user.tab();
    await user.selectOptions(screen.getByRole('combobox', { name: 'Species' }), 'smallmouth');
    await user.tab();
    await user.keyboard('2-15');
    await user.tab(); // length
    await user.tab(); // find
    await user.tab(); // attribute from coordinates
    await user.tab(); // fate
    expect(screen.getByRole('combobox', { name: 'Fate' })).toHaveFocus();
    await user.keyboard('{Enter}');

    await waitFor(() => expect(net.to('POST /api/crews/c1/catches')).toHaveLength(2));
    expect(net.to('POST /api/crews/c1/catches')[1].body).toMatchObject({
      caughtAt: '08:05',
      species: 'smallmouth',
      weight: { value: 2, unit: 'lb-oz', ounces: 15 },
      length: null,
    });
    expect(await screen.findByText(/Logged 2 lb 15\.0 oz smallmouth at 08:05/)).toBeInTheDocument();
    expect(time).toHaveFocus();
    // The species just used stays chosen for the next fish.
    expect(screen.getByRole('combobox', { name: 'Species' })).toHaveValue('smallmouth');
  });

  it('shows the server’s field errors beside their fields and keeps what was typed', async () => {
    fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/catches': {
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Some fields need attention.',
          fieldErrors: {
            caughtAt: ['The catch time falls on 2025-04-13 (lake time), not on the competition day 2025-04-12.'],
            weight: ['A weight must be more than 0 and at most 25 lb.'],
          },
          requestId: 'r1',
        },
      },
    }).install();
    const user = userEvent.setup();
    renderForm();

    await user.tab();
    await user.tab();
    await user.keyboard('30-2{Enter}');

    const time = screen.getByRole('textbox', { name: /time/i });
    const weight = screen.getByRole('textbox', { name: /weight/i });
    await waitFor(() => expect(time).toHaveAccessibleDescription(/not on the competition day 2025-04-12/));
    expect(weight).toHaveAccessibleDescription(/at most 25 lb/);
    expect(time).not.toHaveAccessibleDescription(/25 lb/);
    expect(weight).toHaveValue('30-2');
    expect(screen.getByText(/That catch was not logged/)).toBeInTheDocument();
  });

  it('catches a bad entry before sending: ounces over 15 and an unknown find', async () => {
    const net = fakeNetwork({ 'GET /api/auth/csrf': csrf }).install();
    const user = userEvent.setup();
    renderForm();

    await user.tab();
    await user.tab();
    await user.keyboard('3-18');
    await user.tab();
    await user.tab();
    await user.keyboard('Nowhere hump{Enter}');

    expect(screen.getByRole('textbox', { name: /weight/i })).toHaveAccessibleDescription(/16 oz make a pound/);
    expect(screen.getByRole('combobox', { name: /find/i })).toHaveAccessibleDescription(/No find by that name/);
    expect(net.to('POST /api/crews/c1/catches')).toHaveLength(0);
  });

  it('refuses 18,500 typed in decimal pounds (en-US groups thousands with the comma) instead of storing 18.5 lb', async () => {
    const net = fakeNetwork({ 'GET /api/auth/csrf': csrf }).install();
    const user = userEvent.setup();
    const { sendQueue } = await import('../../../lib/send-queue');
    const queuedBefore = (await sendQueue.entries('u1')).length;
    renderForm({ ...prefs, weight: 'lb' });

    await user.tab();
    await user.tab();
    await user.keyboard('18,500{Enter}');

    expect(navigator.language).toBe('en-US'); // jsdom's locale: the comma is the group sign (CLDR en)
    expect(screen.getByRole('textbox', { name: /weight/i })).toHaveAccessibleDescription(
      expect.stringContaining("Weight: '18,500' is not a weight in pounds; write 18.5 or 18 lb 8 oz."),
    );
    expect(net.to('POST /api/crews/c1/catches')).toHaveLength(0);
    // Refused before the send queue: nothing waits on the device to be sent later either.
    expect(await sendQueue.entries('u1')).toHaveLength(queuedBefore);
  });

  it('attributes from coordinates, says to which find and how far, and flags a weight that does not fit', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/catches': (request) => ({
        status: 201,
        body: savedCatch(request, {
          findId: 'f2',
          findName: 'Rock pile',
          attributionDistanceM: 23.4,
          lat: 34.5001,
          lon: -86.2002,
          weightFlagged: true,
        }),
      }),
    }).install();
    const user = userEvent.setup();
    renderForm();

    await user.tab();
    await user.tab();
    await user.keyboard('9-0');
    await user.tab();
    await user.keyboard('12');
    await user.tab(); // find
    await user.tab(); // "attribute from coordinates"
    await user.keyboard(' ');
    expect(screen.getByRole('checkbox', { name: /coordinates/i })).toBeChecked();
    // The coordinate fields take the find field's place, just before the checkbox.
    await user.tab({ shift: true });
    await user.tab({ shift: true });
    expect(screen.getByRole('textbox', { name: 'Latitude' })).toHaveFocus();
    await user.keyboard('34.5001');
    await user.tab();
    await user.keyboard('-86.2002{Enter}');

    await waitFor(() => expect(net.to('POST /api/crews/c1/catches')).toHaveLength(1));
    const body = net.to('POST /api/crews/c1/catches')[0].body as Record<string, unknown>;
    expect(body).toMatchObject({ lat: 34.5001, lon: -86.2002 });
    expect(body).not.toHaveProperty('findId');
    expect(await screen.findByText(/attributed to Rock pile \(23 m away\)/)).toBeInTheDocument();
    expect(screen.getByText(/Check this weight/)).toBeInTheDocument();
  });
});

describe('CatchEntryForm without signal', () => {
  it('keeps the catch on the device marked "waiting to send", clears for the next fish, and says "Logged" once sent', async () => {
    let online = false;
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/catches': (request) => {
        if (!online) throw new TypeError('Failed to fetch');
        return { status: 201, body: savedCatch(request) };
      },
    }).install();
    const user = userEvent.setup();
    renderForm();
    await user.tab();
    await user.tab();
    await user.keyboard('2-4{Enter}');

    expect(await screen.findByText('Waiting to send')).toBeInTheDocument();
    expect(screen.getByText(/Saved on this phone: 2 lb 4\.0 oz largemouth at 07:42/)).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: /weight/i })).toHaveValue('');
    const { sendQueue } = await import('../../../lib/send-queue');
    const [queued] = await sendQueue.entries('u1');
    expect(queued).toMatchObject({ state: 'waiting', kind: 'log-catch', scope: 'd1' });
    // Tried at least once; the jittered backoff may already have tried again on a slow machine.
    expect(queued.attempts).toBeGreaterThanOrEqual(1);

    online = true;
    await sendQueue.drain('u1', { now: true });
    expect(await screen.findByText(/Logged 2 lb 4\.0 oz largemouth at 07:42/)).toBeInTheDocument();
    expect(screen.queryByText('Waiting to send')).not.toBeInTheDocument();
    expect(await sendQueue.entries('u1')).toEqual([]);
    // The retry carried the same key as the attempt that failed.
    const keys = net.seen.filter((r) => r.method === 'POST').map((r) => r.headers['idempotency-key']);
    expect(new Set(keys).size).toBe(1);
  });
});

describe('CatchEntryForm with an open stop', () => {
  /** The form beside a stop the test can close, as the competition day composes them. */
  function WithStop() {
    const [open, setOpen] = useState(true);
    return (
      <>
        <button type="button" onClick={() => setOpen(false)}>
          Leave the stop
        </button>
        <CatchEntryForm
          userId="u1"
          crewId="c1"
          day={day}
          lake={lake}
          finds={finds}
          prefs={prefs}
          now={now}
          stopDefaults={
            open ? { stopId: 's1', findId: 'f2', place: 'Rock pile', lure: 'jig', technique: 'dragging' } : null
          }
        />
      </>
    );
  }

  it("starts from the stop's find, lure and technique; leaving clears the find and keeps the lure", async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/catches': (request) => ({ status: 201, body: savedCatch(request) }),
    }).install();
    const user = userEvent.setup();
    renderWithApp(<WithStop />);
    expect(screen.getByRole('combobox', { name: /find/i })).toHaveValue('Rock pile (Hard bottom, 14 ft)');
    expect(screen.getByRole('textbox', { name: 'Lure' })).toHaveValue('jig');
    expect(screen.getByRole('textbox', { name: 'Technique' })).toHaveValue('dragging');

    // The angler changes the lure for this fish: the catch keeps its own, the stop's stays the default.
    await user.clear(screen.getByRole('textbox', { name: 'Lure' }));
    await user.type(screen.getByRole('textbox', { name: 'Lure' }), 'spoon');
    await user.type(screen.getByRole('textbox', { name: /weight/i }), '2-4{Enter}');
    await waitFor(() => expect(net.to('POST /api/crews/c1/catches')).toHaveLength(1));
    expect(net.to('POST /api/crews/c1/catches')[0].body).toMatchObject({
      findId: 'f2',
      lure: 'spoon',
      technique: 'dragging',
    });
    // The next fish starts at the stop's find again.
    await screen.findByText(/Logged 2 lb 4\.0 oz largemouth at 07:42, from Rock pile/);
    expect(screen.getByRole('combobox', { name: /find/i })).toHaveValue('Rock pile (Hard bottom, 14 ft)');

    await user.click(screen.getByRole('button', { name: 'Leave the stop' }));
    expect(screen.getByRole('combobox', { name: /find/i })).toHaveValue('');
    expect(screen.getByRole('textbox', { name: 'Technique' })).toHaveValue('dragging');
  });
});

describe('CatchEntryForm for one thumb', () => {
  const speciesOrder = () =>
    Array.from((screen.getByRole('combobox', { name: 'Species' }) as HTMLSelectElement).options, (o) => o.value);

  it('lists the species last used first, remembered on this device across visits', async () => {
    fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/catches': (request) => ({ status: 201, body: savedCatch(request) }),
    }).install();
    const user = userEvent.setup();
    const first = renderForm();
    expect(speciesOrder()).toEqual(['largemouth', 'smallmouth', 'spotted', 'other']);

    for (const [species, weight] of [
      ['spotted', '2-3'],
      ['smallmouth', '3-1'],
    ] as const) {
      await user.selectOptions(screen.getByRole('combobox', { name: 'Species' }), species);
      await user.type(screen.getByRole('textbox', { name: /weight/i }), `${weight}{Enter}`);
      await screen.findByText(new RegExp(`Logged .* ${species} at`));
    }
    // The latest first, the one before next, then the rest in the usual order; the latest stays chosen.
    expect(speciesOrder()).toEqual(['smallmouth', 'spotted', 'largemouth', 'other']);
    expect(screen.getByRole('combobox', { name: 'Species' })).toHaveValue('smallmouth');

    // A new visit on the same device (the form opened again) starts from the same list.
    first.unmount();
    renderForm();
    expect(speciesOrder()).toEqual(['smallmouth', 'spotted', 'largemouth', 'other']);
    expect(screen.getByRole('combobox', { name: 'Species' })).toHaveValue('smallmouth');
  });

  it('steps the weight by a pound or an ounce, never below 0, and the stepped weight is what is logged', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/catches': (request) => ({ status: 201, body: savedCatch(request) }),
    }).install();
    const user = userEvent.setup();
    renderForm(); // pounds–ounces
    const weight = screen.getByRole('textbox', { name: /weight/i });
    const step = (name: string) => user.click(screen.getByRole('button', { name }));

    await step('Weight up 1 oz');
    expect(weight).toHaveValue('0-1');
    await step('Weight up 1 lb');
    expect(weight).toHaveValue('1-1');
    await step('Weight down 1 lb');
    await step('Weight down 1 lb');
    expect(weight).toHaveValue('0-0');
    await step('Weight down 1 oz');
    expect(weight).toHaveValue('0-0');

    // A typed weight steps from what it reads; 15 oz and one more make the next pound (16 oz = 1 lb).
    await user.clear(weight);
    await user.type(weight, '3-15');
    await step('Weight up 1 oz');
    expect(weight).toHaveValue('4-0');
    await step('Weight down 1 oz');
    await step('Weight down 1 oz');
    expect(weight).toHaveValue('3-14');
    // Text that is not a weight is left for the angler to fix, not replaced.
    await user.clear(weight);
    await user.type(weight, '3-x');
    await step('Weight up 1 oz');
    expect(weight).toHaveValue('3-x');

    await user.clear(weight);
    await user.type(weight, '3-7');
    await step('Weight up 1 oz');
    await user.click(screen.getByRole('button', { name: 'Log catch' }));
    await waitFor(() => expect(net.to('POST /api/crews/c1/catches')).toHaveLength(1));
    expect(net.to('POST /api/crews/c1/catches')[0].body).toMatchObject({
      weight: { value: 3, unit: 'lb-oz', ounces: 8 },
    });
  });

  it('steps decimal pounds by 1 lb and 0.05 lb, and typed weights still read as before', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/catches': (request) => ({ status: 201, body: savedCatch(request) }),
    }).install();
    const user = userEvent.setup();
    renderForm({ ...prefs, weight: 'lb' });
    const weight = screen.getByRole('textbox', { name: /weight/i });
    const step = (name: string) => user.click(screen.getByRole('button', { name }));

    await user.type(weight, '3.45');
    await step('Weight up 0.05 lb');
    expect(weight).toHaveValue('3.5');
    await step('Weight down 1 lb');
    await step('Weight down 1 lb');
    await step('Weight down 1 lb');
    await step('Weight down 1 lb');
    expect(weight).toHaveValue('0');

    // Written out in pounds and ounces: still logged as typed (3 lb 7 oz), as without the steppers.
    await user.clear(weight);
    await user.type(weight, '3 lb 7 oz{Enter}');
    await waitFor(() => expect(net.to('POST /api/crews/c1/catches')).toHaveLength(1));
    expect(net.to('POST /api/crews/c1/catches')[0].body).toMatchObject({
      weight: { value: 3, unit: 'lb-oz', ounces: 7 },
    });
    // Stepped from the written-out form: 3 lb 7 oz = 3.4375 lb, up 0.05 is 3.4875, shown to the hundredth.
    await user.type(weight, '3 lb 7 oz');
    await step('Weight up 0.05 lb');
    expect(weight).toHaveValue('3.49');
  });
});
