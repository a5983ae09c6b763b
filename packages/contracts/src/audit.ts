// The audit trail as the API returns it (GET /api/audit-events and friends).

/** One recorded write: who, when, what, and the record before and after it. */
export interface AuditEvent {
  id: number;
  occurredAt: string;
  actorId: number | null;
  actorEmail: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  productLineId: number | null;
  before: unknown;
  after: unknown;
  prevHash: string;
  hash: string;
}

/** What the trail holds, for the filter selects (GET /api/audit-events/facets). */
export interface AuditFacets {
  actions: string[];
  entityTypes: string[];
  actors: { id: number; email: string; name: string | null }[];
  productLines: { id: number; name: string | null }[];
}

/** The chain's tip (GET /api/audit-events/head); lastId is null while the trail is empty. */
export interface AuditHead {
  lastId: number | null;
  lastHash: string;
}

/** The integrity check of the whole chain (GET /api/audit-events/verify). */
export interface AuditVerification {
  intact: boolean;
  checked: number;
  firstBreak: { id: number; reason: string } | null;
}

/** The filters GET /api/audit-events accepts (and the CSV export with them). Times are ISO 8601. */
export interface AuditFilterQuery {
  productLineId?: number | undefined;
  actorId?: number | undefined;
  action?: string | undefined;
  entityType?: string | undefined;
  entityId?: string | undefined;
  from?: string | undefined;
  to?: string | undefined;
}
