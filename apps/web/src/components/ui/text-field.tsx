import { type InputHTMLAttributes, type Ref, useId } from 'react';

import { cx } from '@/utils/cx';

export interface TextFieldProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  hint?: string;
  error?: string | undefined;
  ref?: Ref<HTMLInputElement>;
}

/** A labelled input with its hint and its error underneath, tied together for screen readers. */
export function TextField({ label, hint, error, id, className, ...rest }: TextFieldProps) {
  const autoId = useId();
  const inputId = id ?? autoId;
  const hintId = hint ? `${inputId}-hint` : undefined;
  const errorId = error ? `${inputId}-error` : undefined;
  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <label htmlFor={inputId} className="text-sm font-medium text-ink">
        {label}
      </label>
      <input
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={[hintId, errorId].filter(Boolean).join(' ') || undefined}
        className={cx(
          'rounded border bg-paper-raised px-3 py-2 text-ink placeholder:text-ink-faint',
          error ? 'border-fail' : 'border-rule-strong hover:border-ink-muted',
        )}
        {...rest}
      />
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
