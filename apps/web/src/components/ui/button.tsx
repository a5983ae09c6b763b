import type { ButtonHTMLAttributes } from 'react';

import { cx } from '@/utils/cx';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';

const variants: Record<Variant, string> = {
  primary: 'bg-accent text-paper-raised border-accent hover:bg-accent-strong hover:border-accent-strong',
  secondary: 'bg-paper-raised text-ink border-rule-strong hover:border-ink-muted hover:bg-paper',
  danger: 'bg-paper-raised text-fail border-fail/60 hover:bg-fail-soft',
  quiet: 'bg-transparent text-accent border-transparent hover:bg-accent-soft',
};

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  size?: 'sm' | 'md';
  busy?: boolean;
}

export function Button({ variant = 'secondary', size = 'md', busy = false, className, disabled, children, type, ...rest }: ButtonProps) {
  return (
    <button
      type={type ?? 'button'}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      className={cx(
        'inline-flex items-center justify-center gap-2 rounded border font-medium transition-colors',
        'disabled:cursor-not-allowed disabled:opacity-60',
        size === 'sm' ? 'px-2.5 py-1 text-sm' : 'px-4 py-2 text-sm',
        variants[variant],
        className,
      )}
      {...rest}
    >
      {children}
    </button>
  );
}
