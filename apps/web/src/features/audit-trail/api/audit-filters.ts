// The audit trail's filters as they live in the page address, and as the API takes them.

/** What the filter form holds. Times are the browser's datetime-local values, in the reader's zone. */
export interface AuditFilters {
  productLineId?: number | undefined;
  actorId?: number | undefined;
  action?: string | undefined;
  from?: string | undefined;
  to?: string | undefined;
}

const positiveInt = (v: string | null): number | undefined => {
  const n = Number(v);
  return v && Number.isInteger(n) && n > 0 ? n : undefined;
};
const text = (v: string | null): string | undefined => (v && v.trim() ? v.trim() : undefined);
const localTime = (v: string | null): string | undefined => (v && !Number.isNaN(new Date(v).getTime()) ? v : undefined);

export function filtersFromParams(params: URLSearchParams): AuditFilters {
  return {
    productLineId: positiveInt(params.get('productLineId')),
    actorId: positiveInt(params.get('actorId')),
    action: text(params.get('action')),
    from: localTime(params.get('from')),
    to: localTime(params.get('to')),
  };
}

/** Only the filters that are set, as strings for the address bar. */
export function filtersToParams(filters: AuditFilters): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of Object.entries(filters)) {
    if (value !== undefined && value !== '') out[key] = String(value);
  }
  return out;
}

export function hasFilters(filters: AuditFilters): boolean {
  return Object.keys(filtersToParams(filters)).length > 0;
}

/** A datetime-local value names a minute (or a second, with seconds): "to" takes in the whole of it. */
function endOf(local: string | undefined): string | undefined {
  if (!local) return undefined;
  const start = new Date(local).getTime();
  return new Date(start + (local.length > 16 ? 999 : 59_999)).toISOString();
}

/** The query the API takes: local times become UTC instants (ISO 8601). */
export function filtersToQuery(filters: AuditFilters): Record<string, string | number | undefined> {
  const iso = (local: string | undefined) => (local ? new Date(local).toISOString() : undefined);
  return {
    productLineId: filters.productLineId,
    actorId: filters.actorId,
    action: filters.action,
    from: iso(filters.from),
    to: endOf(filters.to),
  };
}
