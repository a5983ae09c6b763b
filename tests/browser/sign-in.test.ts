import AxeBuilder from '@axe-core/playwright';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { startApp, stopApp, type DemoRole } from '../helpers/app.js';
import { launchBrowser, screenshot, signIn } from '../helpers/browser.js';

let baseUrl: string;
let context: BrowserContext;
let closeBrowser: () => Promise<void>;

beforeAll(async () => {
  baseUrl = await startApp();
  ({ context, close: closeBrowser } = await launchBrowser());
});
afterAll(async () => {
  await closeBrowser?.();
  await stopApp();
});

// The navigation each demo account should see (the role table of the API contract).
const EXPECTED_NAV: Record<DemoRole, string[]> = {
  admin: ['Overview', 'Product lines', 'Candidates', 'Reports', 'Verify a report', 'Audit trail', 'Users', 'Outbox', 'Settings'],
  systems_engineer: ['Overview', 'Product lines', 'Verify a report', 'Settings'],
  controls_engineer: ['Overview', 'Product lines', 'Candidates', 'Reports', 'Verify a report', 'Settings'],
  auditor: ['Overview', 'Product lines', 'Candidates', 'Reports', 'Verify a report', 'Audit trail', 'Settings'],
};

async function navLabels(page: Page): Promise<string[]> {
  const nav = page.getByRole('navigation', { name: 'Main' });
  await nav.waitFor();
  return (await nav.getByRole('link').allInnerTexts()).map((t) => t.trim());
}

describe('signing in as each demo account', () => {
  it.each(Object.keys(EXPECTED_NAV) as DemoRole[])('When %s signs in, then the navigation shows exactly what that role may use, and signing out returns to the sign-in page', async (role) => {
    const page = await context.newPage();
    await signIn(page, baseUrl, role);
    await page.getByRole('button', { name: /sign out/i }).waitFor();
    expect(await navLabels(page)).toEqual(EXPECTED_NAV[role]);
    await screenshot(page, `sign-in-${role}`);
    const scan = await new AxeBuilder({ page }).analyze();
    expect(scan.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => v.id)).toEqual([]);
    await page.getByRole('button', { name: /sign out/i }).click();
    await page.waitForURL(/\/sign-in/);
    await page.close();
  });
});

describe('a wrong password', () => {
  it('When the password is wrong, then the page says so in plain words and stays on the sign-in form', async () => {
    const page = await context.newPage();
    await signIn(page, baseUrl, 'controls_engineer', 'not-the-password');
    const alert = page.getByRole('alert');
    await alert.waitFor();
    expect(await alert.innerText()).toMatch(/e-mail or password is not right/i);
    expect(page.url()).toMatch(/\/sign-in/);
    await screenshot(page, 'sign-in-wrong-password');
    const scan = await new AxeBuilder({ page }).analyze();
    expect(scan.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => v.id)).toEqual([]);
    await page.close();
  });
});
