import { type PublicUser, ROLES, ROLE_LABELS, type Role } from '@polecourt/contracts';
import { useState } from 'react';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/select-field';

import { useUpdateUser } from '../api/update-user';

const roleOptions = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

export function ChangeRoleForm({ user, onDone, onCancel }: { user: PublicUser; onDone: () => void; onCancel: () => void }) {
  const [role, setRole] = useState<Role>(user.role);
  const update = useUpdateUser({ mutationConfig: { onSuccess: () => onDone() } });

  return (
    <form
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        if (role !== user.role) update.mutate({ id: user.id, data: { role } });
      }}
      className="flex flex-col gap-4"
    >
      {update.error && (
        <Alert tone="error" title="The role was not changed">
          <p>{update.error.fields.role ?? update.error.message}</p>
        </Alert>
      )}
      <SelectField
        label="New role"
        options={roleOptions}
        value={role}
        autoFocus
        onChange={(event) => setRole(event.target.value as Role)}
      />
      <p className="text-sm text-ink-muted">
        {ROLE_LABELS[user.role]} now. The change applies from {user.name}’s next request.
      </p>
      <div className="flex justify-end gap-2">
        <Button onClick={onCancel}>Cancel</Button>
        <Button type="submit" variant="primary" busy={update.isPending} disabled={role === user.role}>
          Save role
        </Button>
      </div>
    </form>
  );
}
