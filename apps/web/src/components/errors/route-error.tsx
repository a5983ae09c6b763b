import { Link, isRouteErrorResponse, useRouteError } from 'react-router-dom';

import { Alert } from '@/components/ui/alert';

import { errorMessage } from './error-message';

/** The error element of a route: keeps the shell around it and says what failed in plain words. */
export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error)
    ? error.status === 404
      ? 'There is no page at this address.'
      : `The page could not be opened (HTTP ${error.status}).`
    : errorMessage(error);
  return (
    <div className="mx-auto max-w-2xl py-10">
      <title>Problem · Polecourt</title>
      <Alert tone="error" title="This page could not be shown">
        <p>{message}</p>
        <p className="mt-2">
          <Link to=".">Try again</Link> or <Link to="/">go to the overview</Link>.
        </p>
      </Alert>
    </div>
  );
}
