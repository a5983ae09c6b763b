import { type QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { type ReactNode, Suspense } from 'react';

import { ErrorBoundary } from '@/components/errors/error-boundary';
import { MainErrorFallback } from '@/components/errors/main-error-fallback';
import { Loading } from '@/components/ui/loading';

export function AppProvider({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  return (
    <ErrorBoundary fallback={() => <MainErrorFallback />}>
      <QueryClientProvider client={queryClient}>
        <Suspense
          fallback={
            <div className="mx-auto max-w-6xl px-6 py-10">
              <Loading label="Opening Polecourt…" />
            </div>
          }
        >
          {children}
        </Suspense>
      </QueryClientProvider>
    </ErrorBoundary>
  );
}
