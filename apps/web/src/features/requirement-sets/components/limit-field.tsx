import { type InputHTMLAttributes, type Ref, useId } from 'react';

import { cx } from '@/utils/cx';

/** A number typed as text with its unit beside it, its help line and its error underneath. */
export function LimitField({
  label,
  unit,
  hint,
  error,
  className,
  ref,
  ...rest
}: InputHTMLAttributes<HTMLInputElement> & { label: string; unit: string; hint?: string; error?: string | undefined; ref?: Ref<HTMLInputElement> }) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-medium">
        {label}
        {unit && <span className="font-normal text-ink-muted"> ({unit})</span>}
      </label>
      <div className="flex items-stretch">
        <input
          ref={ref}
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          aria-invalid={error ? true : undefined}
          aria-describedby={[hintId, errorId].filter(Boolean).join(' ') || undefined}
          className={cx(
            'w-full min-w-0 rounded-l border bg-paper-raised px-3 py-2 text-ink tabular-nums placeholder:text-ink-faint',
            unit ? '' : 'rounded-r',
            error ? 'border-fail' : 'border-rule-strong hover:border-ink-muted',
          )}
          {...rest}
        />
        {unit && (
          <span aria-hidden="true" className="inline-flex min-w-12 items-center justify-center rounded-r border border-l-0 border-rule-strong bg-paper-sunk px-2 text-sm text-ink-muted">
            {unit}
          </span>
        )}
      </div>
      {hint && (
        <p id={hintId} className="text-xs text-ink-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="text-sm text-fail">
          {error}
        </p>
      )}
    </div>
  );
}
