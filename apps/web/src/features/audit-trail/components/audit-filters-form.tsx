import type { AuditFacets } from '@polecourt/contracts';
import { type FormEvent, useState } from 'react';

import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';

import type { AuditFilters } from '../api/audit-filters';

interface Draft {
  productLineId: string;
  actorId: string;
  action: string;
  from: string;
  to: string;
}

const toDraft = (f: AuditFilters): Draft => ({
  productLineId: f.productLineId ? String(f.productLineId) : '',
  actorId: f.actorId ? String(f.actorId) : '',
  action: f.action ?? '',
  from: f.from ?? '',
  to: f.to ?? '',
});

const fromDraft = (d: Draft): AuditFilters => ({
  productLineId: d.productLineId ? Number(d.productLineId) : undefined,
  actorId: d.actorId ? Number(d.actorId) : undefined,
  action: d.action || undefined,
  from: d.from || undefined,
  to: d.to || undefined,
});

/** The filters as a form: nothing is fetched until "Apply filters", so typing a time does not reload the table. */
export function AuditFiltersForm({
  filters,
  facets,
  facetsNote,
  onApply,
}: {
  filters: AuditFilters;
  facets: AuditFacets | undefined;
  facetsNote?: string | undefined;
  onApply: (filters: AuditFilters) => void;
}) {
  const [draft, setDraft] = useState<Draft>(() => toDraft(filters));
  const [timeError, setTimeError] = useState<string | undefined>();
  const set = (key: keyof Draft) => (e: { target: { value: string } }) => setDraft((d) => ({ ...d, [key]: e.target.value }));

  function submit(e: FormEvent) {
    e.preventDefault();
    if (draft.from && draft.to && new Date(draft.from) > new Date(draft.to)) {
      setTimeError('The end of the time range is before its start.');
      return;
    }
    setTimeError(undefined);
    onApply(fromDraft(draft));
  }

  function clear() {
    const empty = toDraft({});
    setDraft(empty);
    setTimeError(undefined);
    onApply({});
  }

  // A value in the address that the trail no longer lists still shows as chosen.
  const keep = (options: { value: string; label: string }[], value: string, label: string) =>
    value && !options.some((o) => o.value === value) ? [...options, { value, label }] : options;

  const lines = keep(
    (facets?.productLines ?? []).map((p) => ({ value: String(p.id), label: p.name ?? `Product line ${p.id} (since removed)` })),
    draft.productLineId,
    `Product line ${draft.productLineId}`,
  );
  const actors = keep(
    (facets?.actors ?? []).map((a) => ({ value: String(a.id), label: a.name ? `${a.name} (${a.email})` : a.email })),
    draft.actorId,
    `Person ${draft.actorId}`,
  );
  const actions = keep(
    (facets?.actions ?? []).map((a) => ({ value: a, label: a })),
    draft.action,
    draft.action,
  );

  return (
    <form onSubmit={submit} aria-labelledby="audit-filters-heading" className="flex flex-col gap-4 rounded border border-rule bg-paper-raised p-4">
      <h2 id="audit-filters-heading" className="text-base font-semibold">
        Filters
      </h2>
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-5">
        <SelectField label="Product line" value={draft.productLineId} onChange={set('productLineId')} options={[{ value: '', label: 'All product lines' }, ...lines]} />
        <SelectField label="Person" value={draft.actorId} onChange={set('actorId')} options={[{ value: '', label: 'Everyone' }, ...actors]} />
        <SelectField label="Action" value={draft.action} onChange={set('action')} options={[{ value: '', label: 'All actions' }, ...actions]} />
        <TextField label="From" type="datetime-local" value={draft.from} onChange={set('from')} hint="Your local time" />
        <TextField label="To" type="datetime-local" value={draft.to} onChange={set('to')} hint="Your local time, included" error={timeError} />
      </div>
      {facetsNote && <p className="text-sm text-ink-muted">{facetsNote}</p>}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="primary">
          Apply filters
        </Button>
        <Button onClick={clear}>Clear filters</Button>
      </div>
    </form>
  );
}
