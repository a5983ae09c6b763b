import type { QueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { type LoaderFunctionArgs, Link, redirect, useNavigate, useSearchParams } from 'react-router-dom';

import { Wordmark } from '@/components/layouts/wordmark';
import { getMeQueryOptions, sessionLeft } from '@/features/auth/api/get-me';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { safeRedirectTarget } from '@/lib/sign-in-path';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    // Someone already signed in goes straight on; if the check itself fails, the form is still offered.
    const session = await queryClient.ensureQueryData(getMeQueryOptions()).catch(() => null);
    if (session) throw redirect(safeRedirectTarget(new URL(request.url).searchParams.get('redirectTo')));
    return null;
  };

export default function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const target = safeRedirectTarget(params.get('redirectTo'));
  // Mounted means the signed-in pages are gone: any sign-out redirect has finished.
  useEffect(() => sessionLeft(), []);

  return (
    <main id="main" className="flex min-h-screen items-center justify-center px-4 py-12">
      <title>Sign in · Polecourt</title>
      <div className="w-full max-w-sm">
        <div className="mb-6">
          <Wordmark size="lg" />
          <p className="mt-2 text-sm text-ink-muted">
            Transient-response requirements, assessments and signed compliance reports for closed-loop products.
          </p>
        </div>
        <div className="rounded border border-rule bg-paper-raised p-6">
          <h1 className="mb-4 text-lg font-semibold">Sign in</h1>
          {target !== '/' && <p className="mb-4 text-sm text-ink-muted">Sign in to open the page you asked for.</p>}
          <SignInForm onSuccess={() => void navigate(target, { replace: true })} />
          <p className="mt-4 text-sm">
            <Link to="/forgot-password" className="text-accent underline">
              Forgot password?
            </Link>
          </p>
        </div>
        <p className="mt-4 text-xs text-ink-muted">Accounts are created by your Polecourt administrator.</p>
      </div>
    </main>
  );
}
