// Requirement sets in a real browser: a systems engineer starts a new revision from the one in
// force, types a limit and watches the live s-plane preview change, saves the draft (a stale
// save from a second tab keeps what was typed), and submits it; the administrator opens it,
// reads the revision impact, acknowledges it, signs with a wrong and then the right password;
// the revision shows approved with its SHA-256. An auditor sees these pages with no write
// control at all. Axe scans the product line, requirement set and revision pages.
import AxeBuilder from '@axe-core/playwright';
import { type APIRequestContext, type Page, request as playwrightRequest } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { DEMO_ACCOUNTS, DEMO_PASSWORD, type DemoRole, startApp, stopApp } from '../helpers/app.js';
import { launchBrowser, screenshot, signIn } from '../helpers/browser.js';

let baseUrl: string;
let browser: Awaited<ReturnType<typeof launchBrowser>>;

// The test's own product line, with revision 1 approved and one candidate, so it depends on no demo row.
const stamp = Date.now().toString(36);
const lineName = `Revision workflow browser line ${stamp}`;
const setName = 'Position step';
let lineId: number;
let setId: number;
let firstRevisionId: number;
let draftUrl = '';

async function apiAs(role: DemoRole): Promise<{ request: APIRequestContext; csrf: string }> {
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

async function expectNoSeriousAxeViolations(page: Page, name: string): Promise<void> {
  const result = await new AxeBuilder({ page }).analyze();
  const bad = result.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  expect(bad.map((v) => `${name}: ${v.id} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`)).toEqual([]);
}

async function newPage(role: DemoRole): Promise<Page> {
  const page = await browser.context.newPage();
  await browser.context.clearCookies();
  await signIn(page, baseUrl, role);
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
  return page;
}

const regionPath = (page: Page) => page.getByTestId('splane-region').first().getAttribute('d');

beforeAll(async () => {
  baseUrl = await startApp();
  browser = await launchBrowser();

  const systems = await apiAs('systems_engineer');
  const line = await postJson(systems, '/api/product-lines', { name: lineName, description: 'Made by the requirement-sets browser test.' });
  lineId = line.id as number;
  const set = await postJson(systems, `/api/product-lines/${lineId}/requirement-sets`, { name: setName, purpose: 'browser test' });
  setId = set.id as number;
  const revision = await postJson(systems, `/api/requirement-sets/${setId}/revisions`, {
    requirements: { maxOvershootPct: 20, maxSettlingTime: 3, settlingBandPct: 2 },
    rationale: 'browser test baseline',
  });
  firstRevisionId = revision.id as number;
  await postJson(systems, `/api/revisions/${firstRevisionId}/submit`, {});
  await systems.request.dispose();
  const admin = await apiAs('admin');
  await postJson(admin, `/api/revisions/${firstRevisionId}/approve`, { password: DEMO_PASSWORD, impactAcknowledged: true });
  await admin.request.dispose();
  // A second-order loop with zeta = 0.5 (16.3 % overshoot, from the standard formula
  // exp(-zeta pi / sqrt(1 - zeta^2))): inside a 20 % limit, outside a 10 % one, so the
  // draft below changes its verdict.
  const controls = await apiAs('controls_engineer');
  await postJson(controls, `/api/product-lines/${lineId}/candidates`, {
    name: `Half-damped loop ${stamp}`,
    notes: 'browser test',
    design: { poles: [{ re: -2, im: 3.4641016 }, { re: -2, im: -3.4641016 }], zeros: [], gain: 16 },
  });
  await controls.request.dispose();
});

afterAll(async () => {
  await browser?.close();
  await stopApp();
});

describe('requirement sets, revisions and approval', () => {
  it('lets a systems engineer write a draft with a live preview, survive a stale save and submit it', async () => {
    const page = await newPage('systems_engineer');
    await page.goto(`${baseUrl}/product-lines/${lineId}`);
    await page.getByRole('link', { name: setName }).click();
    await page.getByRole('heading', { name: 'Revisions', exact: true }).waitFor();
    await screenshot(page, 'reqsets-01-set-systems');
    await page.getByRole('link', { name: 'New revision' }).click();

    // Prefilled from revision 1, in force.
    const overshoot = page.getByLabel(/Max overshoot/);
    await expect.poll(() => overshoot.inputValue()).toBe('20');
    await page.getByTestId('splane-region').first().waitFor();
    const before = await regionPath(page);
    await overshoot.fill('10');
    await expect.poll(() => regionPath(page)).not.toBe(before);
    await expect.poll(() => page.getByText('zeta >= 0.591 from 10 % overshoot').count()).toBeGreaterThan(0);
    // The engine's own message, under the input it is about.
    await page.getByLabel(/Max settling time/).fill('-1');
    await page.getByText('Max settling time must be a positive number of seconds').waitFor();
    await screenshot(page, 'reqsets-02-editor-preview');
    await page.getByLabel(/Max settling time/).fill('3');
    await page.getByLabel('Rationale').fill('Calmer steps: overshoot down to 10 %.');
    await page.getByRole('button', { name: 'Create draft' }).click();
    await page.waitForURL(/\/revisions\/\d+$/);
    draftUrl = page.url();

    // A colleague saves the same draft first: this tab's save is refused, and what was typed stays.
    const other = await browser.context.newPage();
    await other.goto(draftUrl);
    await other.getByLabel(/Max peak time/).fill('1.5');
    await other.getByRole('button', { name: 'Save draft' }).click();
    await other.getByText(/Saved \(version/).waitFor();
    await other.close();
    await page.getByLabel(/Max rise time/).fill('0.6');
    await page.getByRole('button', { name: 'Save draft' }).click();
    await page.getByText('Someone else saved this draft first').waitFor();
    expect(await page.getByLabel(/Max rise time/).inputValue()).toBe('0.6');
    await page.getByRole('button', { name: /Load the newer version/ }).click();
    await page.getByText(/loaded underneath/).waitFor();
    expect(await page.getByLabel(/Max rise time/).inputValue()).toBe('0.6');
    await screenshot(page, 'reqsets-03-stale-save');
    await page.getByRole('button', { name: 'Save draft' }).click();
    await page.getByText(/Saved \(version/).waitFor();

    await page.getByRole('button', { name: 'Submit for review' }).click();
    await page.getByText(/is in review/).waitFor();
    // The author may not approve their own revision.
    expect(await page.getByRole('button', { name: /Approve/ }).count()).toBe(0);
    await screenshot(page, 'reqsets-04-submitted');
    await page.close();
  });

  it('lets another account read the impact, acknowledge it and sign the approval with the password', async () => {
    const page = await newPage('admin');
    await page.goto(draftUrl);
    await page.getByRole('button', { name: 'Approve…' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByText(/1 of 1 candidate changes verdict/).first().waitFor();
    await dialog.getByText('verdict changes').waitFor();
    await screenshot(page, 'reqsets-05-impact');

    await dialog.getByLabel(/I have read the revision impact/).check();
    await dialog.getByLabel('Your password').fill('not-the-password');
    await dialog.getByRole('button', { name: 'Sign and approve' }).click();
    await dialog.getByText('That password is not right').waitFor();
    await screenshot(page, 'reqsets-06-wrong-password');

    await dialog.getByLabel('Your password').fill(DEMO_PASSWORD);
    await dialog.getByRole('button', { name: 'Sign and approve' }).click();
    await page.getByText(/is approved and in force/).waitFor();
    const digest = page.locator('[data-sha256]').first();
    expect(await digest.getAttribute('data-sha256')).toMatch(/^[0-9a-f]{64}$/);
    // Approved revisions offer no editing.
    expect(await page.getByRole('button', { name: /Save draft|Submit for review/ }).count()).toBe(0);
    await screenshot(page, 'reqsets-07-approved');
    await page.close();
  });

  it('shows an auditor every page with no write control, and passes an axe scan', async () => {
    const page = await newPage('auditor');
    // Anchored: a link such as "Revision 1 Approved" is reading, not writing.
    const writeControl = /^(New (product line|requirement set|revision)|Rename|Save|Submit|Approve|Retire|Create)/;

    await page.goto(`${baseUrl}/product-lines/${lineId}`);
    await page.getByRole('heading', { name: 'Requirement sets', exact: true }).waitFor();
    await page.getByRole('link', { name: setName }).waitFor();
    expect(await page.getByRole('button', { name: writeControl }).count()).toBe(0);
    expect(await page.getByRole('link', { name: writeControl }).count()).toBe(0);
    await screenshot(page, 'reqsets-08-auditor-line');
    await expectNoSeriousAxeViolations(page, 'product line');

    await page.goto(`${baseUrl}/requirement-sets/${setId}`);
    await page.getByRole('heading', { name: 'Revisions', exact: true }).waitFor();
    expect(await page.getByRole('button', { name: writeControl }).count()).toBe(0);
    expect(await page.getByRole('link', { name: writeControl }).count()).toBe(0);
    await screenshot(page, 'reqsets-09-auditor-set');
    await expectNoSeriousAxeViolations(page, 'requirement set');

    await page.goto(draftUrl);
    await page.getByRole('heading', { name: /Changes, limit by limit/ }).waitFor();
    await page.getByTestId('splane-region').first().waitFor();
    expect(await page.getByRole('button', { name: writeControl }).count()).toBe(0);
    expect(await page.getByRole('textbox').count()).toBe(0);
    await screenshot(page, 'reqsets-10-auditor-revision');
    await expectNoSeriousAxeViolations(page, 'revision');
    await page.close();
  });

  it('scans the systems engineer’s editor with axe', async () => {
    const page = await newPage('systems_engineer');
    await page.goto(`${baseUrl}/requirement-sets/${setId}/revisions/new`);
    await page.getByTestId('splane-region').first().waitFor();
    await expectNoSeriousAxeViolations(page, 'revision editor');
    await page.close();
  });

  it('prints the redraw time of the s-plane plot with 10,000 poles (a figure, not a check)', async () => {
    const page = await newPage('auditor');
    await page.goto(`${baseUrl}/bench/splane-plot`);
    await page.getByTestId('splane-poles').waitFor();
    await page.getByRole('button', { name: 'Measure 20 redraws' }).click();
    const result = page.getByTestId('bench-result');
    await result.filter({ hasText: 'median' }).waitFor({ timeout: 120_000 });
    console.log(`s-plane plot redraw: ${await result.textContent()}`);
    await screenshot(page, 'reqsets-11-bench');
    await page.close();
  });
});
