// Generated hostile input (fast-check) against every write route, the GET
// routes' ids and queries, the multipart upload and the engine CLI. Every
// payload is built to be wrong in at least one way, so the only right answer
// is a 4xx with the error envelope: never a 5xx, the server still answering,
// and nothing written (the cast's rows counted before and after each request).
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

import fc from 'fast-check';
import type { Sequelize } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { COMMON_PASSWORDS_FOR_TESTS } from '../helpers/common-passwords.js';
import { TestClient } from '../helpers/client.js';
import { castSnapshot, makeCast, type Cast } from '../helpers/fixtures.js';
import { apiRoutes } from '../helpers/route-table.js';
import { startTestServer, stopTestServer } from '../helpers/server.js';

const SEED = 20260501;
const ADDRESS = `2001:db8:bad:${Math.floor(Math.random() * 0xffff).toString(16)}::1`;
const ROOT = process.env.POLECOURT_ROOT ?? path.resolve(import.meta.dirname, '../../../..');
const CLI = path.join(ROOT, 'packages/spec/dist/cli.js');

let url: string;
let sequelize: Sequelize;
let cast: Cast;
let writeRoutes: string[];
let getRoutes: string[];
const tally = { sent: 0, byStatus: new Map<number, number>() };

beforeAll(async () => {
  // TRUST_PROXY: every request says it comes from ADDRESS, so login failures (if any) are countable as ours.
  const running = await startTestServer({ TRUST_PROXY: 'true' });
  url = running.url;
  sequelize = running.sequelize;
  cast = await makeCast(url, { 'x-forwarded-for': ADDRESS });
  const routes = apiRoutes(running.server).filter((r) => !r.path.includes('{*'));
  writeRoutes = routes.filter((r) => r.method !== 'GET').map((r) => r.key);
  getRoutes = routes.filter((r) => r.method === 'GET').map((r) => r.key);
});
afterAll(async () => {
  const statuses = [...tally.byStatus].sort((a, b) => a[0] - b[0]).map(([s, n]) => `${s}: ${n}`).join(', ');
  console.log(`hostile input over HTTP: ${tally.sent} requests (${statuses})`);
  await stopTestServer();
});

type Who = 'anon' | 'admin' | 'systems' | 'controls' | 'auditor';
interface Sent {
  status: number;
  body: any;
}

async function send(who: Who, method: string, p: string, body: string | FormData | undefined, contentType?: string): Promise<Sent> {
  const client = who === 'anon' ? new TestClient(url) : cast[who];
  const headers: Record<string, string> = { 'x-forwarded-for': ADDRESS };
  if (contentType) headers['content-type'] = contentType;
  const r = await client.request(method, p, body, { headers });
  tally.sent += 1;
  tally.byStatus.set(r.status, (tally.byStatus.get(r.status) ?? 0) + 1);
  return r;
}

/** Sends one payload that must be refused; returns a problem description, or null when all is well. */
async function refused(who: Who, method: string, p: string, body: string | FormData | undefined, contentType?: string): Promise<string | null> {
  const before = await castSnapshot(sequelize, cast, ADDRESS);
  const r = await send(who, method, p, body, contentType);
  const after = await castSnapshot(sequelize, cast, ADDRESS);
  const shown = typeof body === 'string' ? body.slice(0, 120) : body ? '[form]' : '';
  if (r.status < 400 || r.status >= 500) return `${method} ${p} ${contentType ?? ''} ${shown} -> ${r.status} ${JSON.stringify(r.body).slice(0, 200)}`;
  if (typeof r.body?.error?.code !== 'string' || typeof r.body?.error?.message !== 'string') return `${method} ${p} -> ${r.status} without the error envelope: ${JSON.stringify(r.body).slice(0, 200)}`;
  if (before !== after) return `${method} ${p} ${shown} -> ${r.status} but the database changed: ${before} -> ${after}`;
  return null;
}

// ---- values that are wrong for a field of a given kind --------------------------------------

