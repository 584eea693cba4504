import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  BASE_URL,
  DESKTOP,
  PHONE,
  launchBrowser,
  openPhoneNavigation,
  overflowsHorizontally,
  screenshot,
  signIn,
  type Browser,
  openFromNavigation,
} from './browser';

const OWNER = 'owner@demo.keenroute.test';

describe('the owner reads the audit log', () => {
  let browser: Browser;
  // An invented address no account has, so the refused sign-in is this test's own entry.
  const stranger = `audit-${randomUUID().slice(0, 8)}@demo.keenroute.test`;

  beforeAll(async () => {
    const refused = await fetch(`${BASE_URL}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: stranger, password: 'not-the-password' }),
    });
    expect(refused.status).toBe(401);
    browser = await launchBrowser();
  });

  afterAll(async () => {
    await browser?.close();
  });

  it('finds a refused sign-in by who typed it, and by kind as well', async () => {
    const { page } = browser;
    await page.setViewportSize(DESKTOP);
    await signIn(page, OWNER);
    await openFromNavigation(page, /Audit log/);
    await page.getByRole('heading', { level: 1, name: 'Audit log' }).waitFor();
    const table = page.getByRole('table', { name: 'Audit log' });
    await table.waitFor();

    await page.getByRole('searchbox', { name: 'Who' }).fill(stranger.split('@')[0]!);
    await expect.poll(() => page.url()).toContain('actor=');
    // The entry is near the top of the whole log too, so wait for the filtered answer: one row.
    await expect.poll(() => table.locator('tbody tr').count()).toBe(1);
    const row = table.locator('tbody tr').filter({ hasText: stranger });
    expect(await row.textContent()).toContain('Sign-in refused');
    expect(await row.textContent()).toContain('No account has this e-mail');
    await screenshot(page, 'audit-log-desktop');

    // Kind and who together (the who is already in the address): the refused sign-in stays, alone.
    await page.getByRole('combobox', { name: 'Kind' }).click();
    await page.getByRole('option', { name: 'Sign-in refused', exact: true }).click();
    await expect.poll(() => page.url()).toContain('action=sign-in-failed');
    await expect.poll(() => page.url()).toContain('actor=');
    await table.locator('tbody tr').filter({ hasText: stranger }).waitFor();
    expect(await table.locator('tbody tr').count()).toBe(1);
  });

  it('fits a phone: the table scrolls inside its box, not the page', async () => {
    const { page } = browser;
    await page.setViewportSize(PHONE);
    await page.goto(`${BASE_URL}/`);
    await openPhoneNavigation(page);
    await openFromNavigation(page, /Audit log/);
    await page.getByRole('table', { name: 'Audit log' }).locator('tbody tr').first().waitFor();
    expect(await overflowsHorizontally(page)).toBe(false);
    await screenshot(page, 'audit-log-phone');
  });
});
