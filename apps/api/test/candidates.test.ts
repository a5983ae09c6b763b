import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes, Transaction } from 'sequelize';

import { TestClient, signedIn } from './helpers/client.js';
import { startDatabase, stopDatabase } from './helpers/db-control.js';
import { startTestServer, stopTestServer } from './helpers/server.js';
import { newCandidate, newLine, thirdOrder, uniqueName, type Team } from './helpers/workflow.js';

let url: string;
let sequelize: Awaited<ReturnType<typeof startTestServer>>['sequelize'];
let team: Team;
beforeAll(async () => {
  const running = await startTestServer();
  url = running.url;
  sequelize = running.sequelize;
  team = {
    admin: await signedIn(url, 'admin'),
    systems: await signedIn(url, 'systems_engineer'),
    controls: await signedIn(url, 'controls_engineer'),
    auditor: await signedIn(url, 'auditor'),
  };
});
afterAll(async () => {
  await startDatabase();
  await stopTestServer();
});

const GOOD = thirdOrder(-3, 4, -40);

function fileForm(content: string, filename: string, type = 'application/octet-stream'): FormData {
  const form = new FormData();
  form.append('file', new Blob([content], { type }), filename);
  return form;
}

async function namesInLine(lineId: number): Promise<string[]> {
  const r = await team.auditor.get(`/api/product-lines/${lineId}/candidates?limit=500`);
  return r.body.items.map((c: { name: string }) => c.name);
}

describe('POST /api/product-lines/:id/candidates (JSON body)', () => {
  it('When a controls engineer enters a design, then 201 with the design as submitted, readable back and audited', async () => {
    const line = await newLine(team);
    const name = uniqueName('Servo PID');
    const r = await team.controls.post(`/api/product-lines/${line.id}/candidates`, { name, notes: 'first try', design: GOOD });
    expect(r.status).toBe(201);
    expect(r.body).toMatchObject({ name, notes: 'first try', design: GOOD, productLineId: line.id, latest: [] });
    expect(r.body.createdBy.email).toBe('controls@example.com');
    const back = await team.auditor.get(`/api/candidates/${r.body.id}`);
    expect(back.body).toEqual(r.body);
    const audit = await team.admin.get(`/api/audit-events?entityType=candidate&entityId=${r.body.id}`);
    expect(audit.body.items[0]).toMatchObject({ action: 'candidate.create', before: null });
  });

  it('When a pole has no number for im, then 400 names design.poles[1].im', async () => {
    const line = await newLine(team);
    const design = { poles: [{ re: -3, im: 4 }, { re: -3, im: 'four' }], gain: 25 };
    const r = await team.controls.post(`/api/product-lines/${line.id}/candidates`, { name: 'x', design });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty(['design.poles[1].im']);
  });

  it('When the name is missing or the design absent, then 400 names each', async () => {
    const line = await newLine(team);
    const noName = await team.controls.post(`/api/product-lines/${line.id}/candidates`, { design: GOOD });
    expect(noName.status).toBe(400);
    expect(noName.body.error.fields).toHaveProperty('name');
    const noDesign = await team.controls.post(`/api/product-lines/${line.id}/candidates`, { name: 'x' });
    expect(noDesign.status).toBe(400);
    expect(noDesign.body.error.fields).toHaveProperty('design');
  });

  it.each(['systems_engineer', 'auditor'] as const)('When a %s enters a candidate, then 403 and none is saved', async (role) => {
    const line = await newLine(team);
    const c = role === 'auditor' ? team.auditor : team.systems;
    expect((await c.post(`/api/product-lines/${line.id}/candidates`, { name: 'x', design: GOOD })).status).toBe(403);
    expect(await namesInLine(line.id)).toEqual([]);
  });

  it('When the line does not exist, then 404; signed out, 401', async () => {
    expect((await team.controls.post('/api/product-lines/999999/candidates', { name: 'x', design: GOOD })).status).toBe(404);
    expect((await new TestClient(url).get('/api/product-lines/1/candidates')).status).toBe(401);
  });
});

