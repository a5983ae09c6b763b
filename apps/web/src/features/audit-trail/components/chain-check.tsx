import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { errorMessage } from '@/components/errors/error-message';

import { useVerifyAuditTrail } from '../api/verify-audit-trail';

/** "Check the chain": recomputes every link on the server and says, in words, whether the trail is intact. */
export function ChainCheck() {
  const verify = useVerifyAuditTrail();
  const result = verify.data;
  return (
    <section aria-labelledby="chain-check-heading" className="flex flex-col gap-3 rounded border border-rule bg-paper-raised p-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h2 id="chain-check-heading" className="text-base font-semibold">
            Integrity of the trail
          </h2>
          <p className="text-sm text-ink-muted">
            Each event carries a hash of itself and of the event before it. The check recomputes every link, oldest first.
          </p>
        </div>
        <Button variant="primary" busy={verify.isPending} onClick={() => verify.mutate()}>
          {verify.isPending ? 'Checking the chain…' : 'Check the chain'}
        </Button>
      </div>
      <div aria-live="polite">
        {verify.isError && (
          <Alert tone="error" title="The check could not be run">
            <p>{errorMessage(verify.error)}</p>
          </Alert>
        )}
        {result && !verify.isPending && result.intact && (
          <Alert tone="success" title="Intact: no event is missing or altered">
            <p>
              All {result.checked.toLocaleString()} events were checked, oldest first; every hash and every link to the event before it
              matches, and the chain ends where the recorded head says it does.
            </p>
          </Alert>
        )}
        {result && !verify.isPending && !result.intact && (
          <Alert tone="error" title={`Not intact: the chain breaks at event ${result.firstBreak?.id ?? 'unknown'}`}>
            <p>
              The first break found is at event {result.firstBreak?.id ?? 'unknown'}: {result.firstBreak?.reason ?? 'no reason was given'}.{' '}
              {result.checked.toLocaleString()} events were checked up to it. That event or the one before it was changed or removed
              outside Polecourt; events from there on cannot be relied on until an administrator has looked into it.
            </p>
          </Alert>
        )}
      </div>
    </section>
  );
}
