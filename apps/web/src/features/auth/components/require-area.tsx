import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

import { Alert } from '@/components/ui/alert';
import { type Access, type Area, accessTo, areaInfo } from '@/lib/permissions';

import { useMe } from '../api/get-me';

/** Shows an area only to roles that may see it; children get the access level to hide editing controls. */
export function RequireArea({ area, children }: { area: Area; children: (access: Exclude<Access, 'none'>) => ReactNode }) {
  const me = useMe();
  const session = me.data;
  if (!session) return null; // RequireSession around the shell handles the signed-out case
  const access = accessTo(session.user.role, area);
  if (access === 'none') {
    return (
      <Alert tone="info" title={`${areaInfo(area).label} is not part of your role`}>
        <p>
          Your account cannot open this page. If your work needs it, ask an administrator to change your role.{' '}
          <Link to="/">Back to the overview</Link>
        </p>
      </Alert>
    );
  }
  return children(access);
}
