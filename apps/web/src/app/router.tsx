import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import { type LoaderFunction, type RouteObject, createBrowserRouter } from 'react-router-dom';

import { RouteError } from '@/components/errors/route-error';
import { Loading } from '@/components/ui/loading';

/** What a route file may export. The loader factory gets the query client so it can prefetch with the same options. */
interface RouteModule {
  default: ComponentType;
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
  ErrorBoundary?: ComponentType;
}

// Every route is its own chunk: the first page loads only the shell code it needs.
function lazyRoute(queryClient: QueryClient, load: () => Promise<RouteModule>): RouteObject['lazy'] {
  return async () => {
    const { default: Component, clientLoader, ErrorBoundary } = await load();
    return {
      Component,
      ...(clientLoader ? { loader: clientLoader(queryClient) } : {}),
      ...(ErrorBoundary ? { ErrorBoundary } : {}),
    };
  };
}

function HydrateFallback() {
  return (
    <div className="mx-auto max-w-6xl px-6 py-10">
      <Loading label="Opening Polecourt…" />
    </div>
  );
}

export function createAppRouter(queryClient: QueryClient) {
  const lazy = (load: () => Promise<RouteModule>) => lazyRoute(queryClient, load);
  return createBrowserRouter([
    {
      id: 'root',
      HydrateFallback,
      ErrorBoundary: RouteError,
      children: [
        { path: '/sign-in', lazy: lazy(() => import('./routes/sign-in')) },
        { path: '/set-password', lazy: lazy(() => import('./routes/set-password')) },
        { path: '/forgot-password', lazy: lazy(() => import('./routes/forgot-password')) },
        {
          path: '/',
          lazy: lazy(() => import('./routes/app/root')),
          children: [
            {
              // Errors inside a page keep the header and navigation on screen.
              ErrorBoundary: RouteError,
              children: [
                { index: true, lazy: lazy(() => import('./routes/app/overview')) },
                { path: 'product-lines', lazy: lazy(() => import('./routes/app/product-lines')) },
                { path: 'product-lines/:id', lazy: lazy(() => import('./routes/app/product-line')) },
                { path: 'requirement-sets/:id', lazy: lazy(() => import('./routes/app/requirement-set')) },
                { path: 'requirement-sets/:id/revisions/new', lazy: lazy(() => import('./routes/app/new-revision')) },
                { path: 'revisions/:id', lazy: lazy(() => import('./routes/app/revision')) },
                { path: 'bench/splane-plot', lazy: lazy(() => import('./routes/app/splane-bench')) },
                { path: 'candidates', lazy: lazy(() => import('./routes/app/candidates')) },
                { path: 'candidates/:id', lazy: lazy(() => import('./routes/app/candidate')) },
                { path: 'product-lines/:id/candidates', lazy: lazy(() => import('./routes/app/product-line-candidates')) },
                { path: 'product-lines/:id/candidates/new', lazy: lazy(() => import('./routes/app/new-candidate')) },
                { path: 'product-lines/:id/candidates/upload', lazy: lazy(() => import('./routes/app/upload-candidates')) },
                { path: 'product-lines/:id/coverage', lazy: lazy(() => import('./routes/app/coverage')) },
                { path: 'assessments/:id', lazy: lazy(() => import('./routes/app/assessment')) },
                { path: 'reports', lazy: lazy(() => import('./routes/app/reports')) },
                { path: 'reports/verify', lazy: lazy(() => import('./routes/app/verify-report')) },
                { path: 'audit-trail', lazy: lazy(() => import('./routes/app/audit-trail')) },
                { path: 'users', lazy: lazy(() => import('./routes/app/users')) },
                { path: 'outbox', lazy: lazy(() => import('./routes/app/outbox')) },
                { path: 'settings/tokens', lazy: lazy(() => import('./routes/app/settings-tokens')) },
              ],
            },
          ],
        },
        { path: '*', lazy: lazy(() => import('./routes/not-found')) },
      ],
    },
  ]);
}

export type AppRouter = ReturnType<typeof createAppRouter>;