const LONG = fc.integer({ min: 20_001, max: 60_000 }).map((n) => 'x'.repeat(n));
const notString = fc.oneof(fc.integer(), fc.double(), fc.boolean(), fc.constant(null), fc.array(fc.string(), { maxLength: 3 }), fc.dictionary(fc.string({ maxLength: 5 }), fc.string({ maxLength: 5 }), { maxKeys: 3 }));
const notNumber = fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom('NaN', 'Infinity', '-Infinity', '1e309', '12'), fc.boolean(), fc.constant(null), fc.array(fc.integer(), { maxLength: 3 }), fc.object({ maxDepth: 1 }));
const badPositiveInt = fc.oneof(notNumber, fc.integer({ min: -2_000_000_000, max: 0 }), fc.double({ min: 0.001, max: 1e6, noNaN: true }).filter((v) => !Number.isInteger(v)), fc.constantFrom(-0, -1e308, 0.5));
const deepArray = (depth: number) => '['.repeat(depth) + ']'.repeat(depth);

const KINDS = {
  name: fc.oneof(notString, fc.constantFrom('', '   ', '\t\n'), LONG),
  text: fc.oneof(notString, LONG),
  email: fc.oneof(notString, fc.string({ maxLength: 30 }).filter((s) => !s.includes('@')), fc.constant(`${'a'.repeat(250)}@example.com`), fc.constantFrom('@', 'a@', '@b.c', 'a b@c.d')),
  loginPassword: fc.oneof(notString, fc.constant(''), fc.integer({ min: 201, max: 5000 }).map((n) => 'p'.repeat(n))),
  newPassword: fc.oneof(notString, fc.string({ maxLength: 11 }), fc.constantFrom(...COMMON_PASSWORDS_FOR_TESTS), fc.integer({ min: 201, max: 5000 }).map((n) => 'p'.repeat(n))),
  token: fc.oneof(notString, fc.constantFrom('', '  '), fc.integer({ min: 201, max: 3000 }).map((n) => 't'.repeat(n))),
  positiveInt: badPositiveInt,
  days: fc.oneof(badPositiveInt, fc.integer({ min: 366, max: 2_000_000_000 }), fc.constant(1e308)),
  bool: fc.oneof(fc.string({ maxLength: 5 }), fc.integer(), fc.constant(null), fc.constantFrom('true', 'false', 0, 1)),
  literalTrue: fc.oneof(fc.constantFrom(false, 'true', 1, null, 'yes'), fc.string({ maxLength: 4 })),
  role: fc.oneof(notString, fc.string({ maxLength: 20 }).filter((s) => !['admin', 'systems_engineer', 'controls_engineer', 'auditor'].includes(s)), fc.constantFrom('ADMIN', 'root', 'admin ')),
  meaning: fc.oneof(notString, fc.string({ maxLength: 12 }).filter((s) => !['reviewed', 'released'].includes(s)), fc.constantFrom('approved', 'Released')),
  requirements: fc.oneof(
    notNumber.filter((v) => typeof v !== 'object' || v === null || Array.isArray(v)),
    fc.constant({}),
    fc.record({ maxOvershootPct: fc.oneof(notNumber, fc.double({ min: 100, max: 1e300, noNaN: true }), fc.double({ max: 0, noNaN: true })) }),
    fc.record({ maxSettlingTime: fc.oneof(notNumber, fc.double({ max: 0, noNaN: true })), extra: fc.integer() }),
    fc.record({ minDampingRatio: fc.double({ min: 1.000001, max: 1e9, noNaN: true }) }),
    fc.dictionary(fc.string({ minLength: 1, maxLength: 8 }).filter((k) => !/^(max|min|settling|dominance|margin)/.test(k)), fc.double(), { minKeys: 1, maxKeys: 4 }),
  ),
  design: fc.oneof(
    notString.filter((v) => typeof v !== 'object' || v === null || Array.isArray(v)),
    fc.constant({}),
    fc.record({ poles: fc.array(fc.record({ re: fc.double({ max: -0.1, noNaN: true }), im: fc.double({ min: 0.1, max: 100, noNaN: true }) }), { minLength: 1, maxLength: 5 }), gain: fc.double({ min: 1, max: 10, noNaN: true }) }).map((d) => ({ ...d, poles: d.poles })), // complex poles without their conjugates
    fc.integer({ min: 201, max: 10_000 }).map((n) => ({ poles: Array.from({ length: n }, (_, i) => ({ re: -1 - i, im: 0 })), gain: 1 })),
    fc.record({ poles: fc.constant([{ re: -1, im: 0 }]), gain: fc.constant(0) }),
    fc.record({ poles: fc.constant([{ re: -1, im: 0 }]), zeros: fc.constant([{ re: -2, im: 0 }, { re: -3, im: 0 }]), gain: fc.constant(1) }),
    fc.record({ poles: fc.array(fc.record({ re: notNumber, im: fc.constant(0) }), { minLength: 1, maxLength: 3 }), gain: fc.constant(1) }),
    fc.record({ numerator: fc.constant([1]), denominator: fc.constantFrom([0, 1, 2], [], ['1', 2]) }),
    fc.record({ poles: fc.constant([{ re: -1, im: 0 }]), gain: fc.constant(1), numerator: fc.constant([1]) }),
    fc.record({ poles: fc.constant([{ re: -1, im: 0 }]), gain: fc.constant(1), zero: fc.constant([]) }),
    fc.constant({ poles: [{ re: -1e200, im: 0 }, { re: -1e200, im: 0 }], gain: 1 }),
  ),
} as const;
type Kind = keyof typeof KINDS;

