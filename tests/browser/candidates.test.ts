// Candidates, uploads, assessments and coverage in a real browser: a controls engineer uploads
// a CSV with one good and one bad row, reads the per-row report, opens the new candidate,
// assesses it and reads the assessment (both plots, the checks, the verdict, the caution);
// an auditor sees the same pages with no write control at all. Axe scans each main page.
import AxeBuilder from '@axe-core/playwright';
import { type APIRequestContext, type Page, request as playwrightRequest } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { DEMO_ACCOUNTS, DEMO_PASSWORD, type DemoRole, startApp, stopApp } from '../helpers/app.js';
import { launchBrowser, screenshot, signIn } from '../helpers/browser.js';

let baseUrl: string;
let browser: Awaited<ReturnType<typeof launchBrowser>>;

// A product line of the test's own, with one approved revision, so the test depends on no demo row.
const stamp = Date.now().toString(36);
const lineName = `Browser test line ${stamp}`;
let lineId: number;
let revisionId: number;

async function apiAs(role: DemoRole): Promise<{ request: APIRequestContext; csrf: string }> {
  // A request context of its own: the browser pages keep their own sessions.
  const request = await playwrightRequest.newContext({ baseURL: baseUrl });
  const res = await request.post('/api/auth/login', { data: { email: DEMO_ACCOUNTS[role], password: DEMO_PASSWORD } });
  expect(res.status()).toBe(200);
  const body = (await res.json()) as { csrfToken: string };
  return { request, csrf: body.csrfToken };
}

async function postJson(api: { request: APIRequestContext; csrf: string }, path: string, data: unknown): Promise<Record<string, unknown>> {
  const res = await api.request.post(path, { data, headers: { 'x-csrf-token': api.csrf } });
  const body = (await res.json()) as Record<string, unknown>;
  expect(res.ok(), `${path}: ${JSON.stringify(body)}`).toBe(true);
  return body;
}

// Serious or critical findings only; the rule ids make a failure readable.
async function expectNoSeriousAxeViolations(page: Page, name: string): Promise<void> {
  const result = await new AxeBuilder({ page }).analyze();
  const bad = result.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  expect(bad.map((v) => `${name}: ${v.id} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`)).toEqual([]);
}

// The upload format of apps/api/docs/candidate-upload-format.md: header line, then one candidate
// per line; `-24±32j` is the conjugate pair written once. The second row's lone complex pole has
// no conjugate, which the format refuses (complex poles come in conjugate pairs).
const UPLOAD_CSV = [
  'name,notes,gain,poles,zeros,numerator,denominator',
  `Upload good ${stamp},"second-order, unit DC gain",1600,-24±32j,,,`,
  `Upload bad ${stamp},lone complex pole,1,-3+4j,,,`,
  '',
].join('\n');

beforeAll(async () => {
  baseUrl = await startApp();
  browser = await launchBrowser();

  const systems = await apiAs('systems_engineer');
  const line = await postJson(systems, '/api/product-lines', { name: lineName, description: 'Made by the candidates browser test.' });
  lineId = line.id as number;
  const set = await postJson(systems, `/api/product-lines/${lineId}/requirement-sets`, { name: 'Step limits', purpose: 'browser test' });
  const revision = await postJson(systems, `/api/requirement-sets/${set.id as number}/revisions`, {
    requirements: { maxOvershootPct: 15, maxSettlingTime: 0.5, settlingBandPct: 2 },
    rationale: 'browser test',
  });
  revisionId = revision.id as number;
  await postJson(systems, `/api/revisions/${revisionId}/submit`, {});
  await systems.request.dispose();
  // Approved by someone other than the author, as the API requires.
  const admin = await apiAs('admin');
  await postJson(admin, `/api/revisions/${revisionId}/approve`, { password: DEMO_PASSWORD, impactAcknowledged: true });
  await admin.request.dispose();
});

afterAll(async () => {
  await browser?.close();
  await stopApp();
});

