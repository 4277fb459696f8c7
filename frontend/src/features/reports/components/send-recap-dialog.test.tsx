import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeAll, describe, expect, it } from 'vitest';
import { fakeNetwork } from '../../../testing/fake-network';
import { renderWithApp } from '../../../testing/render';
import { SendRecapButton } from './send-recap-dialog';

const members = [
  {
    userId: 'u-owner',
    email: 'owner@example.test',
    displayName: 'Olive Owner',
    role: 'owner',
    joinedAt: '2025-01-01T00:00:00Z',
  },
  {
    userId: 'u-angler',
    email: 'angler@example.test',
    displayName: 'Andy Angler',
    role: 'angler',
    joinedAt: '2025-01-01T00:00:00Z',
  },
  {
    userId: 'u-viewer',
    email: 'coach@example.test',
    displayName: 'Cory Coach',
    role: 'viewer',
    joinedAt: '2025-01-01T00:00:00Z',
  },
];

// jsdom has constructable style sheets but no document.adoptedStyleSheets; Primer's popover polyfill (the
// dialog's close-button tooltip) spreads it, so give the document an empty list as browsers do.
beforeAll(() => {
  if (!Array.isArray((document as { adoptedStyleSheets?: unknown }).adoptedStyleSheets)) {
    Object.defineProperty(document, 'adoptedStyleSheets', { configurable: true, writable: true, value: [] });
  }
});

describe('SendRecapButton', () => {
  it('sends the recap to the chosen members only, with the CSRF header, and says the e-mail holds no positions', async () => {
    const net = fakeNetwork({
      'GET /api/crews/crew-1/members': { status: 200, body: members },
      'GET /api/auth/csrf': { status: 200, body: { csrfToken: 'token-1' } },
      'POST /api/crews/crew-1/reports/events/ev-1/recap-email': { status: 202, body: { sent: 2 } },
    }).install();
    const user = userEvent.setup();
    renderWithApp(<SendRecapButton crewId="crew-1" eventId="ev-1" eventName="Summer Test Open" myUserId="u-angler" />);

    await user.click(screen.getByRole('button', { name: 'Send recap' }));
    const dialog = await screen.findByRole('dialog');
    expect(within(dialog).getByText(/It contains no positions/)).toBeInTheDocument();
    expect(within(dialog).getByRole('button', { name: 'Send to no one' })).toBeDisabled();

    await user.click(await within(dialog).findByRole('checkbox', { name: 'Olive Owner' }));
    await user.click(within(dialog).getByRole('checkbox', { name: 'Cory Coach' }));
    await user.click(within(dialog).getByRole('checkbox', { name: 'Andy Angler (you)' }));
    await user.click(within(dialog).getByRole('checkbox', { name: 'Andy Angler (you)' }));
    await user.click(within(dialog).getByRole('button', { name: 'Send to 2' }));

    expect(await within(dialog).findByText('Sent to 2 members.')).toBeInTheDocument();
    const [post] = net.to('POST /api/crews/crew-1/reports/events/ev-1/recap-email');
    expect(post.body).toEqual({ userIds: ['u-owner', 'u-viewer'] });
    expect(post.headers['x-csrf-token']).toBe('token-1');
  });

  it('shows the server’s refusal and sends nothing more', async () => {
    const net = fakeNetwork({
      'GET /api/crews/crew-1/members': { status: 200, body: members },
      'GET /api/auth/csrf': { status: 200, body: { csrfToken: 'token-1' } },
      'POST /api/crews/crew-1/reports/events/ev-1/recap-email': {
        status: 403,
        body: { statusCode: 403, error: 'Forbidden', message: 'Viewers cannot send recaps.', requestId: 'r-1' },
      },
    }).install();
    const user = userEvent.setup();
    renderWithApp(<SendRecapButton crewId="crew-1" eventId="ev-1" eventName="Summer Test Open" />);
    await user.click(screen.getByRole('button', { name: 'Send recap' }));
    const dialog = await screen.findByRole('dialog');
    await user.click(await within(dialog).findByRole('checkbox', { name: 'Olive Owner' }));
    await user.click(within(dialog).getByRole('button', { name: 'Send to 1' }));
    expect(await within(dialog).findByText('Viewers cannot send recaps.')).toBeInTheDocument();
    expect(net.to('POST /api/crews/crew-1/reports/events/ev-1/recap-email')).toHaveLength(1);
  });
});