interface BodyRoute {
  key: string;
  who: Who;
  path: () => string;
  method: string;
  valid: Record<string, unknown>;
  fields: Record<string, Kind>;
  required: string[];
}

function bodyRoutes(): BodyRoute[] {
  const i = cast.ids;
  const r = (key: string, who: Who, p: () => string, valid: Record<string, unknown>, fields: Record<string, Kind>, required: string[]): BodyRoute => ({ key, who, path: p, method: key.split(' ')[0]!, valid, fields, required });
  const anyDesign = { poles: [{ re: -3, im: 4 }, { re: -3, im: -4 }, { re: -40, im: 0 }], zeros: [], gain: 1000 };
  return [
    r('POST /api/auth/login', 'anon', () => '/api/auth/login', { email: 'hostile.nobody@test.example.com', password: 'x' }, { email: 'email', password: 'loginPassword' }, ['email', 'password']),
    r('POST /api/auth/change-password', 'controls', () => '/api/auth/change-password', { currentPassword: 'whatever-it-is', newPassword: 'a-fine-new-passphrase' }, { currentPassword: 'loginPassword', newPassword: 'newPassword' }, ['currentPassword', 'newPassword']),
    r('POST /api/auth/set-password', 'anon', () => '/api/auth/set-password', { token: 'abc', password: 'a-fine-new-passphrase' }, { token: 'token', password: 'newPassword' }, ['token', 'password']),
    r('POST /api/auth/request-reset', 'anon', () => '/api/auth/request-reset', { email: 'hostile.nobody@test.example.com' }, { email: 'email' }, ['email']),
    r('POST /api/tokens', 'controls', () => '/api/tokens', { name: 'ci', expiresInDays: 5 }, { name: 'name', expiresInDays: 'days' }, ['name']),
    r('POST /api/users', 'admin', () => '/api/users', { email: 'hostile.user@test.example.com', name: 'Hostile', role: 'auditor', password: 'a-fine-new-passphrase' }, { email: 'email', name: 'name', role: 'role', password: 'newPassword' }, ['email', 'name', 'role']),
    r('PATCH /api/users/:id', 'admin', () => `/api/users/${cast.spareUserId}`, { name: 'Spare', role: 'auditor', active: true }, { name: 'name', role: 'role', active: 'bool' }, []),
    r('POST /api/product-lines', 'systems', () => '/api/product-lines', { name: 'Hostile line', description: '' }, { name: 'name', description: 'text' }, ['name']),
    r('PATCH /api/product-lines/:id', 'systems', () => `/api/product-lines/${i.line}`, { name: 'Renamed', description: 'd' }, { name: 'name', description: 'text' }, []),
    r('POST /api/product-lines/:id/requirement-sets', 'systems', () => `/api/product-lines/${i.line}/requirement-sets`, { name: 'Hostile set', purpose: '' }, { name: 'name', purpose: 'text' }, ['name']),
    r('POST /api/requirement-sets/:id/revisions', 'systems', () => `/api/requirement-sets/${i.set}/revisions`, { requirements: { maxOvershootPct: 5 }, rationale: '' }, { requirements: 'requirements', rationale: 'text' }, ['requirements']),
    r('PATCH /api/revisions/:id', 'systems', () => `/api/revisions/${i.draft}`, { requirements: { maxOvershootPct: 6 }, rationale: 'x', version: 1 }, { requirements: 'requirements', rationale: 'text', version: 'positiveInt' }, ['version']),
    r('POST /api/revisions/:id/approve', 'admin', () => `/api/revisions/${i.draft}/approve`, { password: 'x', impactAcknowledged: true }, { password: 'loginPassword', impactAcknowledged: 'literalTrue' }, ['password', 'impactAcknowledged']),
    r('POST /api/product-lines/:id/candidates', 'controls', () => `/api/product-lines/${i.line}/candidates`, { name: 'Hostile candidate', notes: '', design: anyDesign }, { name: 'name', notes: 'text', design: 'design' }, ['name', 'design']),
    r('POST /api/candidates/:id/assessments', 'controls', () => `/api/candidates/${i.candidate}/assessments`, { revisionId: i.approved }, { revisionId: 'positiveInt' }, []),
    r('POST /api/assessments/:id/reports', 'controls', () => `/api/assessments/${i.assessment}/reports`, { password: 'x', meaning: 'reviewed' }, { password: 'loginPassword', meaning: 'meaning' }, ['password', 'meaning']),
  ];
}

