// Every route of the built app x every role (and signed out, and two API
// tokens) against an expected status. The route list is read from the
// Express route table, so a new route without a row here fails the test.
//
// Allowed callers get a request that passes the role gate and then stops
// with no side effect: a GET on a real record (200), a write with an empty
// body (400) or on an id that does not exist (404). Refused roles get 403,
// signed-out callers 401.
import type { Role } from '@polecourt/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { DEMO, DEMO_PASSWORD, TestClient, signedIn } from '../helpers/client.js';
import { apiRoutes, type RouteEntry } from '../helpers/route-table.js';
import { startTestServer, stopTestServer } from '../helpers/server.js';
import { approved, draft, newCandidate, newLine, newSet, thirdOrder, type Team } from '../helpers/workflow.js';

type Actor = 'signed_out' | Role | 'controls_token' | 'auditor_token';
const ROLES: Role[] = ['admin', 'systems_engineer', 'controls_engineer', 'auditor'];
const ACTORS: Actor[] = ['signed_out', ...ROLES, 'controls_token', 'auditor_token'];
const TOKEN_ROLE: Record<'controls_token' | 'auditor_token', Role> = { controls_token: 'controls_engineer', auditor_token: 'auditor' };

const MISSING = 2_147_000_000; // a valid id that names nothing

interface Ids {
  line: number;
  set: number;
  draft: number;
  approved: number;
  candidate: number;
  assessment: number;
}

interface Expectation {
  /** Who gets past the gate: a list of roles, every signed-in caller, or everyone. */
  who: Role[] | 'signed_in' | 'public';
  /** The status an allowed caller gets with the request below. */
  allowed: number;
  /** The concrete path (ids filled in) and body for the request. */
  path: (ids: Ids) => string;
  body?: unknown;
  /** Needs a password session: a token of an allowed role gets 403 session_required. */
  sessionOnly?: boolean;
  /** The request ends the session (logout): each actor uses a fresh sign-in. */
  fresh?: boolean;
}

const ANY: Role[] = ROLES;
const WRITERS: Role[] = ['admin', 'systems_engineer'];
const CANDIDATES: Role[] = ['admin', 'controls_engineer'];
const AUDIT: Role[] = ['admin', 'auditor'];
const ADMIN: Role[] = ['admin'];

