import type { CatchView, FindView, UnitPreferences } from '@shoalbook/shared';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ArriveLeave } from '../../features/stops/components/arrive-leave';
import { CatchEntryForm } from '../../features/catches/components/catch-entry-form';
import { fakeGeolocation, forgetFakeGeolocation } from '../../testing/fake-geolocation';
import { fakeNetwork, type SeenRequest } from '../../testing/fake-network';
import { renderWithApp } from '../../testing/render';
import { forgetLastFix } from '../../lib/use-position';
import { testLake, testFind } from '../../testing/journal-fixtures';

const lake = testLake;
const find = (id: string, name: string, lat: number | null, lon: number | null): FindView =>
  testFind({ id, name, lat, lon, subKind: 'rock' });
// Invented finds: one due south of the fixes below, one 0.01° farther north, one whose position is hidden.
const finds = [
  find('f1', 'Rock point', 34.5, -86.2),
  find('f2', 'Channel swing', 34.51, -86.2),
  find('f3', 'Hidden hump', null, null),
];
const metric: UnitPreferences = { weight: 'lb', length: 'in', depth: 'm', temperature: 'F' };
const imperial: UnitPreferences = { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' };
const day = { id: 'd1', date: '2025-04-12' };
const now = () => new Date('2025-04-12T12:42:00Z');
const csrf = { status: 200, body: { csrfToken: 'tok' } };

/** The server's answer to a logged catch, from what was sent; 12:42 UTC is 07:42 in Chicago (CDT, UTC−5). */
function savedCatch(request: SeenRequest): { status: number; body: CatchView } {
  const body = request.body as { findId?: string; lat?: number; lon?: number; weight: { value: number } };
  return {
    status: 201,
    body: {
      id: 'c1',
      eventId: 'e1',
      competitionDate: day.date,
      caughtAt: '2025-04-12T12:42:00.000Z',
      findId: body.findId ?? null,
      attributionDistanceM: null,
      lat: body.lat ?? null,
      lon: body.lon ?? null,
      species: 'largemouth',
      lengthIn: null,
      weightLb: body.weight.value,
      lure: '',
      technique: '',
      depthFt: null,
      waterTempF: null,
      fate: 'weighed',
      photoId: null,
      weightFlagged: false,
      findName: finds.find((f) => f.id === body.findId)?.name ?? null,
    },
  };
}

/**
 * Metres along a meridian for a latitude difference: R·Δφ on the mean sphere (R = 6,371,008.8 m), exact for two
 * points of the same longitude, so it checks the haversine independently. 0.0003° → 33.36 m.
 */
const alongMeridianM = (dLat: number) => (dLat * Math.PI * 6_371_008.8) / 180;

beforeEach(() => localStorage.clear());
afterEach(() => {
  forgetFakeGeolocation();
  forgetLastFix();
});

function renderCatchForm(prefs: UnitPreferences) {
  return renderWithApp(
    <CatchEntryForm userId="u1" crewId="c1" day={day} lake={lake} finds={finds} prefs={prefs} now={now} />,
  );
}

describe('Use my position on the catch form', () => {
  it('fills the position from a good fix, names the nearest find and logs the catch with those coordinates', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/catches': savedCatch,
    }).install();
    const locate = fakeGeolocation({ fix: { lat: 34.5003, lon: -86.2, accuracy: 4.2 } });
    const user = userEvent.setup();
    renderCatchForm(metric);

    await user.click(screen.getByRole('button', { name: 'Use my position' }));
    expect(locate).toHaveBeenCalledTimes(1);
    expect(locate.mock.calls[0][2]).toMatchObject({ enableHighAccuracy: true, timeout: expect.any(Number) });
    const distance = Math.round(alongMeridianM(0.0003));
    expect(distance).toBe(33);
    expect(
      await screen.findByText(`Position filled, accurate to ±4 m; nearest find: Rock point, ${distance} m.`),
    ).toBeInTheDocument();
    expect(screen.getByRole('checkbox', { name: 'Attribute from coordinates' })).toBeChecked();
    expect(screen.getByRole('textbox', { name: 'Latitude' })).toHaveValue('34.5003');
    expect(screen.getByRole('textbox', { name: 'Longitude' })).toHaveValue('-86.2');

    await user.type(screen.getByRole('textbox', { name: /weight/i }), '3.25{Enter}');
    await waitFor(() => expect(net.to('POST /api/crews/c1/catches')).toHaveLength(1));
    expect(net.to('POST /api/crews/c1/catches')[0].body).toMatchObject({ lat: 34.5003, lon: -86.2 });
    expect(net.to('POST /api/crews/c1/catches')[0].body).not.toHaveProperty('findId');
    // The form clears for the next fish, and so does the last fish's position message.
    expect(await screen.findByText(/Logged 3\.25 lb largemouth at 07:42/)).toBeInTheDocument();
    expect(screen.queryByText(/Position filled/)).toBeNull();
  });

  it('refuses a fix coarser than 30 m (shown in feet), fills nothing, and takes it once the limit is widened', async () => {
    fakeGeolocation(
      { fix: { lat: 34.5003, lon: -86.2, accuracy: 45 } },
      { fix: { lat: 34.5003, lon: -86.2, accuracy: 45 } },
    );
    const user = userEvent.setup();
    renderCatchForm(imperial);

    const limit = screen.getByRole('textbox', { name: 'Accept fixes within (ft)' });
    // 30 m = 98.4 ft (1 ft = 0.3048 m exactly, NIST SP 811).
    expect(limit).toHaveValue('98');
    await user.click(screen.getByRole('button', { name: 'Use my position' }));
    expect(
      await screen.findByText(/^Fix refused: the phone is only sure to ±148 ft, worse than the ±98 ft you accept/),
    ).toBeInTheDocument();
    expect(screen.getByRole('checkbox', { name: 'Attribute from coordinates' })).not.toBeChecked();
    expect(screen.queryByRole('textbox', { name: 'Latitude' })).toBeNull();

    await user.clear(limit);
    await user.type(limit, '200');
    await user.click(screen.getByRole('button', { name: 'Use my position' }));
    // 33.36 m = 109 ft.
    expect(
      await screen.findByText('Position filled, accurate to ±148 ft; nearest find: Rock point, 109 ft.'),
    ).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Latitude' })).toHaveValue('34.5003');
    // The wider limit stays on this phone for the next form.
    expect(JSON.parse(localStorage.getItem('shoalbook.fixLimitM')!)).toBeCloseTo(60.96, 6);
  });

  it('says so when the angler has not allowed the position, and the catch is still logged from a find', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/catches': savedCatch,
    }).install();
    fakeGeolocation({ error: { code: 1, message: 'User denied Geolocation' } });
    const user = userEvent.setup();
    renderCatchForm(metric);

    await user.click(screen.getByRole('button', { name: 'Use my position' }));
    expect(await screen.findByText(/may not use this phone’s position: allow location/)).toBeInTheDocument();
    expect(screen.getByRole('checkbox', { name: 'Attribute from coordinates' })).not.toBeChecked();

    await user.type(screen.getByRole('combobox', { name: /find/i }), 'Rock point');
    await user.type(screen.getByRole('textbox', { name: /weight/i }), '2.5{Enter}');
    await waitFor(() => expect(net.to('POST /api/crews/c1/catches')).toHaveLength(1));
    expect(net.to('POST /api/crews/c1/catches')[0].body).toMatchObject({ findId: 'f1' });
  });

  it('without the Geolocation API says the position must be typed and offers no button', () => {
    renderCatchForm(metric);
    expect(screen.getByText('This browser gives no position: type it, or pick the find.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Use my position' })).toBeNull();
  });
});

