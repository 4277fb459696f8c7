import type { MemberView } from '@shoalbook/shared';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { renderWithApp } from '../../../testing/render';
import { MembersTable } from './members-table';

const members: MemberView[] = [
  {
    userId: 'u-own',
    email: 'skipper@example.test',
    displayName: 'Skipper Jo',
    role: 'owner',
    joinedAt: '2025-03-01T10:00:00Z',
  },
  {
    userId: 'u-ang',
    email: 'partner@example.test',
    displayName: 'Partner Ray',
    role: 'angler',
    joinedAt: '2025-03-02T10:00:00Z',
  },
  {
    userId: 'u-view',
    email: 'coach@example.test',
    displayName: 'Coach Lin',
    role: 'viewer',
    joinedAt: '2025-03-03T10:00:00Z',
  },
];

describe('MembersTable', () => {
  it('gives owners a role control on every row and a remove button on everyone but themselves', async () => {
    const onChangeRole = vi.fn();
    const onRemove = vi.fn();
    renderWithApp(
      <MembersTable members={members} ownUserId="u-own" canManage onChangeRole={onChangeRole} onRemove={onRemove} />,
    );

    const selects = screen.getAllByRole('combobox');
    expect(selects).toHaveLength(3);
    expect(screen.getByRole('combobox', { name: 'Role of Partner Ray' })).toHaveValue('angler');
    expect(screen.getByRole('combobox', { name: 'Role of Coach Lin' })).toHaveValue('viewer');
    expect(screen.queryByRole('button', { name: /Remove Skipper Jo/ })).not.toBeInTheDocument();
    expect(screen.getAllByRole('button', { name: /^Remove / })).toHaveLength(2);

    await userEvent.selectOptions(screen.getByRole('combobox', { name: 'Role of Coach Lin' }), 'angler');
    expect(onChangeRole).toHaveBeenCalledWith(members[2], 'angler');

    await userEvent.click(screen.getByRole('button', { name: 'Remove Partner Ray from the crew' }));
    expect(onRemove).toHaveBeenCalledWith(members[1]);
  });

  it.each([['angler'], ['viewer']])('shows a %s the roles as text, with no controls', (role) => {
    const me = members.find((m) => m.role === role)!;
    renderWithApp(<MembersTable members={members} ownUserId={me.userId} canManage={false} />);

    expect(screen.queryByRole('combobox')).not.toBeInTheDocument();
    expect(screen.queryByRole('button')).not.toBeInTheDocument();
    const row = screen.getByRole('row', { name: /Coach Lin/ });
    expect(within(row).getByText('Viewer')).toBeInTheDocument();
    expect(screen.getByRole('row', { name: new RegExp(me.displayName) })).toHaveTextContent('(you)');
  });

  it('lists every member with name and e-mail', () => {
    renderWithApp(<MembersTable members={members} ownUserId="u-own" canManage={false} />);
    const rows = screen.getAllByRole('row').slice(1);
    expect(rows.map((r) => within(r).getAllByRole('cell')[1].textContent)).toEqual([
      'skipper@example.test',
      'partner@example.test',
      'coach@example.test',
    ]);
  });
});