const EXPECTED: Record<string, Expectation> = {
  'GET /api/health': { who: 'public', allowed: 200, path: () => '/api/health' },
  'POST /api/auth/login': { who: 'public', allowed: 400, path: () => '/api/auth/login', body: {} },
  'GET /api/auth/me': { who: 'signed_in', allowed: 200, path: () => '/api/auth/me' },
  'POST /api/auth/change-password': { who: 'signed_in', allowed: 400, path: () => '/api/auth/change-password', body: {}, sessionOnly: true },
  'POST /api/auth/logout': { who: 'public', allowed: 204, path: () => '/api/auth/logout', body: {}, fresh: true },
  'POST /api/auth/set-password': { who: 'public', allowed: 400, path: () => '/api/auth/set-password', body: {} },
  'POST /api/auth/request-reset': { who: 'public', allowed: 400, path: () => '/api/auth/request-reset', body: {} },
  'GET /api/tokens': { who: 'signed_in', allowed: 200, path: () => '/api/tokens' },
  'POST /api/tokens': { who: 'signed_in', allowed: 400, path: () => '/api/tokens', body: {}, sessionOnly: true },
  'DELETE /api/tokens/:id': { who: 'signed_in', allowed: 404, path: () => `/api/tokens/${MISSING}`, sessionOnly: true },
  'POST /api/users/:id/resend-invite': { who: ADMIN, allowed: 404, path: () => `/api/users/${MISSING}/resend-invite`, body: {} },
  'GET /api/users': { who: ADMIN, allowed: 200, path: () => '/api/users' },
  'POST /api/users': { who: ADMIN, allowed: 400, path: () => '/api/users', body: {} },
  'PATCH /api/users/:id': { who: ADMIN, allowed: 400, path: () => `/api/users/${MISSING}`, body: {} },
  'GET /api/outbox': { who: ADMIN, allowed: 200, path: () => '/api/outbox' },
  'GET /api/audit-events/verify': { who: AUDIT, allowed: 200, path: () => '/api/audit-events/verify' },
  'GET /api/audit-events/head': { who: AUDIT, allowed: 200, path: () => '/api/audit-events/head' },
  'GET /api/audit-events/facets': { who: AUDIT, allowed: 200, path: () => '/api/audit-events/facets' },
  'GET /api/audit-events': { who: AUDIT, allowed: 200, path: () => '/api/audit-events?limit=5' },
  'GET /api/product-lines': { who: ANY, allowed: 200, path: () => '/api/product-lines' },
  'POST /api/product-lines': { who: WRITERS, allowed: 400, path: () => '/api/product-lines', body: {} },
  'GET /api/product-lines/:id': { who: ANY, allowed: 200, path: (i) => `/api/product-lines/${i.line}` },
  'PATCH /api/product-lines/:id': { who: WRITERS, allowed: 400, path: (i) => `/api/product-lines/${i.line}`, body: {} },
  'GET /api/product-lines/:id/requirement-sets': { who: ANY, allowed: 200, path: (i) => `/api/product-lines/${i.line}/requirement-sets` },
  'POST /api/product-lines/:id/requirement-sets': { who: WRITERS, allowed: 400, path: (i) => `/api/product-lines/${i.line}/requirement-sets`, body: {} },
  'GET /api/requirement-sets/:id': { who: ANY, allowed: 200, path: (i) => `/api/requirement-sets/${i.set}` },
  'POST /api/requirement-sets/:id/revisions': { who: WRITERS, allowed: 400, path: (i) => `/api/requirement-sets/${i.set}/revisions`, body: {} },
  'GET /api/revisions/:id': { who: ANY, allowed: 200, path: (i) => `/api/revisions/${i.approved}` },
  'PATCH /api/revisions/:id': { who: WRITERS, allowed: 400, path: (i) => `/api/revisions/${i.draft}`, body: {} },
  'POST /api/revisions/:id/submit': { who: WRITERS, allowed: 404, path: () => `/api/revisions/${MISSING}/submit`, body: {} },
  'POST /api/revisions/:id/approve': { who: WRITERS, allowed: 400, path: (i) => `/api/revisions/${i.draft}/approve`, body: {} },
  'POST /api/revisions/:id/retire': { who: WRITERS, allowed: 404, path: () => `/api/revisions/${MISSING}/retire`, body: {} },
  'GET /api/revisions/:id/diff': { who: ANY, allowed: 200, path: (i) => `/api/revisions/${i.draft}/diff` },
  'GET /api/revisions/:id/region': { who: ANY, allowed: 200, path: (i) => `/api/revisions/${i.approved}/region` },
  'GET /api/revisions/:id/impact': { who: ANY, allowed: 200, path: (i) => `/api/revisions/${i.approved}/impact` },
  'GET /api/product-lines/:id/candidates': { who: ANY, allowed: 200, path: (i) => `/api/product-lines/${i.line}/candidates` },
  'POST /api/product-lines/:id/candidates': { who: CANDIDATES, allowed: 400, path: (i) => `/api/product-lines/${i.line}/candidates`, body: {} },
  'GET /api/candidates/upload-example.csv': { who: ANY, allowed: 200, path: () => '/api/candidates/upload-example.csv' },
  'GET /api/candidates/upload-example.json': { who: ANY, allowed: 200, path: () => '/api/candidates/upload-example.json' },
  'GET /api/candidates/:id': { who: ANY, allowed: 200, path: (i) => `/api/candidates/${i.candidate}` },
  'POST /api/candidates/:id/assessments': { who: CANDIDATES, allowed: 404, path: () => `/api/candidates/${MISSING}/assessments`, body: {} },
  'GET /api/candidates/:id/assessments': { who: ANY, allowed: 200, path: (i) => `/api/candidates/${i.candidate}/assessments` },
  'GET /api/assessments/:id': { who: ANY, allowed: 200, path: (i) => `/api/assessments/${i.assessment}` },
  'GET /api/product-lines/:id/coverage': { who: ANY, allowed: 200, path: (i) => `/api/product-lines/${i.line}/coverage` },
  'POST /api/assessments/:id/reports': { who: CANDIDATES, allowed: 400, path: (i) => `/api/assessments/${i.assessment}/reports`, body: {} },
  'POST /api/reports/verify': { who: ANY, allowed: 400, path: () => '/api/reports/verify', body: {} },
  'GET /api/reports': { who: ANY, allowed: 200, path: () => '/api/reports' },
  'GET /api/reports/:id': { who: ANY, allowed: 404, path: () => `/api/reports/${MISSING}` },
  'GET /api/reports/:id/pdf': { who: ANY, allowed: 404, path: () => `/api/reports/${MISSING}/pdf` },
  'GET /api/product-lines/:id/reports': { who: ANY, allowed: 200, path: (i) => `/api/product-lines/${i.line}/reports` },
  'GET /api/candidates/:id/reports': { who: ANY, allowed: 200, path: (i) => `/api/candidates/${i.candidate}/reports` },
};

