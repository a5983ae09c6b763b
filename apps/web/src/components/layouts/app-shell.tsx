import { ROLE_LABELS, type SessionInfo } from '@polecourt/contracts';
import type { ReactNode } from 'react';
import { Link, NavLink } from 'react-router-dom';

import { Button } from '@/components/ui/button';
import { navItemsFor } from '@/lib/permissions';
import { cx } from '@/utils/cx';

import { Wordmark } from './wordmark';

/** Header, role-filtered navigation and the main landmark around every signed-in page. */
export function AppShell({
  user,
  onSignOut,
  signingOut,
  notice,
  children,
}: {
  user: SessionInfo['user'];
  onSignOut: () => void;
  signingOut: boolean;
  notice?: ReactNode;
  children: ReactNode;
}) {
  const items = navItemsFor(user.role);
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only rounded bg-accent px-3 py-2 text-paper-raised focus:not-sr-only focus:fixed focus:top-2 focus:left-2 focus:z-50"
      >
        Skip to main content
      </a>
      <header className="border-b border-rule bg-paper-raised">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-3 px-6 pt-3">
          <Link to="/" className="rounded">
            <Wordmark />
          </Link>
          <div className="flex items-center gap-4 text-sm">
            <p>
              <span className="sr-only">Signed in as </span>
              <span className="font-medium">{user.name}</span>
              <span className="text-ink-muted"> · {ROLE_LABELS[user.role]}</span>
            </p>
            <Button size="sm" onClick={onSignOut} busy={signingOut}>
              {signingOut ? 'Signing out…' : 'Sign out'}
            </Button>
          </div>
        </div>
        <nav aria-label="Main" className="mx-auto max-w-6xl px-6">
          <ul className="-mb-px flex flex-wrap gap-x-1">
            {items.map((item) => (
              <li key={item.area}>
                <NavLink
                  to={item.path}
                  // Exact match where another item lives below this one (Reports vs Verify a report).
                  end={item.path === '/' || items.some((other) => other !== item && other.path.startsWith(`${item.path}/`))}
                  className={({ isActive }) =>
                    cx(
                      'inline-block border-b-2 px-3 pt-3 pb-2 text-sm',
                      isActive ? 'border-accent font-medium text-ink' : 'border-transparent text-ink-muted hover:border-rule-strong hover:text-ink',
                    )
                  }
                >
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>
      </header>
      {notice && <div className="mx-auto w-full max-w-6xl px-6 pt-4">{notice}</div>}
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-6 py-8 focus:outline-none">
        {children}
      </main>
    </div>
  );
}
