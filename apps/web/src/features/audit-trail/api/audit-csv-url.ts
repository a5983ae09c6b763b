import { env } from '@/config/env';

import { type AuditFilters, filtersToQuery } from './audit-filters';

/** The CSV export of the filtered events: a plain link, so the browser downloads it with the session cookie. */
export function auditCsvUrl(filters: AuditFilters): string {
  const params = new URLSearchParams({ format: 'csv' });
  for (const [key, value] of Object.entries(filtersToQuery(filters))) {
    if (value !== undefined) params.set(key, String(value));
  }
  return `${env.apiBaseUrl}/audit-events?${params.toString()}`;
}
