import { useState } from 'react';

import { cx } from '@/utils/cx';

/**
 * A SHA-256 fingerprint cited beside an approved revision or a report: the first and last
 * characters on screen, the full value when the control has focus or the pointer, and a copy
 * of the full value on click (or on Enter/Space).
 */
export function Sha256Digest({ value, className }: { value: string; className?: string }) {
  const [open, setOpen] = useState(false);
  const [copied, setCopied] = useState<'yes' | 'no' | null>(null);
  const short = value.length > 16 ? `${value.slice(0, 8)}…${value.slice(-6)}` : value;

  const copy = async () => {
    try {
      await navigator.clipboard.writeText(value);
      setCopied('yes');
    } catch {
      // No clipboard (insecure context, permission refused): the full value is on screen to select.
      setCopied('no');
      setOpen(true);
    }
  };

  return (
    <span className={cx('inline-flex flex-wrap items-center gap-1', className)}>
      <span className="text-xs text-ink-muted">SHA-256</span>
      <button
        type="button"
        data-sha256={value}
        onFocus={() => setOpen(true)}
        onBlur={() => {
          setOpen(false);
          setCopied(null);
        }}
        onMouseEnter={() => setOpen(true)}
        onMouseLeave={() => setOpen(false)}
        onClick={() => void copy()}
        className="rounded border border-rule bg-paper px-1.5 py-0.5 font-mono text-xs break-all text-ink hover:border-rule-strong"
      >
        {open ? value : short}
        {/* The visible text stays part of the name (for speech input); the full value follows for screen readers. */}
        <span className="sr-only">{open ? ', press to copy' : `, full value ${value}, press to copy`}</span>
      </button>
      <span role="status" className="text-xs text-ink-muted">
        {copied === 'yes' ? 'Copied' : copied === 'no' ? 'Select the value to copy it' : ''}
      </span>
    </span>
  );
}
