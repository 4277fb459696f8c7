import type { CatchView, FindView, UnitPreferences } from '@shoalbook/shared';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { fakeNetwork } from '../../../testing/fake-network';
import { renderWithApp } from '../../../testing/render';
import { CatchEditForm } from './catch-edit-form';
import { testFind } from '../../../testing/journal-fixtures';

const find = (id: string, name: string): FindView => testFind({ id, name, eventId: 'e1' });
const finds = [find('f1', 'North shell bar'), find('f2', 'Rock pile')];
const prefs: UnitPreferences = { weight: 'lb-oz', length: 'in', depth: 'ft', temperature: 'F' };
const csrf = { status: 200, body: { csrfToken: 'tok' } };

// 3 lb 4 oz typed in pounds–ounces; 3 + 4/16 = 3.25 lb. 12:10 UTC is 07:10 in Chicago (CDT, UTC−5, IANA tz database).
const logged: CatchView = {
  id: 'k1',
  eventId: 'e1',
  competitionDayId: 'd1',
  competitionDate: '2025-04-12',
  caughtAt: '2025-04-12T12:10:00.000Z',
  findId: 'f1',
  findName: 'North shell bar',
  attributionDistanceM: null,
  lat: null,
  lon: null,
  species: 'largemouth',
  lengthIn: 17,
  weightLb: 3.25,
  lure: 'football jig',
  technique: 'dragging',
  depthFt: null,
  waterTempF: null,
  fate: 'weighed',
  photoId: null,
  weightFlagged: false,
  notes: '',
  entered: {
    weight: { value: 3, unit: 'lb-oz', ounces: 4 },
    length: { value: 17, unit: 'in' },
    depth: null,
    waterTemp: null,
  },
  sky: null,
  version: 4,
};

function renderForm(onReload = vi.fn(), onSaved = vi.fn()) {
  renderWithApp(
    <CatchEditForm
      userId="u1"
      crewId="c1"
      catchView={logged}
      finds={finds}
      prefs={prefs}
      timeZone="America/Chicago"
      onSaved={onSaved}
      onReload={onReload}
    />,
  );
  return { onReload, onSaved };
}

describe('CatchEditForm', () => {
  it('starts from what was typed and sends only the changed fields, with the version it was loaded with', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'PATCH /api/crews/c1/catches/k1': (request) => ({
        status: 200,
        body: { ...logged, ...(request.body as object), version: 5 },
      }),
    }).install();
    const user = userEvent.setup();
    const { onSaved } = renderForm();

    expect(screen.getByRole('textbox', { name: /^Time/ })).toHaveValue('07:10');
    expect(screen.getByRole('textbox', { name: /^Weight/ })).toHaveValue('3-4');
    expect(screen.getByRole('combobox', { name: /^Find/ })).toHaveValue('North shell bar (Hard bottom, 14 ft)');

    await user.clear(screen.getByRole('textbox', { name: /^Time/ }));
    await user.type(screen.getByRole('textbox', { name: /^Time/ }), '07:25');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Fate' }), 'culled');
    await user.clear(screen.getByRole('combobox', { name: /^Find/ }));
    await user.type(screen.getByRole('combobox', { name: /^Find/ }), 'rock pile');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));

    await waitFor(() => expect(net.to('PATCH /api/crews/c1/catches/k1')).toHaveLength(1));
    // Weight, length, lure and technique were not touched, so they are not re-sent (what was typed stays as typed).
    expect(net.to('PATCH /api/crews/c1/catches/k1')[0].body).toEqual({
      version: 4,
      caughtAt: '07:25',
      fate: 'culled',
      findId: 'f2',
    });
    await waitFor(() => expect(onSaved).toHaveBeenCalledOnce());
  });

  it('checks a mistyped weight before sending anything', async () => {
    const net = fakeNetwork({ 'GET /api/auth/csrf': csrf }).install();
    const user = userEvent.setup();
    renderForm();
    await user.clear(screen.getByRole('textbox', { name: /^Weight/ }));
    await user.type(screen.getByRole('textbox', { name: /^Weight/ }), '3-17');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(await screen.findByText('Weight: ounces go from 0 to 15.9; 16 oz make a pound.')).toBeInTheDocument();
    expect(net.to('PATCH /api/crews/c1/catches/k1')).toHaveLength(0);
  });

  it('says so when nothing changed, without a request', async () => {
    const net = fakeNetwork({ 'GET /api/auth/csrf': csrf }).install();
    const user = userEvent.setup();
    renderForm();
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(await screen.findByText(/Nothing has changed yet/)).toBeInTheDocument();
    expect(net.to('PATCH /api/crews/c1/catches/k1')).toHaveLength(0);
  });

  it('on 409 stale_version explains that someone saved first and offers to reload the latest', async () => {
    fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'PATCH /api/crews/c1/catches/k1': {
        status: 409,
        body: {
          statusCode: 409,
          error: 'Conflict',
          code: 'stale_version',
          message:
            'This catch was changed by someone else since you loaded it (now version 5). Reload it and apply your change again.',
        },
      },
    }).install();
    const user = userEvent.setup();
    const { onReload, onSaved } = renderForm();
    await user.selectOptions(screen.getByRole('combobox', { name: 'Species' }), 'spotted');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));

    expect(await screen.findByText('This catch was changed elsewhere')).toBeInTheDocument();
    expect(screen.getByText(/so yours was not saved/)).toBeInTheDocument();
    // Saving again with the old version would only fail again: the way on is to reload.
    expect(screen.getByRole('button', { name: 'Save changes' })).toBeDisabled();
    // Primer's banner renders its action twice (one copy per layout; CSS hides the other in a browser).
    await user.click(screen.getAllByRole('button', { name: 'Reload the latest' })[0]);
    expect(onReload).toHaveBeenCalledOnce();
    expect(onSaved).not.toHaveBeenCalled();
  });

  it('shows a server field error beside its field', async () => {
    fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'PATCH /api/crews/c1/catches/k1': {
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          code: 'validation_failed',
          message: 'Check the field "caughtAt".',
          fieldErrors: {
            caughtAt: [
              'The catch time falls on 2025-04-13 (lake time, America/Chicago), not on the competition day 2025-04-12.',
            ],
          },
        },
      },
    }).install();
    const user = userEvent.setup();
    renderForm();
    await user.clear(screen.getByRole('textbox', { name: /^Time/ }));
    await user.type(screen.getByRole('textbox', { name: /^Time/ }), '23:59');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    const time = screen.getByRole('textbox', { name: /^Time/ });
    await waitFor(() => expect(time).toHaveAccessibleDescription(/not on the competition day 2025-04-12/));
    expect(screen.getByText('The changes were not saved')).toBeInTheDocument();
  });
});
