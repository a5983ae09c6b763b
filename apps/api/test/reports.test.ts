import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import PDFDocument from 'pdfkit';
import { pdfkitAddPlaceholder } from '@signpdf/placeholder-pdfkit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { createLocalSigner, loadOrCreateBundle } from '../src/components/reports/local-signer.js';
import { signedIn, type TestClient } from './helpers/client.js';
import { startTestServer, stopTestServer } from './helpers/server.js';
import { approved, newCandidate, newLine, newSet, thirdOrder, type Team } from './helpers/workflow.js';

// Signed compliance reports, checked from outside: Debian's pdftotext reads
// the content, Debian's pdfsig (poppler) verifies the PDF signature
// independently (ISO 32000-1 §12.8), and our own verify route must agree.

let url: string;
let team: Team;
let sequelize: Awaited<ReturnType<typeof startTestServer>>['sequelize'];
const tmp = mkdtempSync(path.join(os.tmpdir(), 'polecourt-reports-test-'));

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
  await stopTestServer();
  rmSync(tmp, { recursive: true, force: true });
});

const CAUTION_WORDS = 'is not a safety case';
const LIMITS = { maxOvershootPct: 10, maxSettlingTime: 2 };
// -3 ± 4j with a far pole at -40: zeta = 0.6, about 9.5 % overshoot (Nise ch. 4 relation, from memory), settles near 4/3 s.
const DESIGN = thirdOrder(-3, 4, -40);

async function assessed() {
  const line = await newLine(team);
  const set = await newSet(team, line.id);
  const first = await approved(team, set.id, { maxOvershootPct: 15, maxSettlingTime: 2.5 });
  const revision = await approved(team, set.id, LIMITS);
  const candidate = await newCandidate(team, line.id, DESIGN);
  const a = await team.controls.post(`/api/candidates/${candidate.id}/assessments`, { revisionId: revision.id });
  expect(a.status).toBe(201);
  return { line, set, first, revision, candidate, assessment: a.body };
}

async function download(client: TestClient, id: number): Promise<{ status: number; headers: Headers; body: Buffer }> {
  const res = await fetch(`${url}/api/reports/${id}/pdf`, { headers: { cookie: client.cookieHeader } });
  return { status: res.status, headers: res.headers, body: Buffer.from(await res.arrayBuffer()) };
}

function save(name: string, data: Buffer): string {
  const file = path.join(tmp, name);
  writeFileSync(file, data);
  return file;
}