describe('POST /api/product-lines/:id/candidates (file upload)', () => {
  it('When a JSON file mixes good and bad candidates, then the good ones are saved and each bad one is reported with its row and field', async () => {
    const line = await newLine(team);
    const a = uniqueName('Upload A');
    const b = uniqueName('Upload B');
    const file = JSON.stringify({
      candidates: [
        { name: a, design: GOOD },
        { name: 'Broken', design: { poles: [{ re: -1, im: 2 }], gain: 5 } },
        { name: b, notes: 'coefficients', design: { numerator: [1000], denominator: [1, 46, 265, 1000] } },
        { design: GOOD },
      ],
    });
    const r = await team.controls.request('POST', `/api/product-lines/${line.id}/candidates`, fileForm(file, 'whatever.txt'));
    expect(r.status).toBe(201);
    expect(r.body.accepted.map((x: { row: number; name: string }) => [x.row, x.name])).toEqual([[1, a], [3, b]]);
    expect(r.body.rejected).toHaveLength(2);
    expect(r.body.rejected[0]).toMatchObject({ row: 2, name: 'Broken' });
    expect(Object.keys(r.body.rejected[0].errors)).toEqual(['design.poles[0]']);
    expect(r.body.rejected[1]).toMatchObject({ row: 4, name: null });
    expect(r.body.rejected[1].errors).toHaveProperty('name');
    expect((await namesInLine(line.id)).sort()).toEqual([a, b].sort());
    const saved = await team.auditor.get(`/api/candidates/${r.body.accepted[1].candidateId}`);
    expect(saved.body.design).toEqual({ numerator: [1000], denominator: [1, 46, 265, 1000] });
  });

  it('When a CSV file has zpk rows, coefficient rows, conjugate-pair shorthand and bad rows, then the report names row and column of each problem', async () => {
    const line = await newLine(team);
    const [a, b, c] = [uniqueName('CSV A'), uniqueName('CSV B'), uniqueName('CSV C')];
    const csv = [
      'name,notes,gain,poles,zeros,numerator,denominator',
      `${a},"pair written with ±",1000,-3±4j -40,,,`,
      `${b},"pair written with +-; semicolons",1000,-3+-4j;-40,,,`,
      `${c},coefficients,,,,1000,1 46 265 1000`,
      'Bad number,,1000,-3+4x -40,,,',
      'Both forms,,1000,-3±4j -40,,1000,1 46 265 1000',
      'Lonely pole,,25,-3+4j,,,',
      ',no name,1000,-3±4j -40,,,',
    ].join('\n');
    const r = await team.controls.request('POST', `/api/product-lines/${line.id}/candidates`, fileForm(csv, 'candidates.json'));
    expect(r.status).toBe(201);
    expect(r.body.accepted.map((x: { row: number }) => x.row)).toEqual([2, 3, 4]);
    const rejected = Object.fromEntries(r.body.rejected.map((x: { row: number; errors: object }) => [x.row, Object.keys(x.errors)]));
    expect(rejected).toEqual({ 5: ['poles'], 6: ['design'], 7: ['poles'], 8: ['name'] });
    const first = await team.auditor.get(`/api/candidates/${r.body.accepted[0].candidateId}`);
    expect(first.body.design).toEqual({ gain: 1000, poles: [{ re: -3, im: 4 }, { re: -3, im: -4 }, { re: -40, im: 0 }], zeros: [] });
    const second = await team.auditor.get(`/api/candidates/${r.body.accepted[1].candidateId}`);
    expect(second.body.design).toEqual(first.body.design);
  });

  it('When every row is rejected, then 400 with the report and nothing saved', async () => {
    const line = await newLine(team);
    const csv = 'name,gain,poles\nOnly bad,1,-1+2j\n';
    const r = await team.controls.request('POST', `/api/product-lines/${line.id}/candidates`, fileForm(csv, 'c.csv'));
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('upload_rejected');
    expect(r.body.accepted).toEqual([]);
    expect(r.body.rejected[0]).toMatchObject({ row: 2, name: 'Only bad' });
    expect(await namesInLine(line.id)).toEqual([]);
  });

  it('When the header has an unknown column, the JSON is broken, or no file is attached, then 400 names file', async () => {
    const line = await newLine(team);
    for (const content of ['name,colour\nx,teal\n', '{"candidates": [', '   ']) {
      const r = await team.controls.request('POST', `/api/product-lines/${line.id}/candidates`, fileForm(content, 'f.csv'));
      expect(r.status, content).toBe(400);
      expect(r.body.error.fields).toHaveProperty('file');
    }
    const form = new FormData();
    form.append('other', 'x');
    const none = await team.controls.request('POST', `/api/product-lines/${line.id}/candidates`, form);
    expect(none.status).toBe(400);
    expect(none.body.error.fields).toHaveProperty('file');
  });

  it('When the file is larger than 2 MB, then 413', async () => {
    const line = await newLine(team);
    const big = 'name,gain,poles\n' + 'x,1,-1\n'.repeat(350_000);
    const r = await team.controls.request('POST', `/api/product-lines/${line.id}/candidates`, fileForm(big, 'big.csv'));
    expect(r.status).toBe(413);
    expect(await namesInLine(line.id)).toEqual([]);
  });

  it('When an auditor uploads, then 403', async () => {
    const line = await newLine(team);
    const r = await team.auditor.request('POST', `/api/product-lines/${line.id}/candidates`, fileForm(`name,gain,poles\nx,1,-1\n`, 'c.csv'));
    expect(r.status).toBe(403);
  });

  it('When the database stops in the middle of an upload, then 503 and none of the rows is saved', async () => {
    const line = await newLine(team);
    const prefix = uniqueName('Interrupted');
    const rows = Array.from({ length: 3000 }, (_, i) => `${prefix} ${i},,1000,-3±4j -40,,,`);
    const csv = ['name,notes,gain,poles,zeros,numerator,denominator', ...rows].join('\n');
    const pending = team.controls.request('POST', `/api/product-lines/${line.id}/candidates`, fileForm(csv, 'many.csv'));
    // Wait until the upload's transaction has written rows (visible only uncommitted), then pull the plug.
    let seen = 0;
    for (let i = 0; i < 400 && seen === 0; i++) {
      await new Promise((r) => setTimeout(r, 25));
      seen = await sequelize.transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.READ_UNCOMMITTED }, async (t) => {
        const [row] = await sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM candidates WHERE product_line_id = ?', { replacements: [line.id], type: QueryTypes.SELECT, transaction: t });
        return Number(row?.n ?? 0);
      });
    }
    expect(seen).toBeGreaterThan(0);
    let r;
    try {
      await stopDatabase();
      r = await pending;
    } finally {
      await startDatabase();
    }
    expect(r.status).toBe(503);
    expect(r.body.error.code).toBe('db_unavailable');
    let list = await team.auditor.get(`/api/product-lines/${line.id}/candidates`);
    for (let i = 0; i < 40 && list.status !== 200; i++) {
      await new Promise((res) => setTimeout(res, 250));
      list = await team.auditor.get(`/api/product-lines/${line.id}/candidates`);
    }
    expect(list.status).toBe(200);
    expect(list.body.total).toBe(0);
  });
});

