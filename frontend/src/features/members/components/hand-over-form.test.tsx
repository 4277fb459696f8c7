import type { MemberView } from '@shoalbook/shared';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { fakeNetwork } from '../../../testing/fake-network';
import { renderWithApp } from '../../../testing/render';
import { HandOverForm } from './hand-over-form';

// jsdom has no document.adoptedStyleSheets; Primer's dialog needs the empty list browsers start with.
beforeAll(() => {
  if (!Array.isArray((document as { adoptedStyleSheets?: unknown }).adoptedStyleSheets)) {
    Object.defineProperty(document, 'adoptedStyleSheets', { configurable: true, writable: true, value: [] });
  }
});

const member = (userId: string, displayName: string, role: MemberView['role']): MemberView =>
  ({ userId, displayName, email: `${userId}@example.test`, role }) as MemberView;
const members = [
  member('u1', 'Ruth Owner', 'owner'),
  member('u2', 'Ada Angler', 'angler'),
  member('u3', 'Vic Viewer', 'viewer'),
];
const csrf = { status: 200, body: { csrfToken: 'tok' } };

describe('HandOverForm', () => {
  it('asks first, naming the new owner, then hands over in one request; leaving sends the owner away', async () => {
    const user = userEvent.setup();
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/hand-over': { status: 200, body: members },
    }).install();
    const onLeft = vi.fn();
    renderWithApp(<HandOverForm crewId="c1" crewName="Dawn Patrol" ownUserId="u1" members={members} onLeft={onLeft} />);
    // Only the others are offered.
    expect(screen.queryAllByRole('option', { name: /Ruth Owner/ })).toHaveLength(0);
    expect(screen.getAllByRole('option', { name: /Ada Angler|Vic Viewer/ })).toHaveLength(2);
    await user.selectOptions(screen.getByRole('combobox', { name: 'New owner' }), 'u3');
    await user.selectOptions(screen.getByRole('combobox', { name: 'You become' }), 'leave');
    await user.click(screen.getByRole('button', { name: 'Hand the crew over' }));
    expect(await screen.findByRole('alertdialog', { name: 'Hand Dawn Patrol to Vic Viewer?' })).toHaveTextContent(
      'You become no member (you leave the crew).',
    );
    expect(net.to('POST /api/crews/c1/hand-over')).toHaveLength(0);
    await user.click(screen.getByRole('button', { name: 'Hand it over' }));
    await waitFor(() => expect(onLeft).toHaveBeenCalledOnce());
    expect(net.to('POST /api/crews/c1/hand-over').map((r) => r.body)).toEqual([{ userId: 'u3', stayAs: 'leave' }]);
  });

  it('says to invite someone first when the owner is alone', () => {
    renderWithApp(
      <HandOverForm crewId="c1" crewName="Solo" ownUserId="u1" members={[members[0]!]} onLeft={() => {}} />,
    );
    expect(screen.getByText(/Invite someone first/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Hand the crew over' })).not.toBeInTheDocument();
  });
});
