import type { Candidate } from '@polecourt/contracts';
import { type FormEvent, useId, useMemo, useRef, useState } from 'react';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { cx } from '@/utils/cx';

import { useCreateCandidate } from '../api/create-candidate';
import { type DesignDraft, type DesignForm, type DraftErrors, buildDesign, emptyDraft, placeError, textErrors } from '../utils/design-draft';
import { PoleZeroPreview } from './pole-zero-preview';
import { RootRowsEditor } from './root-rows-editor';

const FORMS: { value: DesignForm; label: string; hint: string }[] = [
  { value: 'zpk', label: 'Zero-pole-gain', hint: 'G(s) = gain · Π(s − zᵢ) / Π(s − pᵢ)' },
  { value: 'polynomial', label: 'Polynomial coefficients', hint: 'numerator(s) / denominator(s), highest power of s first' },
];

/**
 * Entering one candidate by hand. The design is checked in the browser with the engine's own
 * designSchema and parseDesign before it is sent; the server's field errors land in the same places.
 */
export function CandidateForm({ productLineId, onCreated, onCancel }: { productLineId: number; onCreated: (candidate: Candidate) => void; onCancel: () => void }) {
  const [draft, setDraft] = useState<DesignDraft>(emptyDraft);
  const [submitted, setSubmitted] = useState(false);
  const [serverErrors, setServerErrors] = useState<DraftErrors>({});
  const notesId = useId();
  const summaryRef = useRef<HTMLDivElement>(null);

  const built = useMemo(() => buildDesign(draft), [draft]);
  const ownErrors = useMemo(() => ({ ...textErrors(draft), ...built.errors }), [draft, built]);
  // The form's own complaints show once a first submit was tried, then follow every keystroke.
  const errors: DraftErrors = submitted ? { ...serverErrors, ...ownErrors } : serverErrors;

  const create = useCreateCandidate({
    mutationConfig: {
      onSuccess: (candidate) => onCreated(candidate),
      onError: (error) => {
        const placed: DraftErrors = {};
        for (const [path, message] of Object.entries(error.fields)) placeError(path, message, built.slots, placed);
        setServerErrors(placed);
      },
    },
  });

  const change = (patch: Partial<DesignDraft>) => {
    setServerErrors({});
    setDraft((d) => ({ ...d, ...patch }));
  };

  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    setSubmitted(true);
    if (Object.keys(ownErrors).length > 0 || !built.design) {
      summaryRef.current?.focus();
      return;
    }
    create.mutate({ productLineId, data: { name: draft.name, notes: draft.notes, design: built.design } });
  };

  const errorCount = Object.keys(errors).length;
  const unplacedServerError = create.error && Object.keys(create.error.fields).length === 0;

  return (
    <form noValidate onSubmit={onSubmit} className="grid gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <div className="flex flex-col gap-5">
        <div ref={summaryRef} tabIndex={-1} className="focus:outline-none">
          {submitted && errorCount > 0 && (
            <Alert tone="error" title="The candidate was not saved">
              <p>
                {errorCount === 1 ? 'One field needs' : `${errorCount} fields need`} attention; each message stands under its field.
                {errors.design && ` ${errors.design}`}
              </p>
            </Alert>
          )}
          {unplacedServerError && (
            <Alert tone="error" title="The candidate was not saved">
              <p>{create.error.message}</p>
            </Alert>
          )}
        </div>

        <TextField label="Name" autoComplete="off" value={draft.name} error={errors.name} onChange={(e) => change({ name: e.target.value })} />
        <div className="flex flex-col gap-1">
          <label htmlFor={notesId} className="text-sm font-medium">
            Notes <span className="font-normal text-ink-muted">(optional)</span>
          </label>
          <textarea
            id={notesId}
            rows={3}
            value={draft.notes}
            aria-invalid={errors.notes ? true : undefined}
            aria-describedby={errors.notes ? `${notesId}-error` : undefined}
            onChange={(e) => change({ notes: e.target.value })}
            className={cx('rounded border bg-paper-raised px-3 py-2 text-ink', errors.notes ? 'border-fail' : 'border-rule-strong hover:border-ink-muted')}
          />
          {errors.notes && (
            <p id={`${notesId}-error`} className="text-sm text-fail">
              {errors.notes}
            </p>
          )}
        </div>

        <fieldset className="flex flex-col gap-2">
          <legend className="text-sm font-medium">How the model is given</legend>
          <div className="flex flex-wrap gap-3">
            {FORMS.map((f) => (
              <label
                key={f.value}
                className="flex cursor-pointer gap-3 rounded border border-rule-strong bg-paper-raised px-3 py-2 has-[:checked]:border-accent has-[:checked]:bg-accent-soft"
              >
                <input type="radio" name="design-form" value={f.value} checked={draft.form === f.value} onChange={() => change({ form: f.value })} className="mt-1 accent-[var(--color-accent)]" />
                <span>
                  <span className="block text-sm font-semibold">{f.label}</span>
                  <span className="block text-xs text-ink-muted">{f.hint}</span>
                </span>
              </label>
            ))}
          </div>
        </fieldset>

        {draft.form === 'zpk' ? (
          <div className="flex flex-col gap-5">
            <RootRowsEditor kind="poles" rows={draft.poles} errors={errors} onChange={(poles) => change({ poles })} />
            <RootRowsEditor kind="zeros" rows={draft.zeros} errors={errors} onChange={(zeros) => change({ zeros })} />
            <TextField
              label="Gain"
              inputMode="decimal"
              autoComplete="off"
              spellCheck={false}
              hint="The factor in front. For a unit DC gain with left-half-plane poles and zeros: the product of the pole magnitudes over that of the zero magnitudes."
              value={draft.gain}
              error={errors.gain}
              onChange={(e) => change({ gain: e.target.value })}
              className="max-w-xs"
            />
          </div>
        ) : (
          <div className="flex flex-col gap-5">
            <TextField
              label="Numerator coefficients"
              autoComplete="off"
              spellCheck={false}
              placeholder="195"
              hint="Highest power of s first, separated by commas or spaces."
              value={draft.numerator}
              error={errors.numerator}
              onChange={(e) => change({ numerator: e.target.value })}
            />
            <TextField
              label="Denominator coefficients"
              autoComplete="off"
              spellCheck={false}
              placeholder="1, 19, 73, 195"
              hint="Highest power of s first, e.g. 1, 19, 73, 195 for s³ + 19s² + 73s + 195."
              value={draft.denominator}
              error={errors.denominator}
              onChange={(e) => change({ denominator: e.target.value })}
            />
          </div>
        )}

        <div className="flex justify-end gap-2 border-t border-rule pt-4">
          <Button onClick={onCancel}>Cancel</Button>
          <Button type="submit" variant="primary" busy={create.isPending}>
            {create.isPending ? 'Saving…' : 'Save candidate'}
          </Button>
        </div>
      </div>

      <aside aria-labelledby="preview-heading" className="flex flex-col gap-2 self-start rounded border border-rule bg-paper-raised p-4">
        <h2 id="preview-heading" className="text-sm font-semibold">
          Pole-zero preview
        </h2>
        {built.model ? (
          <>
            <PoleZeroPreview poles={built.model.poles} zeros={built.model.zeros} width={320} height={240} />
            <p className="text-xs text-ink-muted">Poles x, zeros o. The assessment adds the admissible region and the step response.</p>
          </>
        ) : (
          <p className="text-sm text-ink-muted">The map appears as soon as the model is complete and valid.</p>
        )}
      </aside>
    </form>
  );
}
