import { type PublicUser, ROLE_LABELS } from '@polecourt/contracts';
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo } from 'react';

import { Button } from '@/components/ui/button';
import { cx } from '@/utils/cx';
import { formatDateTime } from '@/utils/format-date-time';

const column = createColumnHelper<PublicUser>();

export type UserAction = { kind: 'role' | 'active'; user: PublicUser };

/** The accounts on one page of the list, with the admin's per-row controls. */
export function UsersTable({
  users,
  currentUserId,
  onAction,
}: {
  users: PublicUser[];
  currentUserId: number;
  onAction: (action: UserAction) => void;
}) {
  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Name' }),
      column.accessor('email', { header: 'E-mail' }),
      column.accessor('role', { header: 'Role', cell: (info) => ROLE_LABELS[info.getValue()] }),
      column.accessor('active', {
        header: 'Status',
        cell: (info) =>
          info.getValue() ? (
            <span className="inline-flex items-center gap-1.5">
              <span aria-hidden="true" className="size-2 rounded-full bg-pass" />
              Active
            </span>
          ) : (
            <span className="inline-flex items-center gap-1.5 text-ink-muted">
              <span aria-hidden="true" className="size-2 rounded-full border border-ink-faint" />
              Deactivated
            </span>
          ),
      }),
      column.accessor('lastLoginAt', {
        header: 'Last sign-in',
        cell: (info) => {
          const iso = info.getValue();
          const text = formatDateTime(iso);
          return iso && text ? <time dateTime={iso}>{text}</time> : <span className="text-ink-muted">Never</span>;
        },
      }),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: ({ row }) => {
          const user = row.original;
          // An admin does not demote or lock out their own account from here (it could leave nobody in charge).
          if (user.id === currentUserId) return <span className="text-sm text-ink-muted">Your account</span>;
          return (
            <div className="flex flex-wrap justify-end gap-2">
              <Button size="sm" aria-label={`Change role of ${user.name}`} onClick={() => onAction({ kind: 'role', user })}>
                Change role
              </Button>
              <Button
                size="sm"
                variant={user.active ? 'danger' : 'secondary'}
                aria-label={`${user.active ? 'Deactivate' : 'Reactivate'} ${user.name}`}
                onClick={() => onAction({ kind: 'active', user })}
              >
                {user.active ? 'Deactivate' : 'Reactivate'}
              </Button>
            </div>
          );
        },
      }),
    ],
    [currentUserId, onAction],
  );

  const table = useReactTable({ data: users, columns, getCoreRowModel: getCoreRowModel(), getRowId: (u) => String(u.id) });

  return (
    <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
      <table className="w-full border-collapse text-left text-sm tabular-nums">
        <caption className="sr-only">User accounts</caption>
        <thead className="border-b border-rule bg-paper-sunk text-xs uppercase tracking-wide text-ink-muted">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <th key={header.id} scope="col" className="px-4 py-2 font-medium">
                  {header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className={cx('border-b border-rule last:border-b-0', !row.original.active && 'bg-paper')}>
              {row.getVisibleCells().map((cell) =>
                cell.column.id === 'name' ? (
                  <th key={cell.id} scope="row" className="px-4 py-2.5 font-medium">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </th>
                ) : (
                  <td key={cell.id} className={cx('px-4 py-2.5', cell.column.id === 'actions' && 'text-right')}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ),
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
