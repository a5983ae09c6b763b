import { useId } from 'react';

import { Button } from '@/components/ui/button';
import { formatComplex } from '@/lib/format';
import { cx } from '@/utils/cx';

import { type DraftErrors, type RootKind, type RootRow, conjugateOf, newRow, rowFieldKey } from '../utils/design-draft';

const WORD: Record<RootKind, { one: string; many: string }> = { poles: { one: 'Pole', many: 'Poles' }, zeros: { one: 'Zero', many: 'Zeros' } };

function Part({
  id,
  label,
  value,
  error,
  onChange,
}: {
  id: string;
  label: string;
  value: string;
  error: string | undefined;
  onChange: (value: string) => void;
}) {
  return (
    <input
      id={id}
      aria-label={label}
      aria-invalid={error ? true : undefined}
      aria-describedby={error ? `${id}-error` : undefined}
      inputMode="decimal"
      autoComplete="off"
      spellCheck={false}
      value={value}
      onChange={(e) => onChange(e.target.value)}
      className={cx(
        'w-28 rounded border bg-paper-raised px-2 py-1.5 text-ink tabular-nums placeholder:text-ink-faint',
        error ? 'border-fail' : 'border-rule-strong hover:border-ink-muted',
      )}
    />
  );
}

/**
 * The poles (or zeros) as rows of real and imaginary parts. A complex row stands for its
 * conjugate pair: the conjugate is shown, linked, right under it, and goes into the design too.
 */
export function RootRowsEditor({
  kind,
  rows,
  errors,
  onChange,
}: {
  kind: RootKind;
  rows: RootRow[];
  errors: DraftErrors;
  onChange: (rows: RootRow[]) => void;
}) {
  const baseId = useId();
  const word = WORD[kind];
  const update = (key: string, patch: Partial<RootRow>) => onChange(rows.map((r) => (r.key === key ? { ...r, ...patch } : r)));
  const listError = errors[kind];

  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={listError ? `${baseId}-list-error` : undefined}>
      <legend className="text-sm font-medium">{word.many}</legend>
      <p className="text-xs text-ink-muted">
        Real part in 1/s, imaginary part in rad/s; leave the imaginary part empty for a real {word.one.toLowerCase()}. Type one of a complex pair: its conjugate is added for you.
      </p>
      {rows.length === 0 && <p className="text-sm text-ink-muted">No {word.many.toLowerCase()}.</p>}
      <ol className="flex flex-col gap-2">
        {rows.map((row, i) => {
          const n = i + 1;
          const reKey = rowFieldKey(kind, row.key, 're');
          const imKey = rowFieldKey(kind, row.key, 'im');
          const conj = conjugateOf(row);
          const idFor = (part: string) => `${baseId}-${row.key}-${part}`;
          return (
            <li key={row.key} className="rounded border border-rule bg-paper px-3 py-2" data-root-row={`${kind}-${n}`}>
              <div className="flex flex-wrap items-center gap-2">
                <span className="w-16 text-sm font-medium">
                  {word.one} {n}
                </span>
                <label htmlFor={idFor('re')} className="text-xs text-ink-muted">
                  Re
                </label>
                <Part id={idFor('re')} label={`${word.one} ${n}, real part`} value={row.re} error={errors[reKey]} onChange={(re) => update(row.key, { re })} />
                <label htmlFor={idFor('im')} className="text-xs text-ink-muted">
                  Im
                </label>
                <Part id={idFor('im')} label={`${word.one} ${n}, imaginary part`} value={row.im} error={errors[imKey]} onChange={(im) => update(row.key, { im })} />
                <Button size="sm" variant="quiet" aria-label={`Remove ${word.one.toLowerCase()} ${n}${conj ? ' and its conjugate' : ''}`} onClick={() => onChange(rows.filter((r) => r.key !== row.key))}>
                  Remove
                </Button>
              </div>
              {conj && (
                <p className="mt-1 ml-4 flex items-center gap-2 border-l-2 border-accent/50 pl-3 text-sm text-ink-muted" data-conjugate-of={`${kind}-${n}`}>
                  <span aria-hidden="true">↳</span>
                  <span>
                    Conjugate of {word.one.toLowerCase()} {n}: <span className="font-medium text-ink tabular-nums">{formatComplex(conj)}</span> (added for you, changes with it)
                  </span>
                </p>
              )}
              {(['re', 'im', 'row'] as const).map((part) => {
                const message = errors[rowFieldKey(kind, row.key, part)];
                return (
                  message && (
                    <p key={part} id={`${idFor(part)}-error`} className="mt-1 text-sm text-fail">
                      {message}
                    </p>
                  )
                );
              })}
            </li>
          );
        })}
      </ol>
      {listError && (
        <p id={`${baseId}-list-error`} className="text-sm text-fail">
          {listError}
        </p>
      )}
      <div>
        <Button size="sm" onClick={() => onChange([...rows, newRow()])}>
          Add a {word.one.toLowerCase()}
        </Button>
      </div>
    </fieldset>
  );
}