/** A body that is wrong for the route: one field made wrong (or a required one left out), perhaps with stray keys. */
function hostileBody(route: BodyRoute): fc.Arbitrary<Record<string, unknown>> {
  const keys = Object.keys(route.fields);
  const wrongField = fc.constantFrom(...keys).chain((k) => KINDS[route.fields[k]!].map((v) => ({ ...route.valid, [k]: v })));
  const missing = route.required.length ? [fc.constantFrom(...route.required).map((k) => Object.fromEntries(Object.entries(route.valid).filter(([key]) => key !== k)))] : [];
  const extras = fc.dictionary(fc.string({ minLength: 1, maxLength: 10 }).filter((k) => !keys.includes(k)), fc.jsonValue({ maxDepth: 2 }), { minKeys: 1, maxKeys: 3 });
  return fc.tuple(fc.oneof(wrongField, ...missing), fc.option(extras, { freq: 3 })).map(([body, extra]) => (extra ? { ...extra, ...body } : body));
}

const BODY_RUNS = 45;
// Path ids that must name nothing: Number() would read some of them ('1e3', '0x1F', ' 7') as ids.
const HOSTILE_IDS = ['abc', '-1', '0', '1.5', '1e3', '0x1F', '%207', '+7', '99999999999999999999', 'NaN', 'Infinity', '%00', '1%2C2', 'null', '2147483000', '..%2F..'];

