import { AreaIntro } from '@/components/ui/area-intro';

export function AuditTrailOverview({ canVerify }: { canVerify: boolean }) {
  return (
    <AreaIntro
      emptyTitle="No audit events shown yet"
      emptyText={
        <p>
          This page will list audit events, newest first, and run the integrity check of the whole trail. Neither is
          part of this version of the web client.
        </p>
      }
      yourAccess={
        canVerify
          ? 'you may read every audit event and check that the trail is intact. Nobody can edit or delete an event.'
          : 'you may read audit events. Nobody can edit or delete an event.'
      }
      about={
        <>
          <p>
            The <strong>audit trail</strong> records every write: who made it, when, what it was about, and the record
            before and after the change. Signing a compliance report is a write too, so it appears here.
          </p>
          <p>
            Events are chained, so a removed or altered event is found by the integrity check, which reports whether
            the trail is intact, how many events it checked and where the first break is.
          </p>
        </>
      }
      people={[
        { role: 'Quality auditors', does: 'Read the trail and check its integrity before an audit or a release.' },
        { role: 'Administrators', does: 'Read the trail when looking into an account or a change.' },
      ]}
    />
  );
}
