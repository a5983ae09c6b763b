import type { PublicUser } from '@polecourt/contracts';
import { useCallback, useState } from 'react';

import { ErrorPanel } from '@/components/errors/error-panel';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Loading } from '@/components/ui/loading';

import { USERS_PAGE_SIZE, useUsers } from '../api/get-users';

import { ChangeRoleForm } from './change-role-form';
import { ConfirmActiveForm } from './confirm-active-form';
import { CreateUserForm } from './create-user-form';
import { type UserAction, UsersTable } from './users-table';

/** The whole users page below its heading: list, paging, and the create / change / (de)activate steps. */
export function UsersAdmin({
  currentUserId,
  page,
  onPageChange,
}: {
  currentUserId: number;
  page: number;
  onPageChange: (page: number) => void;
}) {
  const users = useUsers({ page });
  const [creating, setCreating] = useState(false);
  const [action, setAction] = useState<UserAction | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const onAction = useCallback((next: UserAction) => {
    setNotice(null);
    setAction(next);
  }, []);
  const closeAction = () => setAction(null);

  const total = users.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / USERS_PAGE_SIZE));
  const first = total === 0 ? 0 : (page - 1) * USERS_PAGE_SIZE + 1;
  const last = Math.min(total, page * USERS_PAGE_SIZE);

  return (
    <section aria-labelledby="users-list-heading" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="users-list-heading" className="text-lg font-semibold">
          Accounts
        </h2>
        <Button
          variant="primary"
          onClick={() => {
            setNotice(null);
            setCreating(true);
          }}
        >
          Add a user
        </Button>
      </div>

      {notice && <Alert tone="success">{notice}</Alert>}

      {users.isPending ? (
        <Loading label="Loading accounts…" />
      ) : users.isError ? (
        <ErrorPanel error={users.error} title="The accounts could not be loaded" onRetry={() => void users.refetch()} />
      ) : users.data.items.length === 0 ? (
        <Alert tone="info" title={page > 1 ? 'No accounts on this page' : 'No accounts yet'}>
          {page > 1 ? <p>Go back to the first page.</p> : <p>Add the first person with “Add a user”.</p>}
        </Alert>
      ) : (
        <UsersTable users={users.data.items} currentUserId={currentUserId} onAction={onAction} />
      )}

      {total > USERS_PAGE_SIZE && (
        <nav aria-label="Pages of accounts" className="flex items-center justify-between gap-3 text-sm">
          <p className="text-ink-muted" aria-live="polite">
            {first}–{last} of {total}
          </p>
          <div className="flex gap-2">
            <Button size="sm" disabled={page <= 1} onClick={() => onPageChange(page - 1)}>
              Previous page
            </Button>
            <Button size="sm" disabled={page >= pages} onClick={() => onPageChange(page + 1)}>
              Next page
            </Button>
          </div>
        </nav>
      )}

      <Dialog
        open={creating}
        onClose={() => setCreating(false)}
        title="Add a user"
        description="The person signs in with this e-mail address and the initial password."
      >
        <CreateUserForm
          onCancel={() => setCreating(false)}
          onCreated={(user: PublicUser) => {
            setCreating(false);
            setNotice(`Account created for ${user.name} (${user.email}).`);
          }}
        />
      </Dialog>

      <Dialog open={action?.kind === 'role'} onClose={closeAction} title={action ? `Change role of ${action.user.name}` : 'Change role'}>
        {action?.kind === 'role' && (
          <ChangeRoleForm
            user={action.user}
            onCancel={closeAction}
            onDone={() => {
              setNotice(`Role of ${action.user.name} changed.`);
              closeAction();
            }}
          />
        )}
      </Dialog>

      <Dialog
        open={action?.kind === 'active'}
        onClose={closeAction}
        title={action ? `${action.user.active ? 'Deactivate' : 'Reactivate'} ${action.user.name}?` : 'Confirm'}
      >
        {action?.kind === 'active' && (
          <ConfirmActiveForm
            user={action.user}
            onCancel={closeAction}
            onDone={() => {
              setNotice(`${action.user.name} ${action.user.active ? 'is deactivated and can no longer sign in' : 'is active again'}.`);
              closeAction();
            }}
          />
        )}
      </Dialog>
    </section>
  );
}
