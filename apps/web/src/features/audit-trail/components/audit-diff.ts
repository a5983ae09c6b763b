// Field-by-field comparison of an audit event's record before and after the
// change. Nested objects are walked into ("requirements.maxOvershootPct");
// arrays are compared whole, as one value, because their items have no names.

export type FieldChange = 'changed' | 'added' | 'removed' | 'unchanged';

export interface FieldDiff {
  path: string;
  before: unknown;
  after: unknown;
  change: FieldChange;
}

const isPlainObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

function flatten(value: unknown, prefix: string, out: Map<string, unknown>): void {
  if (isPlainObject(value) && (prefix === '' || Object.keys(value).length > 0)) {
    for (const [key, inner] of Object.entries(value)) flatten(inner, prefix ? `${prefix}.${key}` : key, out);
    return;
  }
  out.set(prefix || '(value)', value);
}

/** Stable text for comparing two values (key order does not count). */
function same(a: unknown, b: unknown): boolean {
  const canon = (v: unknown): string =>
    JSON.stringify(v, (_k, x: unknown) =>
      isPlainObject(x) ? Object.fromEntries(Object.keys(x).sort().map((k) => [k, x[k]])) : x,
    ) ?? 'undefined';
  return canon(a) === canon(b);
}

/**
 * Every field of either record, changed ones first (in the order they appear),
 * then added, removed and unchanged ones. A record that is missing (before a
 * creation) counts as empty, so every field of the other is added.
 */
export function auditDiff(before: unknown, after: unknown): FieldDiff[] {
  const b = new Map<string, unknown>();
  const a = new Map<string, unknown>();
  if (before !== null && before !== undefined) flatten(before, '', b);
  if (after !== null && after !== undefined) flatten(after, '', a);
  const paths = [...new Set([...b.keys(), ...a.keys()])];
  const rows = paths.map((path): FieldDiff => {
    const inBefore = b.has(path);
    const inAfter = a.has(path);
    const change: FieldChange = !inBefore ? 'added' : !inAfter ? 'removed' : same(b.get(path), a.get(path)) ? 'unchanged' : 'changed';
    return { path, before: b.get(path), after: a.get(path), change };
  });
  const rank: Record<FieldChange, number> = { changed: 0, added: 1, removed: 2, unchanged: 3 };
  return rows.map((r, i) => ({ r, i })).sort((x, y) => rank[x.r.change] - rank[y.r.change] || x.i - y.i).map(({ r }) => r);
}

/** A value as a reader sees it: text as it is, numbers and structures as JSON, nothing as a word. */
export function showValue(value: unknown): string {
  if (value === undefined) return '(not present)';
  if (value === null) return '(empty)';
  if (typeof value === 'string') return value === '' ? '(empty text)' : value;
  return JSON.stringify(value);
}
