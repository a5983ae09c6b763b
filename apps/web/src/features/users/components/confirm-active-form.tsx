import type { PublicUser } from '@polecourt/contracts';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';

import { useUpdateUser } from '../api/update-user';

/** The confirm step before an account is switched off or on again. */
export function ConfirmActiveForm({ user, onDone, onCancel }: { user: PublicUser; onDone: () => void; onCancel: () => void }) {
  const update = useUpdateUser({ mutationConfig: { onSuccess: () => onDone() } });
  const deactivating = user.active;

  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm">
        {deactivating
          ? `${user.name} will no longer be able to sign in. Their past work and its audit trail stay as they are. You can reactivate the account later.`
          : `${user.name} will be able to sign in again with their current password, as ${user.role === 'admin' ? 'an administrator' : 'before'}.`}
      </p>
      {update.error && (
        <Alert tone="error" title={deactivating ? 'The account is still active' : 'The account is still deactivated'}>
          <p>{update.error.message}</p>
        </Alert>
      )}
      <div className="flex justify-end gap-2">
        <Button onClick={onCancel} autoFocus>
          Cancel
        </Button>
        <Button
          variant={deactivating ? 'danger' : 'primary'}
          busy={update.isPending}
          onClick={() => update.mutate({ id: user.id, data: { active: !user.active } })}
        >
          {deactivating ? 'Deactivate account' : 'Reactivate account'}
        </Button>
      </div>
    </div>
  );
}
