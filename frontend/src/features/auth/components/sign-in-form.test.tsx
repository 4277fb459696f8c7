import type { MeResponse } from '@shoalbook/shared';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { meQuery } from '../../../lib/auth';
import { fakeNetwork } from '../../../testing/fake-network';
import { renderWithApp } from '../../../testing/render';
import { SignInForm } from './sign-in-form';

const csrf = { status: 200, body: { csrfToken: 'tok' } };

describe('SignInForm', () => {
  it('shows the server’s field errors beside the fields they belong to', async () => {
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/auth/sign-in': {
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Some fields need attention.',
          fieldErrors: {
            email: ['Enter an e-mail address like name@example.com.'],
            password: ['Enter your password.'],
          },
          requestId: 'q1',
        },
      },
    }).install();
    renderWithApp(<SignInForm onSignedIn={vi.fn()} />);

    await userEvent.type(screen.getByLabelText(/e-mail/i), 'not-an-address');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    const email = screen.getByLabelText(/e-mail/i);
    const password = screen.getByLabelText(/password/i);
    await waitFor(() => expect(email).toHaveAccessibleDescription(/name@example\.com/));
    expect(password).toHaveAccessibleDescription(/Enter your password\./);
    expect(email).toHaveAttribute('aria-invalid', 'true');
    // Each message sits with its own field, not with the other one.
    expect(email).not.toHaveAccessibleDescription(/Enter your password/);
    expect(screen.getByText(/fields that need a look/i)).toBeInTheDocument();
    expect(net.to('POST /api/auth/sign-in')[0].body).toEqual({ email: 'not-an-address', password: '' });
  });

  it('shows the wrong-credentials sentence and keeps the person on the form', async () => {
    fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/auth/sign-in': {
        status: 401,
        body: { statusCode: 401, error: 'Unauthorized', message: 'E-mail or password is wrong.', requestId: 'q2' },
      },
    }).install();
    const onSignedIn = vi.fn();
    renderWithApp(<SignInForm onSignedIn={onSignedIn} />);

    await userEvent.type(screen.getByLabelText(/e-mail/i), 'owner@demo.test');
    await userEvent.type(screen.getByLabelText(/password/i), 'not-the-password');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('E-mail or password is wrong.')).toBeInTheDocument();
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('on success remembers who signed in and hands the answer on', async () => {
    const me: MeResponse = {
      user: {
        id: 'u1',
        email: 'owner@demo.test',
        displayName: 'Owner',
        siteRole: 'user',
        units: { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' },
      },
      crews: [{ crewId: 'c1', crewName: 'Morning Shift', role: 'owner' }],
    };
    const net = fakeNetwork({
      'GET /api/auth/csrf': [csrf, { status: 200, body: { csrfToken: 'after' } }],
      'POST /api/auth/sign-in': { status: 200, body: me },
    }).install();
    const onSignedIn = vi.fn();
    const { queryClient } = renderWithApp(<SignInForm onSignedIn={onSignedIn} />);

    await userEvent.type(screen.getByLabelText(/e-mail/i), '  owner@demo.test ');
    await userEvent.type(screen.getByLabelText(/password/i), 'shoalbook-demo');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(me));
    expect(queryClient.getQueryData(meQuery.queryKey)).toEqual(me);
    expect(net.to('POST /api/auth/sign-in')[0].body).toEqual({ email: 'owner@demo.test', password: 'shoalbook-demo' });
    // The session changed, so a new CSRF token was fetched.
    expect(net.to('GET /api/auth/csrf')).toHaveLength(2);
  });
});
