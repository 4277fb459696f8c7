import type { MeResponse, UnitPreferences } from '@shoalbook/shared';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { meQuery } from '../../../lib/auth';
import { fakeNetwork, type SeenRequest } from '../../../testing/fake-network';
import { renderWithApp } from '../../../testing/render';
import { UnitsForm } from './units-form';

const start: UnitPreferences = { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' };
const group = (name: string) => screen.getByRole('group', { name });

function meWith(units: UnitPreferences): MeResponse {
  return { user: { id: 'u1', email: 'a@example.test', displayName: 'A', siteRole: 'user', units }, crews: [] };
}

describe('UnitsForm', () => {
  it('shows the saved preferences as the checked choices', () => {
    renderWithApp(<UnitsForm units={{ weight: 'lb-oz', length: 'mm', depth: 'm', temperature: 'C' }} />);
    expect(within(group('Weight')).getByRole('radio', { name: /Pounds and ounces/ })).toBeChecked();
    expect(within(group('Fish length')).getByRole('radio', { name: /Millimetres/ })).toBeChecked();
    expect(within(group('Water depth')).getByRole('radio', { name: /Metres/ })).toBeChecked();
    expect(within(group('Water temperature')).getByRole('radio', { name: /Celsius/ })).toBeChecked();
    expect(screen.getByRole('button', { name: 'Save units' })).toBeDisabled();
  });

  it('sends the whole set of choices and takes the server’s answer as the new state', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': { status: 200, body: { csrfToken: 'tok-u' } },
      'PATCH /api/auth/me': (req: SeenRequest) => ({
        status: 200,
        body: meWith((req.body as { units: UnitPreferences }).units),
      }),
    }).install();
    const { queryClient } = renderWithApp(<UnitsForm units={start} />);

    await userEvent.click(within(group('Weight')).getByRole('radio', { name: /Kilograms/ }));
    await userEvent.click(within(group('Water temperature')).getByRole('radio', { name: /Celsius/ }));
    await userEvent.click(screen.getByRole('button', { name: 'Save units' }));

    expect(await screen.findByText('Units saved.')).toBeInTheDocument();
    const [patch] = net.to('PATCH /api/auth/me');
    expect(patch.body).toEqual({ units: { weight: 'kg', length: 'in', depth: 'ft', temperature: 'C' } });
    expect(patch.headers['x-csrf-token']).toBe('tok-u');
    expect(queryClient.getQueryData<MeResponse>(meQuery.queryKey)?.user.units.weight).toBe('kg');
  });

  it('shows a refused unit’s message beside its own group', async () => {
    fakeNetwork({
      'GET /api/auth/csrf': { status: 200, body: { csrfToken: 't' } },
      'PATCH /api/auth/me': {
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Some fields need attention.',
          fieldErrors: { 'units.depth': ['Depth must be ft or m.'] },
        },
      },
    }).install();
    renderWithApp(<UnitsForm units={start} />);

    await userEvent.click(within(group('Water depth')).getByRole('radio', { name: /Metres/ }));
    await userEvent.click(screen.getByRole('button', { name: 'Save units' }));

    // Primer joins a group's validation message to the group's accessible name, so it is announced with it.
    await waitFor(() =>
      expect(screen.getByRole('group', { name: /^Water depth/ })).toHaveAccessibleName(
        /^Water depth\s*Depth must be ft or m\.$/,
      ),
    );
    expect(screen.getByRole('group', { name: /^Weight/ })).toHaveAccessibleName('Weight');
    expect(screen.getAllByText('Depth must be ft or m.').length).toBeGreaterThan(0);
    expect(screen.queryByText('Units saved.')).not.toBeInTheDocument();
  });
});
