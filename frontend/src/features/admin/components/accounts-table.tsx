import type { SiteRole } from '@shoalbook/shared';
import { Button, Label, Select, Text } from '@primer/react';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import type { AdminAccountRow } from '../api/admin-api';
import tableStyles from '../../../components/table/table.module.css';
import styles from './accounts-table.module.css';

const column = createColumnHelper<AdminAccountRow>();
const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/** Accounts with their site role (a picker) and status (a disable / enable button); neither for one's own account. */
export function AccountsTable({
  accounts,
  ownUserId,
  busyUserId,
  onToggleDisabled,
  onChangeSiteRole,
}: {
  accounts: AdminAccountRow[];
  ownUserId: string;
  busyUserId?: string | null;
  onToggleDisabled: (account: AdminAccountRow) => void;
  onChangeSiteRole: (account: AdminAccountRow, role: SiteRole) => void;
}) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'createdAt', desc: true }]);
  const columns = useMemo(
    () => [
      column.accessor('displayName', { header: 'Name' }),
      column.accessor('email', {
        header: 'E-mail',
        cell: (i) => <span className={tableStyles.wrapAnywhere}>{i.getValue()}</span>,
      }),
      column.accessor('siteRole', {
        header: 'Site role',
        cell: (i) => {
          const account = i.row.original;
          if (account.id === ownUserId) return <Label variant="accent">Admin</Label>;
          return (
            <Select
              size="small"
              aria-label={`Site role of ${account.email}`}
              value={account.siteRole}
              disabled={busyUserId === account.id}
              onChange={(e) => onChangeSiteRole(account, e.target.value as SiteRole)}
            >
              <Select.Option value="user">User</Select.Option>
              <Select.Option value="admin">Admin</Select.Option>
            </Select>
          );
        },
      }),
      column.accessor('createdAt', { header: 'Joined', cell: (i) => dateFormat.format(new Date(i.getValue())) }),
      column.accessor('disabled', {
        header: 'Status',
        cell: (i) =>
          i.getValue() ? <Label variant="danger">Disabled</Label> : <Label variant="success">Active</Label>,
      }),
      column.display({
        id: 'actions',
        header: () => <span className="sb-visually-hidden">Actions</span>,
        cell: (i) => {
          const account = i.row.original;
          if (account.id === ownUserId) return <Text className={tableStyles.muted}>You</Text>;
          return (
            <Button
              size="small"
              variant={account.disabled ? 'default' : 'danger'}
              loading={busyUserId === account.id}
              aria-label={`${account.disabled ? 'Enable' : 'Disable'} the account of ${account.email}`}
              onClick={() => onToggleDisabled(account)}
            >
              {account.disabled ? 'Enable' : 'Disable'}
            </Button>
          );
        },
      }),
    ],
    [ownUserId, busyUserId, onToggleDisabled, onChangeSiteRole],
  );
  const table = useReactTable({
    data: accounts,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (a) => a.id,
  });

  return (
    <div className={tableStyles.scroller} role="region" aria-label="Accounts" tabIndex={0}>
      <table className={tableStyles.table}>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const sortable = header.column.getCanSort() && header.column.id !== 'actions';
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                  >
                    {sortable ? (
                      <button
                        type="button"
                        className={styles.sortButton}
                        onClick={header.column.getToggleSortingHandler()}
                      >
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true">{sorted === 'asc' ? ' ▲' : sorted === 'desc' ? ' ▼' : ''}</span>
                      </button>
                    ) : (
                      flexRender(header.column.columnDef.header, header.getContext())
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} data-disabled={row.original.disabled || undefined}>
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id}>{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
