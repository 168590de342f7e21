import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo } from 'react';
import { roleLabels } from '../../../../shared/permissions';
import type { User } from '../../../../shared/schemas/user';
import { Button } from '../../../components/ui/button';
import { DataTable } from '../../../components/ui/data-table';

export type UserAction = 'edit' | 'password' | 'toggle-disabled';

const column = createColumnHelper<User>();

function Status({ user }: { user: User }) {
  return user.disabled ? (
    <span className="inline-flex items-center gap-1 rounded-full border border-verdict-stop px-2 py-0.5 text-sm font-semibold text-verdict-stop">
      <span aria-hidden="true">■</span> Disabled
    </span>
  ) : (
    <span className="inline-flex items-center gap-1 rounded-full border border-verdict-go px-2 py-0.5 text-sm font-semibold text-verdict-go">
      <span aria-hidden="true">●</span> Active
    </span>
  );
}

interface UsersTableProps {
  users: User[];
  currentUserId: number;
  /** Site names by id when there are several sites; left out, no Site column. */
  siteNames?: ReadonlyMap<number, string>;
  onAction?: (action: UserAction, user: User) => void;
}

export function UsersTable({ users, currentUserId, siteNames, onAction }: UsersTableProps) {
  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Name', cell: (info) => (info.row.original.id === currentUserId ? `${info.getValue()} (you)` : info.getValue()) }),
      column.accessor('email', { header: 'E-mail' }),
      column.accessor((user) => roleLabels[user.role], { id: 'role', header: 'Role' }),
      ...(siteNames ? [column.accessor((user) => siteNames.get(user.siteId) ?? `Site ${user.siteId}`, { id: 'site', header: 'Site' })] : []),
      column.accessor('units', { header: 'Units', cell: (info) => (info.getValue() === 'us' ? 'US customary' : 'Metric') }),
      column.accessor('disabled', { header: 'Status', cell: ({ row }) => <Status user={row.original} /> }),
      ...(onAction ? [actionsColumn(currentUserId, onAction)] : []),
    ],
    [currentUserId, siteNames, onAction],
  );

  const table = useReactTable({ data: users, columns, getCoreRowModel: getCoreRowModel(), enableSorting: false });
  return <DataTable table={table} caption="Users" />;
}

function actionsColumn(currentUserId: number, onAction: (action: UserAction, user: User) => void) {
  return column.display({
    id: 'actions',
    header: () => <span className="sr-only">Actions</span>,
    cell: ({ row }) => {
      const user = row.original;
      const isSelf = user.id === currentUserId;
      return (
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" onClick={() => onAction('edit', user)} aria-label={`Edit ${user.name}`}>
            Edit
          </Button>
          <Button variant="secondary" onClick={() => onAction('password', user)} aria-label={`Reset password for ${user.name}`}>
            Reset password
          </Button>
          {!isSelf && (
            <Button
              variant={user.disabled ? 'secondary' : 'quiet'}
              onClick={() => onAction('toggle-disabled', user)}
              aria-label={`${user.disabled ? 'Enable' : 'Disable'} ${user.name}`}
            >
              {user.disabled ? 'Enable' : 'Disable'}
            </Button>
          )}
        </div>
      );
    },
  });
}
