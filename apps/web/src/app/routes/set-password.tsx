import type { SetPasswordReply } from '@polecourt/contracts';
import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';

import { Wordmark } from '@/components/layouts/wordmark';
import { Alert } from '@/components/ui/alert';
import { SetPasswordForm } from '@/features/password/components/set-password-form';

export default function SetPasswordRoute() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const [done, setDone] = useState<SetPasswordReply | null>(null);

  return (
    <main id="main" className="flex min-h-screen items-center justify-center px-4 py-12">
      <title>Choose your password · Polecourt</title>
      <div className="w-full max-w-sm">
        <div className="mb-6">
          <Wordmark size="lg" />
        </div>
        <div className="rounded border border-rule bg-paper-raised p-6">
          <h1 className="mb-4 text-lg font-semibold">Choose your password</h1>
          {done ? (
            <Alert tone="success" title="Password set">
              <p>
                You can now sign in as <span className="[font-variant-ligatures:no-contextual]">{done.email}</span>.{' '}
                <Link to="/sign-in">Sign in</Link>
              </p>
            </Alert>
          ) : token ? (
            <SetPasswordForm token={token} onDone={setDone} />
          ) : (
            <Alert tone="error" title="This page needs the link from your e-mail">
              <p>
                Open the link in your invitation or password-reset message again, or <Link to="/forgot-password">ask for a new link</Link>.
              </p>
            </Alert>
          )}
        </div>
        <p className="mt-4 text-xs text-ink-muted">Each link works once. Invitations last 72 hours, reset links one hour.</p>
      </div>
    </main>
  );
}
