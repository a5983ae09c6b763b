import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { TestClient, signedIn } from './helpers/client.js';
import { startTestServer, stopTestServer } from './helpers/server.js';
import { newCandidate, newLine, newSet, thirdOrder, uniqueName, type Team } from './helpers/workflow.js';

let url: string;
let team: Team;
beforeAll(async () => {
  url = (await startTestServer()).url;
  team = {
    admin: await signedIn(url, 'admin'),
    systems: await signedIn(url, 'systems_engineer'),
    controls: await signedIn(url, 'controls_engineer'),
    auditor: await signedIn(url, 'auditor'),
  };
});
afterAll(stopTestServer);

describe('POST /api/product-lines', () => {
  it('When a systems engineer creates a line, then 201, it can be read back and an audit event records it', async () => {
    const name = uniqueName('Servo line');
    const r = await team.systems.post('/api/product-lines', { name, description: 'Linear servo actuators' });
    expect(r.status).toBe(201);
    expect(r.body).toMatchObject({ name, description: 'Linear servo actuators', requirementSetCount: 0, candidateCount: 0 });
    const back = await team.auditor.get(`/api/product-lines/${r.body.id}`);
    expect(back.status).toBe(200);
    expect(back.body.name).toBe(name);
    const audit = await team.admin.get(`/api/audit-events?entityType=product_line&entityId=${r.body.id}`);
    expect(audit.body.items[0]).toMatchObject({ action: 'product_line.create', before: null });
    expect(audit.body.items[0].after.name).toBe(name);
  });

  it('When the name is missing, then 400 names the field', async () => {
    const r = await team.systems.post('/api/product-lines', { description: 'x' });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('name');
  });

  it('When the name is taken, then 409 name_taken', async () => {
    const line = await newLine(team);
    const r = await team.admin.post('/api/product-lines', { name: line.name, description: '' });
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('name_taken');
  });

  it('When two people create a line of the same name at once, then one gets 201 and the other 409, never 500', async () => {
    const name = uniqueName('Raced line');
    const replies = await Promise.all([team.systems.post('/api/product-lines', { name, description: '' }), team.admin.post('/api/product-lines', { name, description: '' })]);
    expect(replies.map((r) => r.status).sort()).toEqual([201, 409]);
  });

  it.each(['controls_engineer', 'auditor'] as const)('When a %s creates a line, then 403 and none is made', async (role) => {
    const c = role === 'auditor' ? team.auditor : team.controls;
    const name = uniqueName('Forbidden line');
    const r = await c.post('/api/product-lines', { name, description: '' });
    expect(r.status).toBe(403);
    const list = await team.admin.get('/api/product-lines?limit=500');
    expect(list.body.items.map((p: { name: string }) => p.name)).not.toContain(name);
  });

  it('When signed out, then 401', async () => {
    expect((await new TestClient(url).post('/api/product-lines', { name: 'x' })).status).toBe(401);
    expect((await new TestClient(url).get('/api/product-lines')).status).toBe(401);
  });
});

describe('GET /api/product-lines', () => {
  it('When listing, then items carry counts of requirement sets and candidates', async () => {
    const line = await newLine(team);
    await newSet(team, line.id);
    await newCandidate(team, line.id, thirdOrder(-3, 4, -40));
    await newCandidate(team, line.id, thirdOrder(-3, 4, -40));
    const r = await team.auditor.get('/api/product-lines?limit=500');
    expect(r.status).toBe(200);
    expect(r.body.total).toBeGreaterThanOrEqual(4);
    const item = r.body.items.find((p: { id: number }) => p.id === line.id);
    expect(item).toMatchObject({ requirementSetCount: 1, candidateCount: 2 });
  });

  it('When the demo is seeded, then its three lines are there', async () => {
    const r = await team.controls.get('/api/product-lines?limit=500');
    const names = r.body.items.map((p: { name: string }) => p.name);
    expect(names).toEqual(expect.arrayContaining(['TG-4 gimbal pitch axis', 'VP-20 valve positioner', 'SD-7 spindle drive']));
  });
});

describe('GET /api/product-lines/:id', () => {
  it('When the line does not exist, then 404', async () => {
    expect((await team.auditor.get('/api/product-lines/999999')).status).toBe(404);
    expect((await team.auditor.get('/api/product-lines/abc')).status).toBe(404);
  });
});

describe('PATCH /api/product-lines/:id', () => {
  it('When the name alone changes, then the description stays and the audit event has before and after', async () => {
    const line = await newLine(team);
    const name = uniqueName('Renamed line');
    const r = await team.admin.patch(`/api/product-lines/${line.id}`, { name });
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ name, description: 'made by a test' });
    const audit = await team.admin.get(`/api/audit-events?entityType=product_line&entityId=${line.id}&action=product_line.update`);
    expect(audit.body.items[0].before.name).toBe(line.name);
    expect(audit.body.items[0].after.name).toBe(name);
  });

  it('When the body is empty or has an unknown field, then 400', async () => {
    const line = await newLine(team);
    expect((await team.systems.patch(`/api/product-lines/${line.id}`, {})).status).toBe(400);
    const r = await team.systems.patch(`/api/product-lines/${line.id}`, { colour: 'teal' });
    expect(r.status).toBe(400);
  });

  it.each(['controls_engineer', 'auditor'] as const)('When a %s renames a line, then 403 and the name stays', async (role) => {
    const line = await newLine(team);
    const c = role === 'auditor' ? team.auditor : team.controls;
    expect((await c.patch(`/api/product-lines/${line.id}`, { name: uniqueName('No') })).status).toBe(403);
    expect((await c.get(`/api/product-lines/${line.id}`)).body.name).toBe(line.name);
  });

  it('When the line does not exist, then 404', async () => {
    expect((await team.systems.patch('/api/product-lines/999999', { name: 'x' })).status).toBe(404);
  });
});
