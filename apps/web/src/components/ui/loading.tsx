/** A quiet loading line, announced politely. */
export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" aria-live="polite" className="flex items-center gap-2 py-6 text-sm text-ink-muted">
      <span aria-hidden="true" className="inline-block size-3 animate-pulse rounded-full bg-accent/60" />
      {label}
    </p>
  );
}