function expectedStatus(e: Expectation, actor: Actor): number {
  if (e.who === 'public') return e.allowed;
  if (actor === 'signed_out') return 401;
  const role = actor === 'controls_token' || actor === 'auditor_token' ? TOKEN_ROLE[actor] : actor;
  const isToken = actor !== role;
  const allowed = e.who === 'signed_in' || e.who.includes(role);
  if (!allowed) return 403;
  return isToken && e.sessionOnly ? 403 : e.allowed;
}

let url: string;
let routes: RouteEntry[];
let team: Team;
let ids: Ids;
const secrets: Record<'controls_token' | 'auditor_token', string> = { controls_token: '', auditor_token: '' };

beforeAll(async () => {
  const running = await startTestServer();
  url = running.url;
  routes = apiRoutes(running.server).filter((r) => !r.path.includes('{*'));
  team = {
    admin: await signedIn(url, 'admin'),
    systems: await signedIn(url, 'systems_engineer'),
    controls: await signedIn(url, 'controls_engineer'),
    auditor: await signedIn(url, 'auditor'),
  };
  const line = await newLine(team);
  const set = await newSet(team, line.id);
  const rev = await approved(team, set.id, { maxOvershootPct: 10, maxSettlingTime: 2 });
  const d = await draft(team, set.id, { maxOvershootPct: 8 });
  const candidate = await newCandidate(team, line.id, thirdOrder(-3, 4, -40));
  const a = await team.controls.post(`/api/candidates/${candidate.id}/assessments`, { revisionId: rev.id });
  expect(a.status).toBe(201);
  ids = { line: line.id, set: set.id, draft: d.id, approved: rev.id, candidate: candidate.id, assessment: a.body.id };
  for (const [actor, client] of [['controls_token', team.controls], ['auditor_token', team.auditor]] as const) {
    const t = await client.post('/api/tokens', { name: `access matrix ${actor}` });
    expect(t.status).toBe(201);
    secrets[actor] = t.body.secret;
  }
});
afterAll(stopTestServer);

const CLIENT_OF: Record<Role, keyof Team> = { admin: 'admin', systems_engineer: 'systems', controls_engineer: 'controls', auditor: 'auditor' };

async function call(actor: Actor, route: RouteEntry, e: Expectation) {
  const path = e.path(ids);
  if (actor === 'controls_token' || actor === 'auditor_token') {
    return new TestClient(url).request(route.method, path, e.body, { headers: { authorization: `Bearer ${secrets[actor]}` } });
  }
  if (actor === 'signed_out') return new TestClient(url).request(route.method, path, e.body);
  if (e.fresh) {
    const c = new TestClient(url);
    expect((await c.login(DEMO[actor], DEMO_PASSWORD)).status).toBe(200);
    return c.request(route.method, path, e.body);
  }
  return team[CLIENT_OF[actor]].request(route.method, path, e.body);
}

describe('access matrix', () => {
  it('When the route table is read, then every route has an expectation and every expectation a route', () => {
    const keys = routes.map((r) => r.key);
    const missing = keys.filter((k) => !(k in EXPECTED));
    const stale = Object.keys(EXPECTED).filter((k) => !keys.includes(k));
    expect(missing, `routes without a row in EXPECTED: ${missing.join(', ')}`).toEqual([]);
    expect(stale, `rows in EXPECTED for routes that no longer exist: ${stale.join(', ')}`).toEqual([]);
  });

  it('When every route is called by every role, signed out and with two API tokens, then each answers its expected status (errors with the envelope)', async () => {
    const wrong: string[] = [];
    let pairs = 0;
    for (const route of routes) {
      const e = EXPECTED[route.key];
      if (!e) continue;
      for (const actor of ACTORS) {
        const want = expectedStatus(e, actor);
        const r = await call(actor, route, e);
        pairs += 1;
        const envelopeOk = r.status < 400 || (typeof r.body?.error?.code === 'string' && typeof r.body?.error?.message === 'string');
        if (r.status !== want || !envelopeOk) wrong.push(`${route.key} as ${actor}: ${r.status} (expected ${want}) ${JSON.stringify(r.body).slice(0, 160)}`);
      }
    }
    console.log(`access matrix: ${routes.length} routes x ${ACTORS.length} callers = ${pairs} pairs checked, ${wrong.length} wrong`);
    expect(wrong).toEqual([]);
  });
});
