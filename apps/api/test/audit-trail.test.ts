// The audit trail as auditors read it: filters, the CSV export, the filter
// choices and the chain head. 21 CFR Part 11 §11.10(e) asks for time-stamped
// audit trails that do not obscure earlier entries; the export must carry them
// whole, and must never hand a spreadsheet a formula (OWASP "CSV Injection").
import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { TestClient, signedIn } from './helpers/client.js';
import { startTestServer, stopTestServer } from './helpers/server.js';
import { uniqueName } from './helpers/workflow.js';

let url: string;
let auditor: TestClient;
let admin: TestClient;
let systems: TestClient;
let systemsId: number;

// One product line made for this file: created with a formula for a name, then renamed.
const FORMULA = "=cmd|' /C calc'!A0";
let line: { id: number; name: string };
let renamedTo: string;

beforeAll(async () => {
  const running = await startTestServer();
  url = running.url;
  [auditor, admin, systems] = await Promise.all([signedIn(url, 'auditor'), signedIn(url, 'admin'), signedIn(url, 'systems_engineer')]);
  systemsId = (await systems.get('/api/auth/me')).body.user.id;
  const created = await systems.post('/api/product-lines', { name: `${FORMULA} ${uniqueName('line')}`, description: '@SUM(1+1) in a description' });
  expect(created.status).toBe(201);
  line = created.body;
  renamedTo = `+${uniqueName('renamed line')}`;
  const renamed = await systems.patch(`/api/product-lines/${line.id}`, { name: renamedTo });
  expect(renamed.status).toBe(200);
});
afterAll(stopTestServer);

interface Event {
  id: number;
  occurredAt: string;
  actorId: number | null;
  actorEmail: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  productLineId: number | null;
  before: any;
  after: any;
  hash: string;
}

async function eventsOf(query: string): Promise<Event[]> {
  const r = await auditor.get(`/api/audit-events?${query}`);
  expect(r.status).toBe(200);
  return r.body.items;
}

describe('GET /api/audit-events (filters)', () => {
  it('When filtered by product line, then only that line’s events come back, newest first', async () => {
    const items = await eventsOf(`productLineId=${line.id}`);
    expect(items.map((e) => e.action)).toEqual(['product_line.update', 'product_line.create']);
    expect(items.every((e) => e.productLineId === line.id)).toBe(true);
    expect(items[0]!.id).toBeGreaterThan(items[1]!.id);
  });

  it('When filtered by action, actor, entity type and id together, then exactly the matching event comes back', async () => {
    const items = await eventsOf(`action=product_line.create&actorId=${systemsId}&entityType=product_line&entityId=${line.id}`);
    expect(items).toHaveLength(1);
    expect(items[0]).toMatchObject({ action: 'product_line.create', actorId: systemsId, actorEmail: 'systems@example.com', entityId: String(line.id) });
    expect(items[0]!.after.name).toBe(line.name);
  });

  it('When filtered by another actor, then the line’s events are not among them', async () => {
    const adminId = (await admin.get('/api/auth/me')).body.user.id;
    expect(await eventsOf(`productLineId=${line.id}&actorId=${adminId}`)).toEqual([]);
  });

  it('When filtered by a time range, then events inside it come back and a range that ends before them finds none', async () => {
    const [update] = await eventsOf(`productLineId=${line.id}&action=product_line.update`);
    const at = Date.parse(update!.occurredAt);
    const around = await eventsOf(
      `productLineId=${line.id}&from=${encodeURIComponent(new Date(at - 1).toISOString())}&to=${encodeURIComponent(new Date(at + 1).toISOString())}`,
    );
    expect(around.map((e) => e.id)).toContain(update!.id);
    const before = await eventsOf(`productLineId=${line.id}&to=${encodeURIComponent(new Date(at - 60_000).toISOString())}`);
    expect(before).toEqual([]);
  });

  it('When the update is read, then it keeps the record before and after the change', async () => {
    const [update] = await eventsOf(`productLineId=${line.id}&action=product_line.update`);
    expect(update!.before.name).toBe(line.name);
    expect(update!.after.name).toBe(renamedTo);
  });

  it.each([
    ['from=yesterday-ish', 'from'],
    ['from=2025-02-01T00:00:00Z&to=2025-01-01T00:00:00Z', 'to'],
    ['productLineId=abc', 'productLineId'],
    ['format=xml', 'format'],
  ])('When the query is %s, then 400 names %s', async (query, field) => {
    const r = await auditor.get(`/api/audit-events?${query}`);
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty(field);
  });
});

