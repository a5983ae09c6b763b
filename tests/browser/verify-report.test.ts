import { readFileSync } from 'node:fs';
import path from 'node:path';

import AxeBuilder from '@axe-core/playwright';
import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { DEMO_ACCOUNTS, DEMO_PASSWORD, startApp, stopApp } from '../helpers/app.js';
import { ARTIFACTS, launchBrowser, screenshot, signIn } from '../helpers/browser.js';

let baseUrl: string;
let context: BrowserContext;
let closeBrowser: () => Promise<void>;
let reportNumber: string;

// A controls engineer signs a report for one of the demo assessments, over the API.
async function issueReport(): Promise<string> {
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: DEMO_ACCOUNTS.controls_engineer, password: DEMO_PASSWORD }),
  });
  const { csrfToken } = (await login.json()) as { csrfToken: string };
  const cookie = login.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  const lines = (await (await fetch(`${baseUrl}/api/product-lines`, { headers: { cookie } })).json()) as { items: { id: number }[] };
  for (const line of lines.items) {
    const cands = (await (await fetch(`${baseUrl}/api/product-lines/${line.id}/candidates`, { headers: { cookie } })).json()) as { items: { id: number; latest: { assessmentId: number; revisionStatus: string }[] }[] };
    const assessed = cands.items.flatMap((c) => c.latest).find((l) => l.revisionStatus === 'approved');
    if (!assessed) continue;
    const r = await fetch(`${baseUrl}/api/assessments/${assessed.assessmentId}/reports`, {
      method: 'POST',
      headers: { cookie, 'x-csrf-token': csrfToken, 'content-type': 'application/json' },
      body: JSON.stringify({ password: DEMO_PASSWORD, meaning: 'released' }),
    });
    const body = (await r.json()) as { number: string };
    if (r.status !== 201 && r.status !== 200) throw new Error(`issuing a report failed: ${r.status} ${JSON.stringify(body)}`);
    return body.number;
  }
  throw new Error('no demo assessment against an approved revision to sign');
}

beforeAll(async () => {
  baseUrl = await startApp();
  ({ context, close: closeBrowser } = await launchBrowser());
  reportNumber = await issueReport();
});
afterAll(async () => {
  await closeBrowser?.();
  await stopApp();
});

describe('an auditor downloads a compliance report and verifies it', () => {
  it('When the auditor downloads the signed PDF and drops it on the verify page, then it is valid with its record; a changed copy is not intact', async () => {
    const page = await context.newPage();
    await signIn(page, baseUrl, 'auditor');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Reports' }).click();
    const link = page.getByRole('link', { name: new RegExp(`Download PDF of ${reportNumber}`) });
    await link.waitFor();
    await screenshot(page, 'verify-01-reports-list');
    const [download] = await Promise.all([page.waitForEvent('download'), link.click()]);
    const file = path.join(ARTIFACTS, `${reportNumber}.pdf`);
    await download.saveAs(file);
    expect(readFileSync(file).subarray(0, 5).toString()).toBe('%PDF-');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Verify a report' }).click();
    await page.locator('input[type="file"]').setInputFiles(file);
    await page.getByText('Valid: this is a report Polecourt issued, unchanged').waitFor();
    expect(await page.getByText(reportNumber).first().isVisible()).toBe(true);
    await screenshot(page, 'verify-02-valid');
    const scan = await new AxeBuilder({ page }).analyze();
    expect(scan.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => v.id)).toEqual([]);

    // One byte changed inside the signed range: the signature no longer covers the file.
    const bytes = readFileSync(file);
    const at = bytes.indexOf(Buffer.from('/Producer'));
    bytes[at + 2] = bytes[at + 2]! ^ 0x01;
    await page.locator('input[type="file"]').setInputFiles({ name: 'changed.pdf', mimeType: 'application/pdf', buffer: bytes });
    await page.getByText('Not valid').first().waitFor();
    expect(await page.getByText(/The signature is not intact/).isVisible()).toBe(true);
    await screenshot(page, 'verify-03-changed');
    await page.close();
  });
});
