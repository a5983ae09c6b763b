import { Link } from 'react-router-dom';

import { ErrorPanel } from '@/components/errors/error-panel';
import { AreaIntro } from '@/components/ui/area-intro';
import { Loading } from '@/components/ui/loading';

import { useProductLines } from '../api/get-product-lines';

function About() {
  return (
    <>
      <p>
        A <strong>candidate</strong> is a closed-loop model for a product line, given as poles, zeros and gain or as
        transfer-function coefficients, typed in or uploaded as a JSON or CSV file.
      </p>
      <p>
        An <strong>assessment</strong> checks one candidate against one revision: whether the dominant poles lie in the
        admissible region, whether dominance holds or is weak, and the exact step-response metrics of the whole model.
        Its verdict is <strong>compliant</strong> or <strong>not compliant</strong>.
      </p>
    </>
  );
}

/** The candidates area's front page: pick the product line whose candidates to open. */
export function CandidatesOverview({ access }: { access: 'read' | 'write' }) {
  const lines = useProductLines();
  const yourAccess =
    access === 'write'
      ? 'you may enter or upload candidates and assess them against an approved revision.'
      : 'you may read every candidate and assessment; you cannot add or change them.';

  if (lines.isPending) return <Loading label="Loading the product lines…" />;
  if (lines.isError) return <ErrorPanel error={lines.error} title="The product lines could not be loaded" onRetry={() => void lines.refetch()} />;
  if (lines.data.items.length === 0) {
    return (
      <AreaIntro
        emptyTitle="No product line yet"
        emptyText={<p>Candidates belong to a product line. Once a systems engineer has created one, it is listed here.</p>}
        yourAccess={yourAccess}
        about={<About />}
        people={[
          { role: 'Controls engineers', does: 'Submit candidates, run assessments and read the pole-zero map and step response.' },
          { role: 'Quality auditors', does: 'Read every candidate and assessment, including the engine version used.' },
        ]}
      />
    );
  }

  return (
    <section aria-labelledby="pick-line-heading" className="flex flex-col gap-3">
      <h2 id="pick-line-heading" className="text-lg font-semibold">
        Pick a product line
      </h2>
      <p className="text-sm text-ink-muted">Your access: {yourAccess}</p>
      <ul className="grid gap-4 sm:grid-cols-2">
        {lines.data.items.map((line) => (
          <li key={line.id} className="flex flex-col rounded border border-rule bg-paper-raised p-5">
            <h3 className="font-semibold">
              <Link to={`/product-lines/${line.id}/candidates`} className="text-accent underline underline-offset-2 hover:decoration-2">
                {line.name}
              </Link>
            </h3>
            {line.description && <p className="mt-1 flex-1 text-sm text-ink-muted">{line.description}</p>}
            <p className="mt-3 flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
              <span className="tabular-nums">
                {line.candidateCount ?? 0} {line.candidateCount === 1 ? 'candidate' : 'candidates'}
              </span>
              <Link to={`/product-lines/${line.id}/coverage`} className="text-accent underline underline-offset-2 hover:decoration-2">
                Coverage<span className="sr-only"> of {line.name}</span>
              </Link>
            </p>
          </li>
        ))}
      </ul>
    </section>
  );
}
