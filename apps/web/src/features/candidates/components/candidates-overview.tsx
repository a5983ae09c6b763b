import { AreaIntro } from '@/components/ui/area-intro';

export function CandidatesOverview({ access }: { access: 'read' | 'write' }) {
  return (
    <AreaIntro
      emptyTitle="No candidates shown yet"
      emptyText={
        <p>
          This page will list the candidates of each product line and their assessments, with the verdict of each
          one. Entering or uploading a candidate and reading an assessment are not part of this version of the web
          client.
        </p>
      }
      yourAccess={
        access === 'write'
          ? 'you may enter or upload candidates and assess them against an approved revision.'
          : 'you may read every candidate and assessment; you cannot add or change them.'
      }
      about={
        <>
          <p>
            A <strong>candidate</strong> is a closed-loop model for a product line, given as poles, zeros and gain or as
            transfer-function coefficients, typed in or uploaded as a JSON or CSV file.
          </p>
          <p>
            An <strong>assessment</strong> checks one candidate against one revision: whether the dominant poles lie in
            the admissible region, whether dominance holds or is weak, and the exact step-response metrics of the
            whole model. Its verdict is <strong>compliant</strong> or <strong>not compliant</strong>.
          </p>
        </>
      }
      people={[
        { role: 'Controls engineers', does: 'Submit candidates, run assessments and read the pole-zero map and step response.' },
        { role: 'Quality auditors', does: 'Read every candidate and assessment, including the engine version used.' },
      ]}
    />
  );
}
