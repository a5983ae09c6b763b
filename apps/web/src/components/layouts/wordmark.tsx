/** The Polecourt mark: a pole (x) inside a bounded court, beside the name. */
export function Wordmark({ size = 'md' }: { size?: 'md' | 'lg' }) {
  const box = size === 'lg' ? 'size-8' : 'size-6';
  return (
    <span className="inline-flex items-center gap-2">
      <svg aria-hidden="true" viewBox="0 0 24 24" className={box}>
        <rect x="1.5" y="3.5" width="14" height="17" fill="var(--color-accent-soft)" stroke="var(--color-accent)" strokeWidth="1.5" />
        <line x1="19" y1="1" x2="19" y2="23" stroke="var(--color-ink-faint)" strokeWidth="1" />
        <path d="M6 9.5l5 5m0-5l-5 5" stroke="var(--color-ink)" strokeWidth="1.75" strokeLinecap="round" />
      </svg>
      <span className={size === 'lg' ? 'text-2xl font-semibold tracking-tight' : 'text-lg font-semibold tracking-tight'}>Polecourt</span>
    </span>
  );
}
