import type { Revision } from '@polecourt/contracts';
import { useState } from 'react';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import type { RevisionPermissions } from '@/lib/permissions';

import { useRetireRevision } from '../api/retire-revision';
import { useSubmitRevision } from '../api/submit-revision';

import { ApproveRevisionDialog } from './approve-revision-dialog';

/**
 * The buttons a revision offers the signed-in person in its state: Submit for review (its
 * author, on a draft), Approve (someone else, in review), Retire (approved). Nothing at all
 * for a role that may not change it.
 */
export function WorkflowActions({
  revision,
  permissions,
  inForceNumber,
  unsavedChanges = false,
  onNotice,
}: {
  revision: Revision;
  permissions: RevisionPermissions;
  inForceNumber: number | null;
  unsavedChanges?: boolean;
  /** Where to say what happened; the state change usually re-renders the page around these buttons. */
  onNotice?: (text: string) => void;
}) {
  const [approving, setApproving] = useState(false);
  const [retiring, setRetiring] = useState(false);
  const [ownNotice, setOwnNotice] = useState<string | null>(null);
  const notice = onNotice ? null : ownNotice;
  const setNotice = (text: string) => (onNotice ? onNotice(text) : setOwnNotice(text));
  const submit = useSubmitRevision({ mutationConfig: { onSuccess: (r) => setNotice(`Revision ${r.number} is in review. Another systems engineer or an administrator approves it.`) } });
  const retire = useRetireRevision({
    mutationConfig: {
      onSuccess: (r) => {
        setRetiring(false);
        setNotice(`Revision ${r.number} is retired.`);
      },
    },
  });

  const anything = permissions.submit || permissions.approve || permissions.retire || permissions.approveBlockedBy;
  if (!anything && !notice) return null;

  return (
    <div className="flex flex-col gap-3">
      {notice && <Alert tone="success">{notice}</Alert>}
      {submit.error && (
        <Alert tone="error" title="The revision was not submitted">
          <p>{submit.error.message}</p>
        </Alert>
      )}
      <div className="flex flex-wrap items-center gap-2">
        {permissions.submit && (
          <>
            <Button variant="primary" busy={submit.isPending} disabled={unsavedChanges} onClick={() => submit.mutate({ id: revision.id })}>
              Submit for review
            </Button>
            {unsavedChanges && <span className="text-sm text-ink-muted">Save your changes before submitting.</span>}
          </>
        )}
        {permissions.approve && (
          <Button variant="primary" onClick={() => setApproving(true)}>
            Approve…
          </Button>
        )}
        {permissions.approveBlockedBy === 'own_revision' && (
          <p className="text-sm text-ink-muted">You wrote this revision, so another systems engineer or an administrator approves it.</p>
        )}
        {permissions.retire && (
          <Button variant="danger" onClick={() => setRetiring(true)}>
            Retire…
          </Button>
        )}
      </div>

      {permissions.approve && (
        <ApproveRevisionDialog
          revision={revision}
          inForceNumber={inForceNumber}
          open={approving}
          onClose={() => setApproving(false)}
          onApproved={(r) => {
            setApproving(false);
            setNotice(`Revision ${r.number} is approved and in force.`);
          }}
        />
      )}
      {permissions.retire && (
        <Dialog open={retiring} onClose={() => setRetiring(false)} title={`Retire revision ${revision.number}?`}>
          <div className="flex flex-col gap-4">
            <p className="text-sm">
              The requirement set will have no revision in force until another one is approved. Assessments made against revision {revision.number} stay
              as they are and are shown as made against a retired revision.
            </p>
            {retire.error && (
              <Alert tone="error" title="The revision was not retired">
                <p>{retire.error.message}</p>
              </Alert>
            )}
            <div className="flex justify-end gap-2">
              <Button autoFocus onClick={() => setRetiring(false)}>
                Cancel
              </Button>
              <Button variant="danger" busy={retire.isPending} onClick={() => retire.mutate({ id: revision.id })}>
                Retire revision {revision.number}
              </Button>
            </div>
          </div>
        </Dialog>
      )}
    </div>
  );
}
