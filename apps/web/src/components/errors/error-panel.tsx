import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';

import { errorMessage } from './error-message';

/** The fallback of a local error boundary or a failed query: what went wrong and a way to try again. */
export function ErrorPanel({ error, title = 'This part could not be shown', onRetry }: { error: unknown; title?: string; onRetry?: () => void }) {
  return (
    <Alert tone="error" title={title}>
      <p>{errorMessage(error)}</p>
      {onRetry && (
        <Button size="sm" className="mt-3" onClick={onRetry}>
          Try again
        </Button>
      )}
    </Alert>
  );
}
