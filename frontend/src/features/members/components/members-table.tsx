import { CREW_ROLES, type CrewRole, type MemberView } from '@shoalbook/shared';
import { Button, Label, Select, Text } from '@primer/react';
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable, type ColumnDef } from '@tanstack/react-table';
import { useMemo } from 'react';
import { ROLE_LABELS } from '../../../lib/authorization';
import tableStyles from '../../../components/table/table.module.css';
import styles from './members-table.module.css';

export interface MembersTableProps {
  members: MemberView[];
  /** The signed-in person's user id, so their own row says "you". */
  ownUserId: string;
  /** Owners get a role control and a remove button on each row; everyone else reads. */
  canManage: boolean;
  /** The user id whose role change or removal is in flight. */
  busyUserId?: string | null;
  onChangeRole?: (member: MemberView, role: CrewRole) => void;
  onRemove?: (member: MemberView) => void;
}

const column = createColumnHelper<MemberView>();

/** The crew's members: name, e-mail and role, with owner-only controls; on a phone each row stacks into two lines. */
export function MembersTable({ members, ownUserId, canManage, busyUserId, onChangeRole, onRemove }: MembersTableProps) {
  const columns = useMemo(() => {
    // Columns hold different value types; TanStack's own idiom for such a list is `any` here.
    // eslint-disable-next-line @typescript-eslint/no-explicit-any
    const base: ColumnDef<MemberView, any>[] = [
      column.accessor('displayName', {
        header: 'Name',
        cell: (info) => (
          <Text weight="semibold">
            {info.getValue()}
            {info.row.original.userId === ownUserId ? (
              <Text as="span" weight="normal" className={styles.you}>
                {' '}
                (you)
              </Text>
            ) : null}
          </Text>
        ),
      }),
      column.accessor('email', {
        header: 'E-mail',
        cell: (info) => <span className={tableStyles.wrapAnywhere}>{info.getValue()}</span>,
      }),
      column.accessor('role', {
        header: 'Role',
        cell: (info) => {
          const member = info.row.original;
          if (!canManage)
            return <Label variant={member.role === 'owner' ? 'accent' : 'secondary'}>{ROLE_LABELS[member.role]}</Label>;
          return (
            <Select
              aria-label={`Role of ${member.displayName}`}
              value={member.role}
              disabled={busyUserId === member.userId}
              onChange={(e) => onChangeRole?.(member, e.target.value as CrewRole)}
            >
              {CREW_ROLES.map((role) => (
                <Select.Option key={role} value={role}>
                  {ROLE_LABELS[role]}
                </Select.Option>
              ))}
            </Select>
          );
        },
      }),
    ];
    if (canManage) {
      base.push(
        column.display({
          id: 'actions',
          header: () => <span className="sb-visually-hidden">Actions</span>,
          cell: (info) => {
            const member = info.row.original;
            if (member.userId === ownUserId) return null;
            return (
              <Button
                variant="danger"
                size="small"
                disabled={busyUserId === member.userId}
                aria-label={`Remove ${member.displayName} from the crew`}
                onClick={() => onRemove?.(member)}
              >
                Remove
              </Button>
            );
          },
        }),
      );
    }
    return base;
  }, [canManage, ownUserId, busyUserId, onChangeRole, onRemove]);

  const table = useReactTable({
    data: members,
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (m) => m.userId,
  });

  return (
    <div className={tableStyles.scroller} role="region" aria-label="Crew members" tabIndex={0}>
      <table className={`${tableStyles.table} ${styles.members}`}>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <th key={header.id} scope="col">
                  {header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id}>
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} data-column={cell.column.id}>
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
