import { ROLE_LABELS } from '@polecourt/contracts';
import { PageHeader } from '@/components/ui/page-header';
import { useMe } from '@/features/auth/api/get-me';
import { accessTo, navItemsFor } from '@/lib/permissions';

export default function OverviewRoute() {
  const session = useMe().data;
  if (!session) return null;
  const { user } = session;
  const areas = navItemsFor(user.role).filter((item) => item.area !== 'overview');

  return (
    <>
      <title>Overview · Polecourt</title>
      <PageHeader title="Overview" lead={`Signed in as ${user.name}, ${ROLE_LABELS[user.role].toLowerCase()}. These are the parts of Polecourt your role uses; open them from the navigation above.`} />
      <ul className="grid gap-4 sm:grid-cols-2">
        {areas.map((item) => (
          <li key={item.area} className="flex flex-col rounded border border-rule bg-paper-raised p-5">
            <h2 className="font-semibold">{item.label}</h2>
            <p className="mt-1 flex-1 text-sm text-ink-muted">{item.summary}</p>
            <p className="mt-3 text-xs font-medium uppercase tracking-wide text-ink-faint">
              {accessTo(user.role, item.area) === 'write' ? 'You can change this' : 'Read only'}
            </p>
          </li>
        ))}
      </ul>
    </>
  );
}
