import type { ReactNode } from 'react';

import { cx } from '@/utils/cx';

type Tone = 'error' | 'success' | 'info' | 'caution';

const tones: Record<Tone, string> = {
  error: 'border-fail/50 bg-fail-soft text-ink',
  success: 'border-pass/50 bg-pass-soft text-ink',
  info: 'border-rule-strong bg-paper-raised text-ink',
  caution: 'border-caution/50 bg-caution-soft text-ink',
};

const words: Record<Tone, string> = { error: 'Problem', success: 'Done', info: 'Note', caution: 'Caution' };

/**
 * A message box that always starts with a word, so colour is never the only signal.
 * Errors use role="alert" (read out at once); the rest use role="status".
 */
export function Alert({ tone = 'info', title, children, className }: { tone?: Tone; title?: string; children?: ReactNode; className?: string }) {
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={cx('rounded border px-4 py-3 text-sm', tones[tone], className)}>
      <p className="font-semibold">{title ?? words[tone]}</p>
      {children && <div className="mt-1 text-ink-muted [&_a]:text-accent [&_a]:underline">{children}</div>}
    </div>
  );
}
