import type { StoredAssessment } from '@polecourt/contracts';
import { type FormEvent, useState } from 'react';

import { ErrorPanel } from '@/components/errors/error-panel';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Loading } from '@/components/ui/loading';
import { SelectField } from '@/components/ui/select-field';

import { useCreateAssessment } from '../api/create-assessment';
import { useLineRequirementSets } from '../api/get-line-requirement-sets';

/** "Assess": against the approved revision in force, with a choice when the line has several requirement sets. */
export function AssessPanel({ candidateId, productLineId, onAssessed }: { candidateId: number; productLineId: number; onAssessed: (stored: StoredAssessment) => void }) {
  const sets = useLineRequirementSets({ productLineId });
  const [picked, setPicked] = useState<string>('');
  const assess = useCreateAssessment({ mutationConfig: { onSuccess: (stored) => onAssessed(stored) } });

  if (sets.isPending) return <Loading label="Loading the approved revisions…" />;
  if (sets.isError) return <ErrorPanel error={sets.error} title="The requirement sets could not be loaded" onRetry={() => void sets.refetch()} />;

  const approved = sets.data.items.filter((s) => s.currentRevisionId !== null && s.currentRevisionNumber !== null);
  if (approved.length === 0) {
    return (
      <Alert tone="info" title="Nothing to assess against yet">
        <p>This product line has no approved revision. Once a systems engineer approves one, candidates can be assessed against it.</p>
      </Alert>
    );
  }
  const options = approved.map((s) => ({ value: String(s.currentRevisionId), label: `${s.name}: revision ${s.currentRevisionNumber} (approved)` }));
  const revisionId = Number(picked || options[0]!.value);

  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    assess.mutate({ candidateId, data: { revisionId } });
  };

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-3" aria-label="Assess this candidate">
      {options.length > 1 ? (
        <SelectField
          label="Assess against"
          options={options}
          value={String(revisionId)}
          onChange={(e) => setPicked(e.target.value)}
          hint="The approved revision of each requirement set of this product line."
          error={assess.error?.fields.revisionId}
          className="max-w-md"
        />
      ) : (
        <p className="text-sm">
          Against <span className="font-medium">{options[0]!.label}</span>, the revision in force.
        </p>
      )}
      {assess.error && !assess.error.fields.revisionId && (
        <Alert tone="error" title="The assessment was not made">
          <p>{assess.error.message}</p>
        </Alert>
      )}
      <div>
        <Button type="submit" variant="primary" busy={assess.isPending}>
          {assess.isPending ? 'Assessing…' : 'Assess'}
        </Button>
      </div>
    </form>
  );
}
