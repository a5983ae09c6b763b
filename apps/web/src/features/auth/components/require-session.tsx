import type { SessionInfo } from '@polecourt/contracts';
import type { ReactNode } from 'react';
import { Navigate, useLocation, useNavigation } from 'react-router-dom';

import { ErrorPanel } from '@/components/errors/error-panel';
import { Loading } from '@/components/ui/loading';
import { signInPath } from '@/lib/sign-in-path';

import { isLeavingSession, useMe } from '../api/get-me';

/**
 * Renders its children only for a signed-in person; anyone else goes to the sign-in page,
 * which sends them back here afterwards. (The route loader checks first; this covers a
 * session that ends while the page is open.)
 */
export function RequireSession({ children }: { children: (session: SessionInfo) => ReactNode }) {
  const me = useMe();
  const location = useLocation();
  const navigation = useNavigation();
  if (me.isPending) return <Loading label="Checking your session…" />;
  if (me.isError) return <ErrorPanel error={me.error} title="Could not check your session" onRetry={() => void me.refetch()} />;
  // A navigation already under way (sign-out, or the API client's 401 redirect) decides where to go.
  if (!me.data && (isLeavingSession() || navigation.state !== 'idle')) return <Loading label="Opening the sign-in page…" />;
  if (!me.data) return <Navigate to={signInPath(location.pathname + location.search)} replace />;
  return children(me.data);
}