describe('hostile input', () => {
  it('When every body route gets generated wrong bodies (wrong types, missing and extra fields, NaN/Infinity/huge/negative numbers, 10,000-pole models, unbalanced conjugates, long strings), then each is a 4xx and nothing is written', async () => {
    const problems: string[] = [];
    let count = 0;
    for (const route of bodyRoutes()) {
      expect(writeRoutes, `${route.key} is not a route of the app`).toContain(route.key);
      for (const body of fc.sample(hostileBody(route), { numRuns: BODY_RUNS, seed: SEED })) {
        count += 1;
        const problem = await refused(route.who, route.method, route.path(), JSON.stringify(body));
        if (problem) problems.push(problem);
      }
    }
    console.log(`hostile bodies: ${count} generated payloads over ${bodyRoutes().length} body routes, ${problems.length} answered wrongly`);
    expect(problems).toEqual([]);
  });

  it('When every write route gets raw hostile bodies (10,000 nested arrays and objects, broken JSON, NaN literals, 1.1 MB, wrong content types), then 400/413/415, never 5xx, and nothing is written', async () => {
    const i = cast.ids;
    // The routes with no body of their own still meet the body parser and the content-type guard.
    const target: Record<string, { who: Who; path: string }> = {
      'POST /api/auth/login': { who: 'anon', path: '/api/auth/login' },
      'POST /api/auth/change-password': { who: 'controls', path: '/api/auth/change-password' },
      'POST /api/auth/logout': { who: 'controls', path: '/api/auth/logout' },
      'POST /api/auth/set-password': { who: 'anon', path: '/api/auth/set-password' },
      'POST /api/auth/request-reset': { who: 'anon', path: '/api/auth/request-reset' },
      'POST /api/tokens': { who: 'controls', path: '/api/tokens' },
      'DELETE /api/tokens/:id': { who: 'controls', path: '/api/tokens/2147483000' },
      'POST /api/users/:id/resend-invite': { who: 'admin', path: `/api/users/${cast.spareUserId}/resend-invite` },
      'POST /api/users': { who: 'admin', path: '/api/users' },
      'PATCH /api/users/:id': { who: 'admin', path: `/api/users/${cast.spareUserId}` },
      'POST /api/product-lines': { who: 'systems', path: '/api/product-lines' },
      'PATCH /api/product-lines/:id': { who: 'systems', path: `/api/product-lines/${i.line}` },
      'POST /api/product-lines/:id/requirement-sets': { who: 'systems', path: `/api/product-lines/${i.line}/requirement-sets` },
      'POST /api/requirement-sets/:id/revisions': { who: 'systems', path: `/api/requirement-sets/${i.set}/revisions` },
      'PATCH /api/revisions/:id': { who: 'systems', path: `/api/revisions/${i.draft}` },
      'POST /api/revisions/:id/submit': { who: 'systems', path: `/api/revisions/${i.draft}/submit` },
      'POST /api/revisions/:id/approve': { who: 'admin', path: `/api/revisions/${i.draft}/approve` },
      'POST /api/revisions/:id/retire': { who: 'systems', path: `/api/revisions/${i.approved}/retire` },
      'POST /api/product-lines/:id/candidates': { who: 'controls', path: `/api/product-lines/${i.line}/candidates` },
      'POST /api/candidates/:id/assessments': { who: 'controls', path: `/api/candidates/${i.candidate}/assessments` },
      'POST /api/assessments/:id/reports': { who: 'controls', path: `/api/assessments/${i.assessment}/reports` },
      'POST /api/reports/verify': { who: 'auditor', path: '/api/reports/verify' },
    };
    const missing = writeRoutes.filter((k) => !(k in target));
    expect(missing, `write routes without a hostile-body target: ${missing.join(', ')}`).toEqual([]);
    const big = JSON.stringify({ name: 'x', notes: 'n'.repeat(1_150_000) });
    const raws: { body: string; type: string }[] = [
      { body: deepArray(10_000), type: 'application/json' },
      { body: '{"a":'.repeat(10_000) + '1' + '}'.repeat(10_000), type: 'application/json' },
      { body: '{"name": ', type: 'application/json' },
      { body: '{"revisionId": NaN}', type: 'application/json' },
      { body: '{"expiresInDays": Infinity, "name": "x"}', type: 'application/json' },
      { body: '"just a string"', type: 'application/json' },
      { body: big, type: 'application/json' },
      { body: '{"name":"x"}', type: 'text/plain' },
      { body: 'name=x&description=y', type: 'application/x-www-form-urlencoded' },
      { body: '<line><name>x</name></line>', type: 'application/xml' },
      { body: '{"name":"x"}', type: 'application/json; charset=iso-8859-1' },
    ];
    // The body-ignoring actions (submit, retire, logout, resend, revoke, verify) would accept a well-formed JSON
    // body, so they only get the raw cases that no route may read.
    const bodyless = new Set(['POST /api/auth/logout', 'DELETE /api/tokens/:id', 'POST /api/users/:id/resend-invite', 'POST /api/revisions/:id/submit', 'POST /api/revisions/:id/retire', 'POST /api/reports/verify']);
    const problems: string[] = [];
    let count = 0;
    for (const key of writeRoutes) {
      const t = target[key]!;
      const method = key.split(' ')[0]!;
      for (const raw of raws) {
        if (bodyless.has(key) && raw.type === 'application/json' && !raw.body.startsWith('{"name": ') && !raw.body.includes('NaN') && !raw.body.includes('Infinity') && raw.body !== big && !raw.body.startsWith('"')) continue;
        count += 1;
        const problem = await refused(t.who, method, t.path, raw.body, raw.type);
        if (problem) problems.push(problem);
      }
    }
    console.log(`raw hostile bodies: ${count} requests over ${writeRoutes.length} write routes, ${problems.length} answered wrongly`);
    expect(problems).toEqual([]);
  });

  it('When ids in paths are not positive decimal integers (or name nothing), then 404 on every route that takes one, and nothing is written', async () => {
    const routes = [...writeRoutes, ...getRoutes].filter((k) => k.includes(':id'));
    const whoFor = (key: string): Who => (key.includes('/users') ? 'admin' : key.includes('candidates') || key.includes('assessments') ? 'controls' : key.startsWith('GET') ? 'auditor' : 'systems');
    const problems: string[] = [];
    let count = 0;
    for (const key of routes) {
      const [method, pattern] = key.split(' ') as [string, string];
      for (const id of HOSTILE_IDS) {
        count += 1;
        const body = method === 'GET' || method === 'DELETE' ? undefined : '{}';
        const p = pattern.replace(':id', id);
        const before = await castSnapshot(sequelize, cast, ADDRESS);
        const r = await send(whoFor(key), method, p, body);
        const after = await castSnapshot(sequelize, cast, ADDRESS);
        // A well-formed id that names nothing may meet body validation first (400); anything else names nothing (404).
        const want = id === '2147483000' ? [400, 404] : [404];
        if (!want.includes(r.status) || typeof r.body?.error?.code !== 'string' || before !== after) problems.push(`${method} ${p} -> ${r.status} ${JSON.stringify(r.body).slice(0, 120)}`);
      }
    }
    console.log(`hostile path ids: ${count} requests over ${routes.length} routes with an id, ${problems.length} answered wrongly`);
    expect(problems).toEqual([]);
  });

  it('When GET routes get unknown query keys, they are ignored (same status as without); bad values of known keys are 400', async () => {
    const i = cast.ids;
    const concrete = getRoutes.map((k) =>
      k.replace(/^GET /, '')
        .replace('/product-lines/:id', `/product-lines/${i.line}`)
        .replace('/requirement-sets/:id', `/requirement-sets/${i.set}`)
        .replace('/revisions/:id', `/revisions/${i.approved}`)
        .replace('/candidates/:id', `/candidates/${i.candidate}`)
        .replace('/assessments/:id', `/assessments/${i.assessment}`)
        .replace('/reports/:id', '/reports/2147483000'),
    );
    const unknownKeys = fc.sample(fc.dictionary(fc.stringMatching(/^[a-z_]{3,12}$/).filter((k) => !['limit', 'offset', 'all', 'to', 'from', 'filter', 'format', 'against', 'action', 'actorId', 'entityType', 'entityId', 'productLineId', 'remin', 'remax', 'immin', 'immax'].includes(k.toLowerCase())), fc.string({ maxLength: 8 }), { minKeys: 1, maxKeys: 3 }), { numRuns: 3, seed: SEED });
    const problems: string[] = [];
    let count = 0;
    for (const p of concrete) {
      const plain = await send('admin', 'GET', p, undefined);
      for (const q of unknownKeys) {
        count += 1;
        const r = await send('admin', 'GET', `${p}${p.includes('?') ? '&' : '?'}${new URLSearchParams(q as Record<string, string>).toString()}`, undefined);
        if (r.status !== plain.status) problems.push(`GET ${p} with ${JSON.stringify(q)} -> ${r.status}, without -> ${plain.status}`);
      }
    }
    // (limit[]=1 is not here: the simple query parser reads "limit[]" as a key of its own, ignored like any unknown key.)
    const badValues = ['limit=-1', 'limit=abc', 'limit=100000', 'offset=-5', 'offset=1e400', 'limit=1.5', 'limit=1&limit=2'];
    const lists = ['/api/product-lines', '/api/users', '/api/tokens', '/api/reports', '/api/audit-events', '/api/outbox', `/api/product-lines/${i.line}/candidates`];
    for (const p of lists) {
      for (const q of badValues) {
        count += 1;
        const r = await send('admin', 'GET', `${p}?${q}`, undefined);
        if (r.status !== 400 || typeof r.body?.error?.code !== 'string') problems.push(`GET ${p}?${q} -> ${r.status}`);
      }
    }
    for (const q of ['reMin=abc', 'reMin=1e400', 'reMin=5&reMax=1', 'imMax=NaN']) {
      count += 1;
      const r = await send('auditor', 'GET', `/api/revisions/${i.approved}/region?${q}`, undefined);
      if (r.status !== 400) problems.push(`region ?${q} -> ${r.status}`);
    }
    for (const q of ['filter=everything', 'format=xlsx']) {
      count += 1;
      const r = await send('auditor', 'GET', `/api/product-lines/${i.line}/coverage?${q}`, undefined);
      if (r.status !== 400) problems.push(`coverage ?${q} -> ${r.status}`);
    }
    console.log(`hostile queries: ${count} requests over ${concrete.length} GET routes, ${problems.length} answered wrongly`);
    expect(problems).toEqual([]);
  });

  it('When uploads are broken (no boundary, cut off, wrong field, two files, over 2 MB, binary, CSV with bad quotes or unknown columns, deep or huge JSON), then 4xx and no candidate is saved', async () => {
    const p = `/api/product-lines/${cast.ids.line}/candidates`;
    const form = (parts: [string, string | Blob, string?][]) => {
      const f = new FormData();
      for (const [field, value, name] of parts) f.append(field, typeof value === 'string' ? new Blob([value]) : value, name ?? 'upload.csv');
      return f;
    };
    const fixed: { body: string | FormData; type?: string }[] = [
      { body: 'garbage', type: 'multipart/form-data' },
      { body: '--XYZ\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\n\r\nname,gain\r\n', type: 'multipart/form-data; boundary=XYZ' },
      { body: '--XYZ--\r\n', type: 'multipart/form-data; boundary=XYZ' },
      { body: form([['other', 'name,gain,poles\nA,1,-1']]) },
      { body: form([['file', 'name,gain,poles\nA,1,-1'], ['file', 'name,gain,poles\nB,1,-1']]) },
      { body: form([['file', new Blob([new Uint8Array(2 * 1024 * 1024 + 10)])]]) },
      { body: form([['file', '']]) },
      { body: form([['file', `{"candidates":[{"name":"Deep","design":${deepArray(10_000)}}]}`]]) },
      { body: form([['file', JSON.stringify({ candidates: [{ name: 'Huge', design: { poles: Array.from({ length: 10_000 }, (_, k) => ({ re: -1 - k, im: 0 })), gain: 1 } }] })]]) },
      { body: form(Array.from({ length: 25 }, (_, k) => [`field${k}`, 'x'] as [string, string]).concat([['file', 'name,gain,poles\nA,1,-1']])) },
    ];
    // Generated CSV: cells with quotes, commas, newlines and formula starts, in files whose designs are all wrong.
    const cell = fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom('"', '""', '"a,b"', '=cmd|\' /C calc\'!A0', '+1+1', '@SUM(A1)', '-2+3', '\r\n', 'a"b'));
    const badDesignCell = fc.constantFrom('', 'abc', '-1+2j', '1;2;x', 'NaN', '1e309', '"', '-3±4j -3±4j ;');
    const csvFiles = fc.sample(
      fc.array(fc.tuple(cell, cell, fc.oneof(badDesignCell, fc.constant('0')), badDesignCell), { minLength: 1, maxLength: 6 }).map((rows) =>
        ['name,notes,gain,poles', ...rows.map(([n, notes, g, poles]) => [n, notes, g, poles].join(','))].join('\n'),
      ),
      { numRuns: 60, seed: SEED },
    );
    const garbage = fc.sample(fc.uint8Array({ minLength: 1, maxLength: 3000 }), { numRuns: 20, seed: SEED });
    const problems: string[] = [];
    let count = 0;
    for (const f of fixed) {
      count += 1;
      const problem = await refused('controls', 'POST', p, f.body, f.type);
      if (problem) problems.push(problem);
    }
    for (const csv of csvFiles) {
      count += 1;
      const problem = await refused('controls', 'POST', p, form([['file', csv]]));
      if (problem) problems.push(`${problem}\n${csv}`);
    }
    for (const bytes of garbage) {
      count += 1;
      const problem = await refused('controls', 'POST', p, form([['file', new Blob([bytes])]]));
      if (problem) problems.push(problem);
    }
    // Verifying a report changes nothing but its own audit note; a garbage PDF must still not be a 5xx.
    for (const bytes of garbage.slice(0, 8)) {
      count += 1;
      const r = await send('auditor', 'POST', '/api/reports/verify', form([['file', new Blob([bytes]), 'report.pdf']]));
      if (r.status >= 500) problems.push(`verify garbage -> ${r.status}`);
    }
    console.log(`hostile uploads: ${count} requests, ${problems.length} answered wrongly`);
    expect(problems).toEqual([]);
  });

  it('When candidate names are spreadsheet formulas, then the coverage CSV export never starts a cell with = + - @', async () => {
    const names = ['=cmd|\' /C calc\'!A0', '+SUM(1,2)', '-2+3', '@A1', '=HYPERLINK("http://example.com","x")', '"=quoted"'];
    const csv = ['name,notes,gain,poles', ...names.map((n) => `"${n.replace(/"/g, '""')}",formula test,1000,-3±4j -40`)].join('\n');
    const f = new FormData();
    f.append('file', new Blob([csv]), 'formulas.csv');
    const up = await send('controls', 'POST', `/api/product-lines/${cast.ids.line}/candidates`, f);
    expect(up.status).toBe(201);
    expect(up.body.accepted).toHaveLength(names.length);
    const out = await cast.auditor.get(`/api/product-lines/${cast.ids.line}/coverage?format=csv`);
    expect(out.status).toBe(200);
    const text = String(out.body);
    const cells = text.split(/\r\n/).flatMap((line) => line.match(/("([^"]|"")*"|[^,]*)(,|$)/g) ?? []).map((c) => c.replace(/,$/, '').replace(/^"|"$/g, ''));
    for (const n of names) expect(text).toContain(n.replace(/"/g, '""').slice(1));
    const dangerous = cells.filter((c) => /^[=+\-@]/.test(c) && !/^-?\d/.test(c));
    expect(dangerous).toEqual([]);
  });

  it('When the server has taken all of this, then it still answers health and a signed-in read', async () => {
    expect((await new TestClient(url).get('/api/health')).status).toBe(200);
    expect((await cast.auditor.get('/api/product-lines')).status).toBe(200);
  });
});

describe('engine CLI with hostile designs', () => {
  it('When `polecourt evaluate --design -` and `batch --designs -` read hostile designs, then each is refused with exit 2 (batch: one error line each, exit 1), never an internal error', () => {
    expect(existsSync(CLI), `${CLI} is missing: build the engine (pnpm --filter @polecourt/spec build)`).toBe(true);
    const dir = mkdtempSync(path.join(tmpdir(), 'polecourt-cli-'));
    const req = path.join(dir, 'limits.json');
    writeFileSync(req, JSON.stringify({ maxOvershootPct: 10, maxSettlingTime: 2 }));
    const designs = fc.sample(KINDS.design, { numRuns: 24, seed: SEED }).map((d) => JSON.stringify(d));
    const raw = [deepArray(10_000), '{"a":'.repeat(10_000) + '1' + '}'.repeat(10_000), '{"poles": [{"re": NaN, "im": 0}], "gain": 1}', '{"poles": [{"re": -1, "im": 0}], "gain": 1e309}', '{"poles": ', '', '\u0000', JSON.stringify({ poles: [{ re: -1, im: 2 }], gain: 1 })];
    const problems: string[] = [];
    let runs = 0;
    for (const input of [...designs, ...raw]) {
      runs += 1;
      const r = spawnSync(process.execPath, [CLI, 'evaluate', '--design', '-', '--requirements', req], { input, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
      let out: any = null;
      try {
        out = JSON.parse(r.stdout);
      } catch {
        /* reported below */
      }
      if (r.status !== 2 || typeof out?.error?.code !== 'string' || out.error.code === 'internal_error' || /\n\s+at /.test(r.stderr)) {
        problems.push(`evaluate ${input.slice(0, 80)} -> exit ${r.status} ${r.stdout.slice(0, 120)} ${r.stderr.slice(0, 120)}`);
      }
    }
    const lines = fc.sample(KINDS.design, { numRuns: 600, seed: SEED + 1 }).map((d) => JSON.stringify(d));
    const batchInput = [...lines, '{"poles": NaN}', deepArray(10_000)].join('\n') + '\n';
    const b = spawnSync(process.execPath, [CLI, 'batch', '--designs', '-', '--requirements', req], { input: batchInput, encoding: 'utf8', maxBuffer: 256 * 1024 * 1024 });
    const outLines = b.stdout.trim().split('\n');
    const batchCount = lines.length + 2;
    if (b.status !== 1) problems.push(`batch exit ${b.status}: ${b.stderr.slice(0, 200)}`);
    if (outLines.length !== batchCount) problems.push(`batch printed ${outLines.length} lines for ${batchCount} designs`);
    outLines.forEach((l, k) => {
      const o = JSON.parse(l);
      if (typeof o?.error?.code !== 'string' || o.error.code === 'internal_error' || o.error.line !== k + 1) problems.push(`batch line ${k + 1}: ${l.slice(0, 160)}`);
    });
    console.log(`engine CLI: ${runs} evaluate runs and ${batchCount} batch lines of hostile designs, ${problems.length} answered wrongly`);
    expect(problems).toEqual([]);
  });
});
