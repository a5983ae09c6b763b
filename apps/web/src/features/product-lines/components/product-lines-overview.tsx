import { AreaIntro } from '@/components/ui/area-intro';

export function ProductLinesOverview({ access }: { access: 'read' | 'write' }) {
  return (
    <AreaIntro
      emptyTitle="No product lines shown yet"
      emptyText={
        <p>
          This page will list every product line with its requirement sets, and each requirement set with its
          revisions, their state and who wrote and approved them. The list and the editor are not part of this
          version of the web client.
        </p>
      }
      yourAccess={
        access === 'write'
          ? 'you may create product lines, write requirement sets, submit revisions for review and approve revisions written by someone else.'
          : 'you may read product lines, requirement sets and every revision; you cannot change them.'
      }
      about={
        <>
          <p>
            A <strong>product line</strong> is a family of products that share one set of transient requirements, for
            example a range of servo actuators, gimbals, valve positioners or motor drives.
          </p>
          <p>
            Its <strong>requirement sets</strong> hold the limits: maximum percent overshoot, settling time, peak time,
            rise time, a damping-ratio floor and a natural-frequency ceiling. Each change is a new{' '}
            <strong>revision</strong> that moves from draft to in review to approved, and later to retired. An approved
            revision never changes again.
          </p>
          <p>
            The limits of a revision define its <strong>admissible region</strong> of the s-plane. Before approval, the{' '}
            <strong>revision impact</strong> shows which existing candidates would change verdict.
          </p>
        </>
      }
      people={[
        { role: 'Systems engineers', does: 'Write requirement sets, submit revisions for review, approve revisions written by a colleague.' },
        { role: 'Controls engineers', does: 'Read the approved revision their candidate is assessed against.' },
        { role: 'Quality auditors', does: 'Read every revision with its author, approver and content fingerprint.' },
      ]}
    />
  );
}
