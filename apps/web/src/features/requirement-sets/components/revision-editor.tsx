import { zodResolver } from '@hookform/resolvers/zod';
import { REQUIREMENT_FIELDS, type RequirementField, type Revision } from '@polecourt/contracts';
import type { Requirements } from '@polecourt/spec';
import { useQueryClient } from '@tanstack/react-query';
import { type ReactNode, useDeferredValue, useId, useMemo, useRef, useState } from 'react';
import { type FieldPath, type UseFormRegisterReturn, useForm, useWatch } from 'react-hook-form';

import { SplanePlot } from '@/components/plots/splane-plot';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import type { ApiError } from '@/lib/api-client';
import { REQUIREMENT_FIELD_INFO } from '@/lib/requirement-fields';

import { useCreateRevision } from '../api/create-revision';
import { getRevision, getRevisionQueryOptions } from '../api/get-revision';
import { useUpdateRevision } from '../api/update-revision';

import { LimitField } from './limit-field';
import { limitText } from './limit-text';
import {
  type RevisionFormOutput,
  type RevisionFormSchema,
  type RevisionFormValues,
  formValuesFrom,
  revisionFormSchema,
  textsToRequirements,
} from './revision-form-schema';

const LIMITS: RequirementField[] = ['maxOvershootPct', 'maxSettlingTime', 'maxPeakTime', 'maxRiseTime', 'minDampingRatio', 'maxNaturalFrequency'];

const PLACEHOLDER: Partial<Record<RequirementField, string>> = {
  maxOvershootPct: 'e.g. 10',
  maxSettlingTime: 'e.g. 1.2',
  maxPeakTime: 'e.g. 0.6',
  maxRiseTime: 'e.g. 0.3',
  minDampingRatio: 'e.g. 0.6',
  maxNaturalFrequency: 'e.g. 80',
  dominanceRatio: '5',
  marginPct: '0',
};

type Target = { kind: 'create'; requirementSetId: number } | { kind: 'update'; revision: Revision };

/**
 * The draft revision editor: every limit with its unit and help, the settling band, dominance
 * ratio and margin, the rationale; checked as typed by the engine's requirements schema, with
 * the live admissible region beside it. Saving an existing draft sends the version it was read
 * at; a stale save keeps everything typed and offers to load the newer version underneath.
 */
