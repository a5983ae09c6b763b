import { useState } from 'react';
import { Link } from 'react-router-dom';

import { Wordmark } from '@/components/layouts/wordmark';
import { Alert } from '@/components/ui/alert';
import { RequestResetForm } from '@/features/password/components/request-reset-form';

export default function ForgotPasswordRoute() {
  const [sent, setSent] = useState<{ message: string; email: string } | null>(null);

  return (
    <main id="main" className="flex min-h-screen items-center justify-center px-4 py-12">
      <title>Forgot password · Polecourt</title>
      <div className="w-full max-w-sm">
        <div className="mb-6">
          <Wordmark size="lg" />
        </div>
        <div className="rounded border border-rule bg-paper-raised p-6">
          <h1 className="mb-1 text-lg font-semibold">Forgot password?</h1>
          <p className="mb-4 text-sm text-ink-muted">Enter the e-mail address you sign in with. We send a link to choose a new password.</p>
          {sent ? (
            <Alert tone="success" title="Check your e-mail">
              <p>{sent.message}</p>
              <p className="mt-1">
                You asked for <span className="[font-variant-ligatures:no-contextual]">{sent.email}</span>. Nothing arrived? Check the
                address and ask again in a few minutes.
              </p>
            </Alert>
          ) : (
            <RequestResetForm onSent={(reply, email) => setSent({ message: reply.message, email })} />
          )}
        </div>
        <p className="mt-4 text-sm">
          <Link to="/sign-in" className="text-accent underline">
            Back to sign in
          </Link>
        </p>
      </div>
    </main>
  );
}