describe('GET /api/audit-events?format=csv', () => {
  async function csv(query: string): Promise<{ text: string; rows: string[][]; headers: Headers }> {
    const r = await auditor.request('GET', `/api/audit-events?format=csv&${query}`, undefined, { headers: { accept: 'text/csv' } });
    expect(r.status).toBe(200);
    const text = r.body as string;
    return { text, rows: parse(text, { relax_column_count: false }) as string[][], headers: r.headers };
  }

  it('When exported, then it is a CSV attachment with one header row and the filtered events, newest first', async () => {
    const { rows, headers } = await csv(`productLineId=${line.id}`);
    expect(headers.get('content-type')).toMatch(/^text\/csv; charset=utf-8/);
    expect(headers.get('content-disposition')).toMatch(/^attachment; filename="?audit-trail-\d{8}-\d{4}\.csv"?$/);
    expect(rows[0]).toEqual(['Event', 'Time (UTC)', 'Actor e-mail', 'Action', 'Entity', 'Product line (current name)', 'Before', 'After', 'Hash']);
    const json = await eventsOf(`productLineId=${line.id}`);
    expect(rows.slice(1).map((r) => Number(r[0]))).toEqual(json.map((e) => e.id));
    const [update, create] = rows.slice(1);
    expect(update!.slice(1, 5)).toEqual([json[0]!.occurredAt, 'systems@example.com', 'product_line.update', `product_line ${line.id}`]);
    expect(update![8]).toBe(json[0]!.hash);
    expect(create![6]).toBe(''); // nothing before a creation
  });

  it('When a cell starts with = + - @, then it is written with a leading single quote; JSON cells are quoted and read back whole', async () => {
    const { text, rows } = await csv(`productLineId=${line.id}`);
    const [update, create] = rows.slice(1);
    // The product line column holds today's name ("+..."), which a spreadsheet would run.
    expect(update![5]).toBe(`'${renamedTo}`);
    expect(create![5]).toBe(`'${renamedTo}`);
    // Before and after are the stored JSON: quoted cells, quotes doubled, parsed back to the same record.
    expect(JSON.parse(create![7]!).name).toBe(line.name);
    expect(JSON.parse(create![7]!).description).toBe('@SUM(1+1) in a description');
    expect(JSON.parse(update![6]!).name).toBe(line.name);
    expect(text).toContain(`""name"":""${FORMULA}`);
    // No cell reaches a spreadsheet starting with a formula character.
    for (const row of rows) for (const cell of row) expect(cell).not.toMatch(/^[=+\-@\t\r]/);
  });

  it('When a product line is named with a formula, then its name cell is defused', async () => {
    const name = `${FORMULA} ${uniqueName('kept')}`;
    const other = await systems.post('/api/product-lines', { name, description: '' });
    expect(other.status).toBe(201);
    const { rows } = await csv(`productLineId=${other.body.id}`);
    expect(rows).toHaveLength(2);
    expect(rows[1]![5]).toBe(`'${name}`);
    expect(JSON.parse(rows[1]![7]!).name).toBe(name);
  });

  it('When filtered by action, then only that action is exported, and limit/offset do not cut the export', async () => {
    const { rows } = await csv(`action=product_line.create&productLineId=${line.id}&limit=1&offset=5`);
    expect(rows.slice(1).map((r) => r[3])).toEqual(['product_line.create']);
  });

  it('When nothing matches, then the export is the header row alone', async () => {
    const { text, rows } = await csv(`productLineId=${line.id}&action=no.such.action`);
    expect(rows).toHaveLength(1);
    expect(text.endsWith('\r\n')).toBe(true);
  });
});

describe('GET /api/audit-events/facets', () => {
  it('When read, then it lists the actions, entity types, actors and product lines the trail mentions', async () => {
    const r = await auditor.get('/api/audit-events/facets');
    expect(r.status).toBe(200);
    expect(r.body.actions).toEqual(expect.arrayContaining(['product_line.create', 'product_line.update']));
    expect(r.body.entityTypes).toContain('product_line');
    expect(r.body.actors).toContainEqual({ id: systemsId, email: 'systems@example.com', name: expect.any(String) });
    expect(r.body.productLines).toContainEqual({ id: line.id, name: renamedTo });
    // Each list once per value, sorted.
    expect(new Set(r.body.actions).size).toBe(r.body.actions.length);
    expect(r.body.actions).toEqual([...r.body.actions].sort());
  });
});

describe('GET /api/audit-events/head', () => {
  it('When read, then it names the newest event and its hash', async () => {
    const r = await auditor.get('/api/audit-events/head');
    expect(r.status).toBe(200);
    expect(r.body.lastHash).toMatch(/^[0-9a-f]{64}$/);
    const [update] = await eventsOf(`productLineId=${line.id}&action=product_line.update`);
    expect(r.body.lastId).toBeGreaterThanOrEqual(update!.id);
    // Other writers may have appended meanwhile, so look the head event up among the newest ones.
    const newest = await eventsOf('limit=200');
    const headEvent = newest.find((e) => e.id === r.body.lastId);
    expect(headEvent?.hash).toBe(r.body.lastHash);
  });
});

describe('who may read the audit trail', () => {
  const PATHS = ['/api/audit-events', '/api/audit-events?format=csv', '/api/audit-events/facets', '/api/audit-events/head', '/api/audit-events/verify'];

  it.each(PATHS)('When an auditor or an admin reads %s, then 200', async (path) => {
    expect((await auditor.get(path)).status).toBe(200);
    expect((await admin.get(path)).status).toBe(200);
  });

  it.each(['systems_engineer', 'controls_engineer'] as const)('When a %s reads any of them, then 403', async (role) => {
    const c = await signedIn(url, role);
    for (const path of PATHS) {
      const r = await c.get(path);
      expect(r.status, path).toBe(403);
      expect(r.body.error.code).toBe('forbidden');
    }
  });

  it('When signed out, then 401 for each', async () => {
    const c = new TestClient(url);
    for (const path of PATHS) expect((await c.get(path)).status, path).toBe(401);
  });
});
