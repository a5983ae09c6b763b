// The built client under the API's Content-Security-Policy, in Debian's
// Chromium: no CSP violation in the console on any page a controls engineer
// opens; and the settings page makes an API token (secret shown once),
// lists it by its prefix and revokes it.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { startApp, stopApp } from '../helpers/app.js';
import { launchBrowser, screenshot, signIn } from '../helpers/browser.js';

let baseUrl: string;
let browser: Awaited<ReturnType<typeof launchBrowser>>;
beforeAll(async () => {
  baseUrl = await startApp();
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await stopApp();
});

describe('Content-Security-Policy', () => {
  it('When the built client is opened page by page, then the CSP header is there and the console shows no CSP violation', async () => {
    const page = await browser.context.newPage();
    const violations: string[] = [];
    page.on('console', (m) => {
      if (/Content[- ]Security[- ]Policy|Refused to (load|execute|apply)/i.test(m.text())) violations.push(m.text());
    });
    await page.exposeFunction('__reportCsp', (v: string) => violations.push(v));
    await page.addInitScript(() => {
      document.addEventListener('securitypolicyviolation', (e) => (window as unknown as { __reportCsp: (v: string) => void }).__reportCsp(`${e.violatedDirective} ${e.blockedURI}`));
    });
    const first = await page.goto(`${baseUrl}/sign-in`);
    expect(first?.headers()['content-security-policy']).toMatch(/script-src 'self'/);
    await signIn(page, baseUrl, 'controls_engineer');
    await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
    const pages = ['/', '/product-lines', '/candidates', '/reports', '/reports/verify', '/settings/tokens'];
    for (const p of pages) {
      await page.goto(`${baseUrl}${p}`);
      await page.waitForLoadState('networkidle');
    }
    console.log(`CSP check: ${pages.length + 1} pages of the built client, ${violations.length} violations`);
    expect(violations).toEqual([]);
    await page.close();
  });
});

describe('/settings/tokens', () => {
  it('When a controls engineer creates a token, then the secret is shown once, the list shows its prefix, and revoking marks it revoked', async () => {
    const page = await browser.context.newPage();
    await page.goto(`${baseUrl}/settings/tokens`); // still signed in from the test above
    const name = `Browser token ${Date.now().toString(36)}`;
    await page.getByLabel('Name').fill(name);
    await page.getByRole('button', { name: 'Create token' }).click();
    const secret = (await page.getByTestId('new-token-secret').textContent()) ?? '';
    expect(secret).toMatch(/^pc_[A-Za-z0-9_-]{43}$/);
    const row = page.getByRole('row').filter({ hasText: name });
    await expect.poll(() => row.textContent()).toContain(secret.slice(0, 10));
    await screenshot(page, 'settings-tokens');
    await page.getByRole('button', { name: 'I have stored it' }).click();
    expect(await page.getByTestId('new-token-secret').count()).toBe(0);
    await row.getByRole('button', { name: 'Revoke' }).click();
    await expect.poll(() => row.textContent()).toContain('revoked');
    await page.close();
  });
});