describe('candidates, uploads and assessments', () => {
  let candidateId: number;
  let assessmentId: number;

  it('a controls engineer uploads a CSV with a good and a bad row and reads the per-row report', async () => {
    const page = await browser.context.newPage();
    await signIn(page, baseUrl, 'controls_engineer');
    await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));

    await page.goto(`${baseUrl}/candidates`);
    await page.getByRole('link', { name: lineName, exact: true }).click();
    await page.waitForURL(`**/product-lines/${lineId}/candidates`);
    await expect.poll(() => page.getByText('No candidate for this product line yet').isVisible()).toBe(true);
    await screenshot(page, 'candidates-01-empty-line');

    await page.getByRole('link', { name: 'Upload a file' }).click();
    await page.getByLabel('Candidates file (JSON or CSV)').setInputFiles({ name: 'two-rows.csv', mimeType: 'text/csv', buffer: Buffer.from(UPLOAD_CSV, 'utf8') });
    await page.getByRole('button', { name: 'Upload' }).click();

    const report = page.locator('[data-upload-report]');
    await report.waitFor();
    await expect.poll(() => report.getByText('1 saved, 1 refused').isVisible()).toBe(true);
    const accepted = report.locator('[data-row-outcome="accepted"]');
    const rejected = report.locator('[data-row-outcome="rejected"]');
    expect(await accepted.count()).toBe(1);
    expect(await rejected.count()).toBe(1);
    expect(await accepted.innerText()).toContain(`Upload good ${stamp}`);
    const rejectedText = await rejected.innerText();
    expect(rejectedText).toContain(`Upload bad ${stamp}`);
    // The reason names the column it is about and says why.
    expect(rejectedText).toContain('poles');
    expect(rejectedText.toLowerCase()).toContain('conjugate');
    await screenshot(page, 'candidates-02-upload-report');

    await accepted.getByRole('link', { name: `Upload good ${stamp}` }).click();
    await page.waitForURL(/\/candidates\/\d+$/);
    candidateId = Number(new URL(page.url()).pathname.split('/').pop());
    await page.getByRole('heading', { name: 'Closed-loop model' }).waitFor();
    expect(await page.getByText('-24 + 32j').isVisible()).toBe(true);
    expect(await page.getByText('-24 - 32j').isVisible()).toBe(true);
    expect(await page.getByText('This candidate has not been assessed yet.').isVisible()).toBe(true);
    await screenshot(page, 'candidates-03-candidate');
    await expectNoSeriousAxeViolations(page, 'candidate page');

    await page.getByRole('button', { name: 'Assess' }).click();
    await page.waitForURL(/\/assessments\/\d+$/);
    assessmentId = Number(new URL(page.url()).pathname.split('/').pop());

    // The verdict on screen is the one the API stored for this assessment.
    const stored = await (await page.request.get(`${baseUrl}/api/assessments/${assessmentId}`)).json();
    const word = stored.result.verdict === 'compliant' ? 'Compliant' : 'Not compliant';
    const badge = page.locator('[data-verdict]').first();
    await badge.waitFor();
    expect((await badge.innerText()).trim()).toContain(word);
    expect(stored.candidateId).toBe(candidateId);
    expect(stored.revisionId).toBe(revisionId);

    // Both plots drawn: the step response's curve and the s-plane's region and pole marks.
    const stepCurve = page.locator('[data-plot="step-response"] path[data-series="response"]');
    await stepCurve.waitFor();
    expect((await stepCurve.getAttribute('d'))?.length ?? 0).toBeGreaterThan(20);
    expect(await page.locator('[data-plot="step-response"] [data-guide="settling-band"]').count()).toBe(1);
    expect(await page.locator('[data-plot="step-response"] [data-guide="ceiling"]').count()).toBe(1);
    expect(await page.locator('[data-plot="step-response"] [data-guide="settling"]').count()).toBe(1);
    const poles = page.locator('[data-testid="splane-poles"]');
    await poles.waitFor();
    expect((await poles.getAttribute('d'))?.length ?? 0).toBeGreaterThan(5);
    expect(await page.locator('[data-testid="splane-region"]').count()).toBeGreaterThan(0);

    // The checks table has one row per limit, with a status word each.
    const table = page.locator('[data-checks-table]');
    expect(await table.locator('[data-check="maxOvershootPct"]').count()).toBe(1);
    expect(await table.locator('[data-check="maxSettlingTime"]').count()).toBe(1);
    const statuses = await table.locator('[data-status]').allInnerTexts();
    expect(statuses.length).toBe(2);
    for (const s of statuses) expect(['Pass', 'Fail', 'Not applicable']).toContain(s.trim());

    expect(await page.getByText('A compliant model is not a safety case').isVisible()).toBe(true);
    expect(await page.getByText(stored.revisionSha256).isVisible()).toBe(true);
    await screenshot(page, 'candidates-04-assessment');
    await expectNoSeriousAxeViolations(page, 'assessment page');

    await page.goto(`${baseUrl}/product-lines/${lineId}/candidates`);
    await page.getByRole('link', { name: `Upload good ${stamp}` }).waitFor();
    await screenshot(page, 'candidates-05-line-after');
    await expectNoSeriousAxeViolations(page, 'candidates page');

    await page.goto(`${baseUrl}/product-lines/${lineId}/coverage`);
    await page.locator('[data-coverage-table]').waitFor();
    expect(await page.locator('[data-coverage-table] tbody tr').count()).toBe(1);
    await screenshot(page, 'candidates-06-coverage');
    await expectNoSeriousAxeViolations(page, 'coverage page');
    await page.close();
  });

  it('an auditor sees the candidate and the assessment with no write control', async () => {
    const { context, close } = await launchBrowser();
    try {
      const page = await context.newPage();
      await signIn(page, baseUrl, 'auditor');
      await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));

      await page.goto(`${baseUrl}/product-lines/${lineId}/candidates`);
      await page.getByRole('link', { name: `Upload good ${stamp}` }).waitFor();
      expect(await page.getByRole('link', { name: 'Enter a candidate' }).count()).toBe(0);
      expect(await page.getByRole('link', { name: 'Upload a file' }).count()).toBe(0);

      await page.goto(`${baseUrl}/candidates/${candidateId}`);
      await page.getByRole('heading', { name: 'Closed-loop model' }).waitFor();
      await page.getByRole('link', { name: /Open assessment/ }).first().waitFor();
      expect(await page.getByRole('button', { name: 'Assess' }).count()).toBe(0);
      expect(await page.getByRole('button').filter({ hasText: /assess|save|upload/i }).count()).toBe(0);
      await screenshot(page, 'candidates-07-auditor-candidate');

      await page.goto(`${baseUrl}/assessments/${assessmentId}`);
      await page.locator('[data-checks-table]').waitFor();
      expect(await page.getByRole('button', { name: 'Issue compliance report' }).count()).toBe(0);
      expect(await page.getByText('A compliant model is not a safety case').isVisible()).toBe(true);
      await screenshot(page, 'candidates-08-auditor-assessment');
    } finally {
      await close();
    }
  });
});
