// The audit trail in a real browser: an auditor opens it, filters by action,
// opens an event to read its record before and after field by field, runs the
// chain check and reads "intact" in words. Axe scans the page with an event
// open and the check's answer on screen.
import AxeBuilder from '@axe-core/playwright';
import { type APIRequestContext, type Page, request as playwrightRequest } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { DEMO_ACCOUNTS, DEMO_PASSWORD, type DemoRole, startApp, stopApp } from '../helpers/app.js';
import { launchBrowser, screenshot, signIn } from '../helpers/browser.js';

let baseUrl: string;
let browser: Awaited<ReturnType<typeof launchBrowser>>;

// The test's own product line, renamed once, so the event it looks for is its own.
const stamp = Date.now().toString(36);
const firstName = `Audit browser line ${stamp}`;
const secondName = `Audit browser line ${stamp} (renamed)`;
let lineId: number;
let updateEventId: number;

async function apiAs(role: DemoRole): Promise<{ request: APIRequestContext; csrf: string }> {
  const request = await playwrightRequest.newContext({ baseURL: baseUrl });
  const res = await request.post('/api/auth/login', { data: { email: DEMO_ACCOUNTS[role], password: DEMO_PASSWORD } });
  expect(res.status()).toBe(200);
  return { request, csrf: ((await res.json()) as { csrfToken: string }).csrfToken };
}

async function expectNoSeriousAxeViolations(page: Page, name: string): Promise<void> {
  const result = await new AxeBuilder({ page }).analyze();
  const bad = result.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  expect(bad.map((v) => `${name}: ${v.id} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`)).toEqual([]);
}

beforeAll(async () => {
  baseUrl = await startApp();
  browser = await launchBrowser();
  const systems = await apiAs('systems_engineer');
  const made = await systems.request.post('/api/product-lines', { data: { name: firstName, description: 'Made by the audit-trail browser test.' }, headers: { 'x-csrf-token': systems.csrf } });
  expect(made.status()).toBe(201);
  lineId = ((await made.json()) as { id: number }).id;
  const renamed = await systems.request.patch(`/api/product-lines/${lineId}`, { data: { name: secondName }, headers: { 'x-csrf-token': systems.csrf } });
  expect(renamed.status()).toBe(200);
  await systems.request.dispose();
  const auditor = await apiAs('auditor');
  const events = await auditor.request.get(`/api/audit-events?productLineId=${lineId}&action=product_line.update`);
  updateEventId = ((await events.json()) as { items: { id: number }[] }).items[0]!.id;
  await auditor.request.dispose();
});

afterAll(async () => {
  await browser?.close();
  await stopApp();
});

describe('the audit trail page', () => {
  it('An auditor filters by action, opens an event, checks the chain and reads "intact"', async () => {
    const page = await browser.context.newPage();
    await browser.context.clearCookies();
    await signIn(page, baseUrl, 'auditor');
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));

    await page.getByRole('link', { name: 'Audit trail' }).first().click();
    await page.waitForURL(`${baseUrl}/audit-trail`);
    await expect.poll(() => page.getByRole('heading', { name: 'All events' }).isVisible()).toBe(true);

    // Filter by action, with the keyboard-usable form; the address keeps the filter.
    await page.getByLabel('Action').selectOption('product_line.update');
    await page.getByRole('button', { name: 'Apply filters' }).click();
    await page.waitForURL((url) => url.searchParams.get('action') === 'product_line.update');
    await expect.poll(() => page.getByRole('heading', { name: 'Matching events' }).isVisible()).toBe(true);
    const table = page.getByRole('table', { name: /Audit events, newest first/ });
    await table.waitFor();
    const actionCells = await table.locator('tbody > tr > td:nth-child(4)').allInnerTexts();
    expect(actionCells.length).toBeGreaterThan(0);
    expect(new Set(actionCells)).toEqual(new Set(['product_line.update']));

    // The export link carries the same filter.
    const href = await page.getByRole('link', { name: 'Export these events as CSV' }).getAttribute('href');
    expect(new URL(href!, baseUrl).searchParams.get('action')).toBe('product_line.update');
    expect(new URL(href!, baseUrl).searchParams.get('format')).toBe('csv');

    // Open our event from the keyboard: its name changed, said in a word, before and after shown.
    // Matched by its panel, since the label turns from "Show" to "Hide" once open.
    const toggle = page.locator(`button[aria-controls="audit-event-${updateEventId}-details"]`);
    expect(await toggle.innerText()).toMatch(/^Show changes/);
    await toggle.focus();
    await page.keyboard.press('Enter');
    await expect.poll(() => toggle.getAttribute('aria-expanded')).toBe('true');
    expect(await toggle.innerText()).toMatch(/^Hide changes/);
    const changed = page.getByRole('table', { name: `Fields this event set or changed (event ${updateEventId})` });
    await changed.waitFor();
    const nameRow = changed.getByRole('row', { name: /^name\b/ });
    await expect.poll(() => nameRow.innerText()).toContain('Changed');
    const nameText = await nameRow.innerText();
    expect(nameText).toContain(firstName);
    expect(nameText).toContain(secondName);

    // The chain check answers in words.
    await page.getByRole('button', { name: 'Check the chain' }).click();
    const verdict = page.getByText('Intact: no event is missing or altered');
    await verdict.waitFor({ timeout: 30_000 });
    expect(await page.getByText(/events were checked, oldest first/).innerText()).toMatch(/All [\d,]+ events were checked/);

    await screenshot(page, 'audit-trail-auditor');
    await expectNoSeriousAxeViolations(page, 'audit trail');
    await page.close();
  });

  it('A controls engineer is told the audit trail is not part of the role, and the API refuses', async () => {
    const page = await browser.context.newPage();
    await browser.context.clearCookies();
    await signIn(page, baseUrl, 'controls_engineer');
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
    await page.goto(`${baseUrl}/audit-trail`);
    await page.getByText('Audit trail is not part of your role').waitFor();
    expect(await page.getByRole('table', { name: /Audit events/ }).count()).toBe(0);
    const status = await page.evaluate(async () => (await fetch('/api/audit-events')).status);
    expect(status).toBe(403);
    await page.close();
  });
});
