/** A stored ISO time as "2025-03-04 12:30 UTC": recorded times (approvals, signatures) are cited in UTC. */
export function formatUtc(iso: string | null | undefined): string | null {
  if (!iso) return null;
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return null;
  return `${date.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
}