describe('GET /api/candidates/upload-example.csv and .json', () => {
  it('When the examples are downloaded and uploaded again, then every row is accepted', async () => {
    const line = await newLine(team);
    const csv = await team.controls.get('/api/candidates/upload-example.csv');
    expect(csv.status).toBe(200);
    expect(csv.headers.get('content-type')).toMatch(/text\/csv/);
    const json = await team.controls.get('/api/candidates/upload-example.json');
    expect(json.status).toBe(200);
    for (const [content, name] of [[csv.body as string, 'example.csv'], [JSON.stringify(json.body), 'example.json']] as const) {
      const r = await team.controls.request('POST', `/api/product-lines/${line.id}/candidates`, fileForm(content, name));
      expect(r.status).toBe(201);
      expect(r.body.rejected).toEqual([]);
      expect(r.body.accepted.length).toBeGreaterThan(1);
    }
  });
});

describe('GET /api/product-lines/:id/candidates', () => {
  it('When listing, then items and total come back newest first, each with its latest verdicts', async () => {
    const line = await newLine(team);
    const first = await newCandidate(team, line.id, GOOD);
    const second = await newCandidate(team, line.id, GOOD);
    const r = await team.auditor.get(`/api/product-lines/${line.id}/candidates?limit=1`);
    expect(r.status).toBe(200);
    expect(r.body.total).toBe(2);
    expect(r.body.items.map((c: { id: number }) => c.id)).toEqual([second.id]);
    expect(r.body.items[0].latest).toEqual([]);
    const next = await team.auditor.get(`/api/product-lines/${line.id}/candidates?limit=1&offset=1`);
    expect(next.body.items[0].id).toBe(first.id);
  });

  it('When the line does not exist, then 404; the candidate does not exist, 404', async () => {
    expect((await team.auditor.get('/api/product-lines/999999/candidates')).status).toBe(404);
    expect((await team.auditor.get('/api/candidates/999999')).status).toBe(404);
  });
});