describe('Use my position on the stop form', () => {
  function renderStopForm() {
    return renderWithApp(
      <ArriveLeave
        userId="u1"
        crewId="c1"
        day={day}
        lake={lake}
        finds={finds}
        open={null}
        unit="m"
        onLogged={() => undefined}
        now={now}
      />,
    );
  }

  it('picks the nearest find within 50 m, and "No find" with the position beyond it', async () => {
    fakeGeolocation(
      { fix: { lat: 34.5003, lon: -86.2, accuracy: 5 } },
      // 0.0009° north: 100 m from Rock point, 1,012 m from Channel swing.
      { fix: { lat: 34.5009, lon: -86.2, accuracy: 5 } },
    );
    const user = userEvent.setup();
    renderStopForm();
    const form = screen.getByRole('form', { name: 'Log a stop' });

    await user.click(within(form).getByRole('button', { name: 'Use my position' }));
    await within(form).findByText('Position filled, accurate to ±5 m; nearest find: Rock point, 33 m.');
    expect(within(form).getByRole('combobox', { name: 'Where' })).toHaveValue('f1');

    await user.click(within(form).getByRole('button', { name: 'Use my position' }));
    expect(Math.round(alongMeridianM(0.0009))).toBe(100);
    await within(form).findByText(
      'Position filled, accurate to ±5 m; nearest find: Rock point, 100 m, farther than 50 m, so no find is picked.',
    );
    expect(within(form).getByRole('combobox', { name: 'Where' })).toHaveValue('__none__');
    expect(within(form).getByRole('textbox', { name: 'Latitude' })).toHaveValue('34.5009');
  });
});