export function RevisionEditor({
  target,
  initial,
  schema = revisionFormSchema,
  onSaved,
  actions,
}: {
  target: Target;
  initial: RevisionFormValues;
  schema?: RevisionFormSchema;
  onSaved?: (revision: Revision, created: boolean) => void;
  /** Further buttons beside Save (e.g. Submit for review); told whether there are unsaved changes. */
  actions?: (state: { dirty: boolean; saving: boolean }) => ReactNode;
}) {
  const queryClient = useQueryClient();
  const bandName = useId();
  const [baseVersion, setBaseVersion] = useState<number | null>(target.kind === 'update' ? target.revision.version : null);
  const [stale, setStale] = useState<{ message: string; loaded: Revision | null } | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [reloading, setReloading] = useState(false);

  const {
    register,
    control,
    handleSubmit,
    setError,
    reset,
    getValues,
    formState: { errors, isDirty },
  } = useForm<RevisionFormValues, unknown, RevisionFormOutput>({
    resolver: zodResolver(schema),
    defaultValues: initial,
    mode: 'onChange',
  });

  const onServerError = (error: ApiError) => {
    if (error.code === 'stale_version') {
      setStale({ message: error.message, loaded: null });
      return;
    }
    for (const [path, message] of Object.entries(error.fields)) {
      const field = path.startsWith('requirements.') ? path.slice('requirements.'.length) : null;
      if (field === 'settlingBandPct') setError('requirements.settlingBandPct', { message });
      else if (field && (REQUIREMENT_FIELDS as readonly string[]).includes(field)) setError(`requirements.${field}` as FieldPath<RevisionFormValues>, { message });
      else if (path === 'rationale') setError('rationale', { message });
      else if (path === 'requirements') setError('requirements', { message });
    }
  };

  const saved = (revision: Revision, created: boolean) => {
    setBaseVersion(revision.version);
    setStale(null);
    // What was saved becomes the new "unchanged" state of the form.
    reset(getValues());
    setNotice(created ? `Draft revision ${revision.number} created.` : `Saved (version ${revision.version}).`);
    onSaved?.(revision, created);
  };

  const create = useCreateRevision({ mutationConfig: { onSuccess: (r) => saved(r, true), onError: onServerError } });
  const update = useUpdateRevision({ mutationConfig: { onSuccess: (r) => saved(r, false), onError: onServerError } });
  const saving = create.isPending || update.isPending;
  const failure = create.error ?? update.error;
  const fieldShown = failure && (failure.code === 'stale_version' || Object.keys(failure.fields).length > 0);

  const submit = handleSubmit((data) => {
    setNotice(null);
    if (target.kind === 'create') create.mutate({ requirementSetId: target.requirementSetId, data });
    else update.mutate({ id: target.revision.id, data: { ...data, version: baseVersion ?? target.revision.version } });
  });

  // Load the newer version's number without touching the form: the next save replaces it with what is typed here.
  const reloadKeepingTyped = async () => {
    if (target.kind !== 'update') return;
    setReloading(true);
    try {
      const fresh = await getRevision(target.revision.id);
      queryClient.setQueryData(getRevisionQueryOptions(fresh.id).queryKey, fresh);
      if (fresh.status !== 'draft') {
        setStale({ message: `Revision ${fresh.number} is no longer a draft (it is ${fresh.status.replace('_', ' ')}), so it cannot be saved. Copy what you typed into a new revision.`, loaded: fresh });
        return;
      }
      setBaseVersion(fresh.version);
      setStale({ message: '', loaded: fresh });
    } catch (error) {
      setStale({ message: (error as Error).message, loaded: null });
    } finally {
      setReloading(false);
    }
  };

  // ---- live preview -------------------------------------------------------------------------
  const watched = useWatch({ control });
  const deferred = useDeferredValue(watched);
  const lastValid = useRef<Requirements | null>(null);
  const preview = useMemo(() => {
    const result = schema.safeParse(deferred);
    if (result.success) lastValid.current = result.data.requirements;
    return { requirements: result.success ? result.data.requirements : lastValid.current, valid: result.success };
  }, [deferred, schema]);

  const bandChoice = watched.bandChoice ?? initial.bandChoice;
  const reqErrors = errors.requirements;
  const rootMessage = (reqErrors as { message?: string } | undefined)?.message;

  return (
    <div className="grid gap-8 lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
      <form noValidate onSubmit={submit} className="flex flex-col gap-5" aria-label="Revision limits">
        {stale && (
          <Alert tone="caution" title={stale.loaded ? `Version ${stale.loaded.version} loaded underneath` : 'Someone else saved this draft first'}>
            {stale.message && <p>{stale.message}</p>}
            {!stale.loaded && (
              <>
                <p className="mt-1">What you typed is still in the form. Load the newer version to see what changed; your values stay.</p>
                <Button size="sm" className="mt-2" busy={reloading} onClick={() => void reloadKeepingTyped()}>
                  Load the newer version, keep my values
                </Button>
              </>
            )}
            {stale.loaded && stale.loaded.status === 'draft' && <StaleComparison saved={stale.loaded} typed={getValues()} />}
          </Alert>
        )}
        {failure && !fieldShown && (
          <Alert tone="error" title="The revision was not saved">
            <p>{failure.message}</p>
          </Alert>
        )}
        {notice && !isDirty && <Alert tone="success">{notice}</Alert>}

        <fieldset className="flex flex-col gap-4">
          <legend className="text-base font-semibold">Limits</legend>
          <p className="text-sm text-ink-muted">Give at least one. Leave a field blank for no such limit. Numbers as you write them: 0.5 or 5e-1.</p>
          {rootMessage && (
            <p role="alert" className="text-sm text-fail">
              {rootMessage}
            </p>
          )}
          <div className="grid gap-4 sm:grid-cols-2">
            {LIMITS.map((field) => {
              const info = REQUIREMENT_FIELD_INFO[field];
              return (
                <LimitField
                  key={field}
                  label={info.label}
                  unit={info.unit}
                  hint={info.help}
                  placeholder={PLACEHOLDER[field]}
                  error={reqErrors?.[field]?.message}
                  {...register(`requirements.${field}`)}
                />
              );
            })}
          </div>
        </fieldset>

        <fieldset className="flex flex-col gap-4">
          <legend className="text-base font-semibold">Settings</legend>
          <div role="radiogroup" aria-labelledby={`${bandName}-label`} aria-describedby={`${bandName}-hint`} className="flex flex-col gap-1">
            <p id={`${bandName}-label`} className="text-sm font-medium">
              Settling band <span className="font-normal text-ink-muted">(%)</span>
            </p>
            <div className="flex flex-wrap items-center gap-2">
              {(['2', '5', 'other'] as const).map((choice) => (
                <label key={choice} className="flex cursor-pointer items-center gap-2 rounded border border-rule-strong bg-paper-raised px-3 py-1.5 text-sm has-[:checked]:border-accent has-[:checked]:bg-accent-soft">
                  <input type="radio" value={choice} className="accent-[var(--color-accent)]" {...register('bandChoice')} />
                  {choice === 'other' ? 'Another value' : `${choice} %`}
                </label>
              ))}
            </div>
            <p id={`${bandName}-hint`} className="text-xs text-ink-muted">
              {REQUIREMENT_FIELD_INFO.settlingBandPct.help} 2 % and 5 % use the usual constants 4 and 3; another band uses ln(100 / band).
            </p>
            {bandChoice === 'other' ? (
              <LimitField
                label="Settling band value"
                unit="%"
                hint="More than 0 and at most 20."
                placeholder="e.g. 1"
                error={reqErrors?.settlingBandPct?.message}
                className="mt-1 max-w-56"
                {...register('requirements.settlingBandPct')}
              />
            ) : (
              reqErrors?.settlingBandPct?.message && <p className="text-sm text-fail">{reqErrors.settlingBandPct.message}</p>
            )}
          </div>
          <div className="grid gap-4 sm:grid-cols-2">
            <LimitField
              label={REQUIREMENT_FIELD_INFO.dominanceRatio.label}
              unit=""
              hint="Default 5. Use 3 for rough sizing, 10 for demanding work."
              placeholder={PLACEHOLDER.dominanceRatio}
              error={reqErrors?.dominanceRatio?.message}
              {...register('requirements.dominanceRatio')}
            />
            <LimitField
              label={REQUIREMENT_FIELD_INFO.marginPct.label}
              unit="%"
              hint={REQUIREMENT_FIELD_INFO.marginPct.help}
              placeholder={PLACEHOLDER.marginPct}
              error={reqErrors?.marginPct?.message}
              {...register('requirements.marginPct')}
            />
          </div>
        </fieldset>

        <RationaleField error={errors.rationale?.message} registration={register('rationale')} />

        <div className="flex flex-wrap items-center gap-2 border-t border-rule pt-4">
          <Button type="submit" variant="primary" busy={saving}>
            {saving ? 'Saving…' : target.kind === 'create' ? 'Create draft' : 'Save draft'}
          </Button>
          {isDirty && <span className="text-sm text-ink-muted">Unsaved changes</span>}
          {actions?.({ dirty: isDirty, saving })}
        </div>
      </form>

      <div className="flex min-w-0 flex-col gap-2 lg:sticky lg:top-4 lg:self-start">
        <SplanePlot
          title="Live preview: admissible region"
          requirements={preview.requirements}
          caption={
            preview.requirements
              ? preview.valid
                ? 'Computed in your browser from the limits as typed, with the margin applied. Dominant poles inside the shaded area meet every limit.'
                : 'Showing the last limits that were valid; fix the field marked in the form to update it.'
              : 'Type a limit to see its admissible region.'
          }
        />
      </div>
    </div>
  );
}

