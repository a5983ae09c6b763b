import { ErrorBoundary } from '@/components/errors/error-boundary';
import { ErrorPanel } from '@/components/errors/error-panel';
import { PageHeader } from '@/components/ui/page-header';
import { ApiTokensPanel } from '@/features/api-tokens/components/api-tokens-panel';
import { ChangePasswordForm } from '@/features/api-tokens/components/change-password-form';

export default function SettingsTokensRoute() {
  return (
    <>
      <title>Settings · Polecourt</title>
      <PageHeader title="Settings" lead="API tokens for your pipelines, and your password." />
      <div className="flex flex-col gap-10">
        <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} onRetry={reset} />}>
          <ApiTokensPanel />
        </ErrorBoundary>
        <ErrorBoundary fallback={({ error, reset }) => <ErrorPanel error={error} onRetry={reset} />}>
          <ChangePasswordForm />
        </ErrorBoundary>
      </div>
    </>
  );
}
