import { act, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeGeolocation, forgetFakeGeolocation } from '../../../testing/fake-geolocation';
import { renderWithApp } from '../../../testing/render';
import { forgetLastFix } from '../../../lib/use-position';
import { CheckInClock } from './check-in-clock';

// Invented: a day on 14 June 2025 with check-in at 15:00 in Chicago (CDT, UTC−5, per the IANA tz database).
const lake = { timeZone: 'America/Chicago' };
const day = { date: '2025-06-14', checkInTime: '15:00' };
const ramp = { lat: 31.65, lon: -94.32 };
// 0.05° due north of the ramp: R·Δφ = 5,559.9 m on the mean sphere (R = 6,371,008.8 m), 3.45 statute miles.
const boat = { lat: 31.7, lon: -94.32, accuracy: 5 };
const clock = (iso: string) => () => new Date(iso);

beforeEach(() => localStorage.clear());
afterEach(() => {
  forgetFakeGeolocation();
  forgetLastFix();
  vi.useRealTimers();
});

describe('CheckInClock', () => {
  it('counts down to check-in and, with speed and position, says when to start back', async () => {
    const locate = fakeGeolocation({ fix: boat, at: new Date('2025-06-14T17:42:00Z') });
    const user = userEvent.setup();
    renderWithApp(<CheckInClock day={day} lake={lake} ramp={ramp} unit="ft" now={clock('2025-06-14T17:42:00Z')} />);

    // 12:42 to 15:00 on the lake clock.
    expect(screen.getByRole('timer')).toHaveTextContent('2 h 18 min to check-in at 15:00');
    expect(
      screen.getByText('For a leave-by time this needs your cruising speed, this phone’s position.'),
    ).toBeInTheDocument();
    expect(screen.getByRole('complementary', { name: 'Running back to check-in' })).toBeInTheDocument();

    await user.type(screen.getByRole('textbox', { name: 'Cruising speed (mph)' }), '30');
    await user.click(screen.getByRole('button', { name: 'Locate for the run back' }));
    expect(locate.mock.calls[0][2]).toMatchObject({ enableHighAccuracy: true });
    // 5,559.9 m at 30 mph (13.4112 m/s exactly, NIST SP 811) is 414.6 s: start by 14:53:05, so 14:53; 5 m is 16 ft.
    expect(await screen.findByText('Leave by 14:53')).toBeInTheDocument();
    expect(
      screen.getByText(
        'The ramp is 3.5 mi away in a straight line, about 7 min at 30 mph, from your position at 12:42 (±16 ft).',
      ),
    ).toBeInTheDocument();
    // The speed stays on this phone, in metres per second.
    expect(JSON.parse(localStorage.getItem('shoalbook.cruiseMps')!)).toBeCloseTo(13.4112, 9);
  });

  it('says "leave now" once the run takes longer than the time left, and the count moves on with the clock', async () => {
    vi.useFakeTimers({ toFake: ['setInterval', 'clearInterval'] });
    localStorage.setItem('shoalbook.cruiseMps', JSON.stringify(10));
    fakeGeolocation({ fix: boat, at: new Date('2025-06-14T19:40:00Z') });
    let now = new Date('2025-06-14T19:40:00Z');
    renderWithApp(<CheckInClock day={day} lake={lake} ramp={ramp} unit="m" now={() => now} />);
    // 36 km/h = 10 m/s; 5,559.9 m is 556 s, so the start is 14:50 and 20 min are left.
    expect(screen.getByRole('textbox', { name: 'Cruising speed (km/h)' })).toHaveValue('36');
    screen.getByRole('button', { name: 'Locate for the run back' }).click();
    expect(await screen.findByText('Leave by 14:50')).toBeInTheDocument();
    expect(
      screen.getByText(/The ramp is 5\.6 km away in a straight line, about 10 min at 36 km\/h/),
    ).toBeInTheDocument();

    now = new Date('2025-06-14T19:51:00Z');
    act(() => vi.advanceTimersByTime(15_000));
    expect(screen.getByRole('timer')).toHaveTextContent('9 min to check-in at 15:00');
    expect(screen.getByText('Leave now: the run takes about 10 min.')).toBeInTheDocument();

    now = new Date('2025-06-14T20:12:00Z');
    act(() => vi.advanceTimersByTime(15_000));
    expect(screen.getByText('Check-in was at 15:00, 12 min ago.')).toBeInTheDocument();
    expect(screen.queryByRole('textbox', { name: /Cruising speed/ })).toBeNull();
  });

  it('refuses a speed that is not a number above zero and keeps the one saved', async () => {
    localStorage.setItem('shoalbook.cruiseMps', JSON.stringify(10));
    const user = userEvent.setup();
    renderWithApp(<CheckInClock day={day} lake={lake} ramp={ramp} unit="ft" now={clock('2025-06-14T17:42:00Z')} />);
    const speed = screen.getByRole('textbox', { name: 'Cruising speed (mph)' });
    // 10 m/s = 22.37 mph.
    expect(speed).toHaveValue('22.4');
    await user.clear(speed);
    await user.type(speed, 'fast');
    expect(screen.getByText('A speed above 0, like 40.')).toBeInTheDocument();
    await user.clear(speed);
    await user.type(speed, '0');
    expect(screen.getByText('A speed above 0, like 40.')).toBeInTheDocument();
    expect(JSON.parse(localStorage.getItem('shoalbook.cruiseMps')!)).toBe(10);
    expect(screen.getByText(/this needs your cruising speed, this phone’s position\.$/)).toBeInTheDocument();
  });

  it('says what is missing: a ramp, a check-in time, a position the angler has not allowed', async () => {
    fakeGeolocation({ error: { code: 1, message: 'User denied Geolocation' } });
    const user = userEvent.setup();
    const { unmount } = renderWithApp(
      <CheckInClock day={day} lake={lake} ramp={null} unit="ft" now={clock('2025-06-14T17:42:00Z')} />,
    );
    await user.type(screen.getByRole('textbox', { name: 'Cruising speed (mph)' }), '40');
    await user.click(screen.getByRole('button', { name: 'Locate for the run back' }));
    expect(await screen.findByText(/may not use this phone’s position: allow location/)).toBeInTheDocument();
    expect(
      screen.getByText(
        'For a leave-by time this needs the event’s launch ramp (in the event’s details), this phone’s position.',
      ),
    ).toBeInTheDocument();
    unmount();

    renderWithApp(
      <CheckInClock
        day={{ ...day, checkInTime: null }}
        lake={lake}
        ramp={ramp}
        unit="ft"
        now={clock('2025-06-14T17:42:00Z')}
      />,
    );
    expect(screen.getByText(/No check-in time for this day yet/)).toBeInTheDocument();
    expect(screen.queryByRole('timer')).toBeNull();
  });

  it('shows only on the day itself, by the lake clock', () => {
    // 04:30 UTC on the 15th is still 23:30 on the 14th in Chicago: shown. A day later: not.
    const { unmount } = renderWithApp(
      <CheckInClock day={day} lake={lake} ramp={ramp} unit="ft" now={clock('2025-06-15T04:30:00Z')} />,
    );
    expect(screen.getByRole('region', { name: 'Check-in' })).toBeInTheDocument();
    unmount();
    renderWithApp(<CheckInClock day={day} lake={lake} ramp={ramp} unit="ft" now={clock('2025-06-15T05:30:00Z')} />);
    expect(screen.queryByRole('region', { name: 'Check-in' })).toBeNull();
  });
});