function RationaleField({ error, registration }: { error: string | undefined; registration: UseFormRegisterReturn<'rationale'> }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-base font-semibold">
        Rationale
      </label>
      <p id={`${id}-hint`} className="text-xs text-ink-muted">
        Why these limits: where they come from and what changed since the revision in force. Reviewers and auditors read this.
      </p>
      <textarea
        id={id}
        rows={5}
        aria-describedby={`${id}-hint${error ? ` ${id}-error` : ''}`}
        aria-invalid={error ? true : undefined}
        className={`rounded border bg-paper-raised px-3 py-2 text-ink ${error ? 'border-fail' : 'border-rule-strong hover:border-ink-muted'}`}
        {...registration}
      />
      {error && (
        <p id={`${id}-error`} className="text-sm text-fail">
          {error}
        </p>
      )}
    </div>
  );
}

/** After a stale save: where the other person's saved values differ from what is typed here. */
function StaleComparison({ saved, typed }: { saved: Revision; typed: RevisionFormValues }) {
  const mine = textsToRequirements(typed.requirements, typed.bandChoice);
  const theirs = formValuesFrom(saved.requirements, saved.rationale);
  const differing = REQUIREMENT_FIELDS.filter((f) => (saved.requirements[f] ?? null) !== (Number.isNaN(mine[f]) ? null : (mine[f] ?? null)));
  return (
    <div className="mt-1">
      <p>
        The draft is now at version {saved.version}. Your values are still in the form; “Save draft” now replaces the saved ones.
      </p>
      {differing.length > 0 ? (
        <ul className="mt-1 list-disc pl-5">
          {differing.map((f) => (
            <li key={f}>
              {REQUIREMENT_FIELD_INFO[f].label}: saved {limitText(f, saved.requirements[f])}, yours {typed.requirements[f].trim() === '' && f !== 'settlingBandPct' ? 'blank' : limitText(f, mine[f])}
            </li>
          ))}
        </ul>
      ) : (
        <p className="mt-1">The saved limits are the same as yours.</p>
      )}
      {theirs.rationale !== typed.rationale && <p className="mt-1">The saved rationale differs from yours.</p>}
    </div>
  );
}