function pdfText(file: string): string {
  return execFileSync('pdftotext', ['-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
}

function pdfsig(file: string): string {
  // pdfsig exits 0 whether or not the signature is good: read what it says.
  try {
    return execFileSync('pdfsig', [file], { encoding: 'utf8' });
  } catch (err) {
    return String((err as { stdout?: string }).stdout ?? '');
  }
}

function verifyForm(data: Buffer, name = 'report.pdf'): FormData {
  const form = new FormData();
  form.append('file', new Blob([new Uint8Array(data)], { type: 'application/pdf' }), name);
  return form;
}

/** A byte inside the signed range (the page content), away from the signature's /Contents. */
function flipOneByte(pdf: Buffer): Buffer {
  const copy = Buffer.from(pdf);
  const at = copy.indexOf('/Type /Catalog');
  copy[at + 3] = copy[at + 3]! ^ 0x01;
  return copy;
}

let issued: { record: any; pdf: Buffer; file: string; ctx: Awaited<ReturnType<typeof assessed>> } | null = null;
async function issuedReport() {
  if (issued) return issued;
  const ctx = await assessed();
  const r = await team.controls.post(`/api/assessments/${ctx.assessment.id}/reports`, { password: 'polecourt-demo', meaning: 'released' });
  expect(r.status).toBe(201);
  const d = await download(team.auditor, r.body.id);
  expect(d.status).toBe(200);
  issued = { record: r.body, pdf: d.body, file: save('issued.pdf', d.body), ctx };
  return issued;
}

describe('POST /api/assessments/:id/reports', () => {
  it('When a controls engineer signs with the meaning "released", then 201 with the record: number, signer, meaning, UTC time and the file’s SHA-256', async () => {
    const { record, pdf, ctx } = await issuedReport();
    expect(record).toMatchObject({
      assessmentId: ctx.assessment.id,
      meaning: 'released',
      candidateId: ctx.candidate.id,
      productLineId: ctx.line.id,
      revisionId: ctx.revision.id,
      revisionSha256: ctx.revision.sha256,
      signer: { email: 'controls@example.com' },
    });
    expect(record.number).toMatch(/^PCR-\d{4}-\d{6}$/);
    expect(record.signedAt).toMatch(/Z$/);
    expect(record.sha256).toBe(createHash('sha256').update(pdf).digest('hex'));
    expect((await team.auditor.get(`/api/reports/${record.id}`)).body).toEqual(record);
  });

  it('When the PDF is read with pdftotext, then it carries the number, the revision hash, the verdict, the signer, the meaning, the caution and "page n of N" on every page', async () => {
    const { record, file, ctx } = await issuedReport();
    const text = pdfText(file);
    const verdict = ctx.assessment.result.verdict === 'compliant' ? 'Compliant' : 'Not compliant';
    expect(text).toContain(record.number);
    expect(text).toContain(ctx.revision.sha256);
    expect(text).toContain(verdict);
    expect(text).toContain(record.signer.name);
    expect(text).toContain('Released');
    expect(text).toContain('Meaning of the signature');
    expect(text).toContain(CAUTION_WORDS);
    expect(text).toContain('saturation, rate limits, sampling, delays, nonlinear friction and model error');
    expect(text).toContain(record.auditHeadHash);
    const pages = Number(execFileSync('pdfinfo', [file], { encoding: 'utf8' }).match(/Pages:\s+(\d+)/)![1]);
    expect(pages).toBeGreaterThanOrEqual(4);
    for (let n = 1; n <= pages; n++) expect(text).toContain(`page ${n} of ${pages}`);
    // The limit-by-limit diff against the revision it replaced.
    expect(text).toContain(`against revision ${ctx.first.number}`);
    expect(text).toContain('tightened');
  });

  it('When pdfdetach lists the attachments, then the evidence JSON with the design and the requirements is embedded', async () => {
    const { record, file, ctx } = await issuedReport();
    expect(execFileSync('pdfdetach', ['-list', file], { encoding: 'utf8' })).toContain(`${record.number}-evidence.json`);
    const out = path.join(tmp, 'evidence.json');
    execFileSync('pdfdetach', ['-save', '1', '-o', out, file]);
    const evidence = JSON.parse(execFileSync('cat', [out], { encoding: 'utf8' }));
    expect(evidence.candidate.design).toEqual(DESIGN);
    expect(evidence.revision.requirements).toEqual(ctx.revision.requirements);
    expect(evidence.result.verdict).toBe(ctx.assessment.result.verdict);
  });

  it('When pdfsig checks the untouched file, then "Signature is Valid."; with one byte changed, a digest mismatch', async () => {
    const { pdf, file } = await issuedReport();
    expect(pdfsig(file)).toContain('Signature is Valid.');
    expect(pdfsig(save('one-byte.pdf', flipOneByte(pdf)))).toContain('Digest Mismatch');
  });

  it('When the password is wrong, then 400 naming the password field and no report is made', async () => {
    const ctx = await assessed();
    const r = await team.controls.post(`/api/assessments/${ctx.assessment.id}/reports`, { password: 'not-my-password', meaning: 'reviewed' });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('password');
    expect((await team.auditor.get(`/api/candidates/${ctx.candidate.id}/reports`)).body.total).toBe(0);
  });

  it('When the meaning is not one of reviewed or released, then 400 naming the meaning field', async () => {
    const ctx = await assessed();
    const r = await team.controls.post(`/api/assessments/${ctx.assessment.id}/reports`, { password: 'polecourt-demo', meaning: 'approved' });
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('meaning');
  });

  it.each(['auditor', 'systems'] as const)('When the %s tries to sign, then 403', async (who) => {
    const ctx = await assessed();
    const r = await team[who].post(`/api/assessments/${ctx.assessment.id}/reports`, { password: 'polecourt-demo', meaning: 'reviewed' });
    expect(r.status).toBe(403);
  });

  it('When the assessment does not exist, then 404', async () => {
    const r = await team.controls.post('/api/assessments/999999999/reports', { password: 'polecourt-demo', meaning: 'reviewed' });
    expect(r.status).toBe(404);
  });

  it('When a report is issued, then the audit trail records it, and a download is recorded too', async () => {
    const { record } = await issuedReport();
    const issuedEvents = await team.admin.get(`/api/audit-events?entityType=report&entityId=${record.id}&action=report.issue`);
    expect(issuedEvents.body.items).toHaveLength(1);
    expect(issuedEvents.body.items[0].after).toMatchObject({ number: record.number, sha256: record.sha256 });
    expect(issuedEvents.body.items[0].actorEmail).toBe('controls@example.com');
    const downloads = await team.admin.get(`/api/audit-events?entityType=report&entityId=${record.id}&action=report.download`);
    expect(downloads.body.total).toBeGreaterThanOrEqual(1);
  });

  it('When someone edits or deletes a report row directly in the database, then the database refuses', async () => {
    const { record } = await issuedReport();
    await expect(sequelize.query('UPDATE reports SET meaning = ? WHERE id = ?', { replacements: ['reviewed', record.id] })).rejects.toThrow(/report_frozen/);
    await expect(sequelize.query('DELETE FROM reports WHERE id = ?', { replacements: [record.id] })).rejects.toThrow(/report_frozen/);
  });
});

describe('GET /api/reports/:id/pdf and the lists', () => {
  it('When an auditor downloads, then application/pdf as an attachment named by the report number', async () => {
    const { record } = await issuedReport();
    const d = await download(team.auditor, record.id);
    expect(d.headers.get('content-type')).toBe('application/pdf');
    expect(d.headers.get('content-disposition')).toBe(`attachment; filename="${record.number}.pdf"`);
    expect(d.body.subarray(0, 5).toString()).toBe('%PDF-');
  });

  it('When listing by product line and by candidate, then the report is there', async () => {
    const { record, ctx } = await issuedReport();
    const byLine = await team.auditor.get(`/api/product-lines/${ctx.line.id}/reports`);
    expect(byLine.body).toMatchObject({ total: 1, items: [{ id: record.id, number: record.number }] });
    const byCandidate = await team.auditor.get(`/api/candidates/${ctx.candidate.id}/reports`);
    expect(byCandidate.body.items.map((x: { id: number }) => x.id)).toEqual([record.id]);
  });

  it('When the report or its list owner does not exist, then 404', async () => {
    expect((await team.auditor.get('/api/reports/999999999')).status).toBe(404);
    expect((await team.auditor.get('/api/reports/999999999/pdf')).status).toBe(404);
    expect((await team.auditor.get('/api/product-lines/999999999/reports')).status).toBe(404);
    expect((await team.auditor.get('/api/candidates/999999999/reports')).status).toBe(404);
  });
});

describe('POST /api/reports/verify', () => {
  it('When the untouched file is uploaded, then valid: intact, issued here, the record, and the recomputed numbers agree', async () => {
    const { record, pdf, ctx } = await issuedReport();
    const r = await team.auditor.post('/api/reports/verify', verifyForm(pdf));
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ valid: true, intact: true, issuedHere: true, report: { id: record.id, number: record.number, meaning: 'released' } });
    expect(r.body.signature).toMatchObject({ present: true, digestMatches: true, signatureMatches: true, signedByPolecourt: true, coversWholeFile: true });
    expect(r.body.recomputed).toMatchObject({ available: true, agrees: true, sameEngine: true, verdictThen: ctx.assessment.result.verdict, verdictNow: ctx.assessment.result.verdict });
  });

  it('When one byte is changed, then not intact and not issued here, as a 200 answer', async () => {
    const { pdf } = await issuedReport();
    const r = await team.auditor.post('/api/reports/verify', verifyForm(flipOneByte(pdf)));
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ valid: false, intact: false, issuedHere: false, report: null });
    expect(r.body.signature.digestMatches).toBe(false);
  });

  it('When the file is cut short, then not intact, never a 500', async () => {
    const { pdf } = await issuedReport();
    const r = await team.controls.post('/api/reports/verify', verifyForm(pdf.subarray(0, Math.floor(pdf.length * 0.6))));
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ valid: false, intact: false, issuedHere: false });
  });

  it('When bytes are appended after signing, then not intact (the signature no longer covers the whole file)', async () => {
    const { pdf } = await issuedReport();
    const r = await team.auditor.post('/api/reports/verify', verifyForm(Buffer.concat([pdf, Buffer.from('\n% appended\n')])));
    expect(r.body).toMatchObject({ valid: false, intact: false, issuedHere: false });
    expect(r.body.signature).toMatchObject({ digestMatches: true, coversWholeFile: false });
  });

  it('When a foreign PDF is uploaded (unsigned, or signed with another certificate), then not intact and not issued here', async () => {
    const plain = new PDFDocument();
    const chunks: Buffer[] = [];
    plain.on('data', (c: Buffer) => chunks.push(c));
    const ended = new Promise((resolve) => plain.on('end', resolve));
    plain.text('A report from somewhere else.');
    plain.end();
    await ended;
    const unsigned = await team.auditor.post('/api/reports/verify', verifyForm(Buffer.concat(chunks)));
    expect(unsigned.status).toBe(200);
    expect(unsigned.body).toMatchObject({ valid: false, intact: false, issuedHere: false, report: null, signature: { present: false }, recomputed: { available: false } });

    // Signed properly, but by a certificate Polecourt never signed with.
    const other = createLocalSigner(loadOrCreateBundle({ dir: path.join(tmp, 'other-signer') }));
    const doc = new PDFDocument({ autoFirstPage: true });
    const parts: Buffer[] = [];
    doc.on('data', (c: Buffer) => parts.push(c));
    const done = new Promise((resolve) => doc.on('end', resolve));
    doc.text('Looks like a report.');
    pdfkitAddPlaceholder({ pdf: doc, pdfBuffer: Buffer.alloc(0), reason: 'test', contactInfo: '', name: 'Someone', location: 'Elsewhere' });
    doc.end();
    await done;
    const signed = await other.sign(Buffer.concat(parts));
    expect(pdfsig(save('foreign.pdf', signed))).toContain('Signature is Valid.');
    const r = await team.auditor.post('/api/reports/verify', verifyForm(signed));
    expect(r.body).toMatchObject({ valid: false, intact: false, issuedHere: false });
    expect(r.body.signature).toMatchObject({ present: true, digestMatches: true, signatureMatches: true, signedByPolecourt: false });
  });

  it('When the file is not a PDF at all (whatever its name), then 400 naming the file field', async () => {
    const r = await team.auditor.post('/api/reports/verify', verifyForm(Buffer.from('just some text, not a PDF'), 'report.pdf'));
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('file');
  });

  it('When no file is attached, then 400; when the file is over 10 MB, then 413', async () => {
    const none = await team.auditor.post('/api/reports/verify', new FormData());
    expect(none.status).toBe(400);
    const big = Buffer.alloc(10 * 1024 * 1024 + 1, 0x20);
    big.write('%PDF-1.7\n');
    const r = await team.auditor.post('/api/reports/verify', verifyForm(big));
    expect(r.status).toBe(413);
  });

  it('When signed out, then 401', async () => {
    const { pdf } = await issuedReport();
    const res = await fetch(`${url}/api/reports/verify`, { method: 'POST', body: verifyForm(pdf) });
    expect(res.status).toBe(401);
  });
});
