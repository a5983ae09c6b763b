import { zodResolver } from '@hookform/resolvers/zod';
import type { Revision } from '@polecourt/contracts';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';

import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Loading } from '@/components/ui/loading';
import { TextField } from '@/components/ui/text-field';

import { type ApproveRevisionInput, approveRevisionSchema, useApproveRevision } from '../api/approve-revision';
import { useRevisionImpact } from '../api/get-revision-impact';

import { ImpactTable } from './impact-table';

/**
 * Approving a revision: first the revision impact (every candidate against this revision and
 * the one in force), then the approver acknowledges it, re-enters the password and signs with
 * the meaning "approved".
 */
export function ApproveRevisionDialog({
  revision,
  inForceNumber,
  open,
  onClose,
  onApproved,
  schema = approveRevisionSchema,
}: {
  revision: Revision;
  /** Number of the revision in force that this one replaces, if any. */
  inForceNumber: number | null;
  open: boolean;
  onClose: () => void;
  onApproved?: (revision: Revision) => void;
  schema?: typeof approveRevisionSchema;
}) {
  const impact = useRevisionImpact({ id: revision.id, enabled: open });
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<z.input<typeof approveRevisionSchema>, unknown, ApproveRevisionInput>({
    resolver: zodResolver(schema),
    defaultValues: { password: '', impactAcknowledged: false as unknown as true },
  });
  const approve = useApproveRevision({
    mutationConfig: {
      onSuccess: (approved) => {
        reset();
        onApproved?.(approved);
      },
      onError: (error) => {
        if (error.fields.password) setError('password', { message: error.fields.password });
        if (error.fields.impactAcknowledged) setError('impactAcknowledged', { message: error.fields.impactAcknowledged });
      },
    },
  });
  const fieldError = approve.error && (approve.error.fields.password || approve.error.fields.impactAcknowledged);
  const close = () => {
    approve.reset();
    reset();
    onClose();
  };
  const changed = impact.data?.changedCount ?? 0;

  return (
    <Dialog
      open={open}
      onClose={close}
      size="lg"
      title={`Approve revision ${revision.number}`}
      description={
        inForceNumber !== null
          ? `Once approved, revision ${revision.number} is in force and revision ${inForceNumber} is retired. Neither ever changes again.`
          : `Once approved, revision ${revision.number} is in force and never changes again.`
      }
    >
      <div className="flex flex-col gap-5">
        <section aria-labelledby="impact-heading" className="flex flex-col gap-2">
          <h3 id="impact-heading" className="font-semibold">
            Revision impact
          </h3>
          <ErrorBoundary fallback={({ error, reset: retry }) => <ErrorPanel error={error} title="The revision impact could not be shown" onRetry={retry} />}>
            {impact.isPending ? (
              <Loading label="Assessing every candidate against both revisions…" />
            ) : impact.isError ? (
              <ErrorPanel error={impact.error} title="The revision impact could not be loaded" onRetry={() => void impact.refetch()} />
            ) : (
              <ImpactTable impact={impact.data} />
            )}
          </ErrorBoundary>
        </section>

        <form noValidate onSubmit={handleSubmit((data) => approve.mutate({ id: revision.id, data }))} className="flex flex-col gap-4 border-t border-rule pt-4">
          {approve.error && !fieldError && (
            <Alert tone="error" title="The revision was not approved">
              <p>{approve.error.message}</p>
            </Alert>
          )}
          <div className="flex flex-col gap-1">
            <label className="flex items-start gap-3 text-sm">
              <input
                type="checkbox"
                className="mt-1 size-4 accent-[var(--color-accent)]"
                disabled={!impact.isSuccess}
                aria-invalid={errors.impactAcknowledged ? true : undefined}
                aria-describedby={errors.impactAcknowledged ? 'ack-error' : undefined}
                {...register('impactAcknowledged')}
              />
              <span>
                I have read the revision impact
                {impact.isSuccess && `: ${changed} of ${impact.data.total} ${impact.data.total === 1 ? 'candidate changes' : 'candidates change'} verdict`}.
              </span>
            </label>
            {errors.impactAcknowledged && (
              <p id="ack-error" className="text-sm text-fail">
                {errors.impactAcknowledged.message}
              </p>
            )}
          </div>
          <div className="rounded border border-rule bg-paper px-3 py-2 text-sm">
            <p>
              <span className="font-semibold">Meaning of your signature: approved.</span> You approve revision {revision.number} as the limits in
              force for its requirement set. Your printed name and the date and time (UTC) are recorded with it.
            </p>
          </div>
          <TextField
            label="Your password"
            type="password"
            autoComplete="current-password"
            hint="Re-enter it to sign. Signing with it is the same as your handwritten signature."
            error={errors.password?.message}
            {...register('password')}
          />
          <div className="flex justify-end gap-2">
            <Button onClick={close}>Cancel</Button>
            <Button type="submit" variant="primary" busy={approve.isPending} disabled={!impact.isSuccess}>
              {approve.isPending ? 'Signing…' : 'Sign and approve'}
            </Button>
          </div>
        </form>
      </div>
    </Dialog>
  );
}
