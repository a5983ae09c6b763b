import { type Ref, type SelectHTMLAttributes, useId } from 'react';

import { cx } from '@/utils/cx';

export interface SelectFieldProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  options: readonly { value: string; label: string }[];
  hint?: string;
  error?: string | undefined;
  ref?: Ref<HTMLSelectElement>;
}

export function SelectField({ label, options, hint, error, id, className, ...rest }: SelectFieldProps) {
  const autoId = useId();
  const selectId = id ?? autoId;
  const hintId = hint ? `${selectId}-hint` : undefined;
  const errorId = error ? `${selectId}-error` : undefined;
  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <label htmlFor={selectId} className="text-sm font-medium text-ink">
        {label}
      </label>
      <select
        id={selectId}
        aria-invalid={error ? true : undefined}
        aria-describedby={[hintId, errorId].filter(Boolean).join(' ') || undefined}
        className={cx(
          'rounded border bg-paper-raised px-3 py-2 text-ink',
          error ? 'border-fail' : 'border-rule-strong hover:border-ink-muted',
        )}
        {...rest}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
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
