import type { Role } from '@keenroute/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  BASE_URL,
  cutBadges,
  DESKTOP,
  launchBrowser,
  navLabels,
  openPhoneNavigation,
  overflowsHorizontally,
  PHONE,
  screenshot,
  signIn,
  type Browser,
} from './browser';

const REGISTRY_PAGES = ['Coming due', 'Stops', 'Customers', 'Shears', 'Drop-offs'];

// PRODUCT.md's navigation plan, limited to the pages that exist now.
const ROLE_PAGES: Record<Role, { label: string; nav: string[] }> = {
  owner: {
    label: 'Owner',
    nav: [
      'Home',
      'Week plan',
      'Tickets',
      ...REGISTRY_PAGES,
      'Invoices',
      'Reports',
      'Import',
      'Edge recipes',
      'Team',
      'Rates',
      'Business profile',
      'Audit log',
      'Outbox',
    ],
  },
  office: {
    label: 'Office',
    nav: [
      'Home',
      'Week plan',
      'Tickets',
      ...REGISTRY_PAGES,
      'Invoices',
      'Reports',
      'Import',
      'Edge recipes',
      'Team',
      'Rates',
      'Business profile',
    ],
  },
  sharpener: { label: 'Sharpener', nav: ['Home', 'Today', 'My week', 'Tickets', ...REGISTRY_PAGES, 'Edge recipes'] },
  client: { label: 'Client', nav: ['Home', 'My shears', 'Book a drop-off', 'My invoices'] },
};

describe('each demo role in a browser', () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });

  afterAll(async () => {
    await browser?.close();
  });

  it.each(Object.keys(ROLE_PAGES) as Role[])('%s signs in and sees their navigation', async (role) => {
    const { page, context } = browser;
    const expected = ROLE_PAGES[role];
    await context.clearCookies();
    await page.setViewportSize(DESKTOP);
    await signIn(page, `${role}@demo.keenroute.test`);

    expect(await navLabels(page)).toEqual(expected.nav);
    const signedInAs = page.getByTestId('signed-in-as');
    await expect.poll(() => signedInAs.textContent()).toContain(expected.label);
    await page.getByRole('heading', { level: 1, name: /^Good (morning|afternoon|evening), / }).waitFor();
    const safetyCard = await page.getByRole('heading', { name: 'At the bench' }).count();
    expect(safetyCard).toBe(role === 'client' ? 0 : 1);
    await screenshot(page, `${role}-desktop`);

    await page.setViewportSize(PHONE);
    await page.reload();
    await page.getByRole('heading', { level: 1, name: /^Good / }).waitFor();
    expect(await overflowsHorizontally(page)).toBe(false);
    await screenshot(page, `${role}-phone`);
    await openPhoneNavigation(page);
    expect(await navLabels(page)).toEqual(expected.nav);
    await screenshot(page, `${role}-phone-navigation`, { fullPage: false });

    if (expected.nav.includes('Team')) {
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Team' }).click();
      await page.getByRole('heading', { level: 1, name: 'Team' }).waitFor();
      await page.getByText(`${role}@demo.keenroute.test`).first().waitFor();
      expect(await overflowsHorizontally(page)).toBe(false);
      await screenshot(page, `${role}-team-phone`);
      await page.setViewportSize(DESKTOP);
      await screenshot(page, `${role}-team-desktop`);
    } else {
      await page.goto(`${BASE_URL}/team`);
      await page.getByRole('heading', { name: 'Not part of your role' }).waitFor();
    }

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
    await page.goto(`${BASE_URL}/`);
    await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
  });

  // The pages whose lists and cards carry status and day badges; on a phone they once came out as "Hand…" and "Fr…".
  it.each(['/week', '/tickets', '/customers', '/invoices', '/imports', '/audit'])(
    'shows %s on a phone with no page overflow and no badge cut short',
    async (path) => {
      const { page, context } = browser;
      await context.clearCookies();
      await page.setViewportSize(PHONE);
      await signIn(page, 'owner@demo.keenroute.test');
      await page.goto(`${BASE_URL}${path}`);
      await page.getByRole('heading', { level: 1 }).waitFor();
      await page.waitForLoadState('networkidle');
      expect(await overflowsHorizontally(page)).toBe(false);
      expect(await cutBadges(page)).toEqual([]);
    },
  );

  it('keeps the person signed in across a reload', async () => {
    const { page, context } = browser;
    await context.clearCookies();
    await page.setViewportSize(DESKTOP);
    await signIn(page, 'office@demo.keenroute.test');
    await page.goto(`${BASE_URL}/team?sort=email`);
    await page.getByRole('heading', { level: 1, name: 'Team' }).waitFor();
    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'Team' }).waitFor();
    expect(new URL(page.url()).search).toBe('?sort=email');
  });

  it('shows a page-not-found page for an unknown address', async () => {
    const { page } = browser;
    await page.goto(`${BASE_URL}/no-such-page`);
    await page.getByRole('heading', { level: 1, name: 'Page not found' }).waitFor();
  });

  it('refuses a wrong password with a clear message', async () => {
    const { page, context } = browser;
    await context.clearCookies();
    await page.goto(`${BASE_URL}/sign-in`);
    await page.getByRole('textbox', { name: 'E-mail' }).fill('owner@demo.keenroute.test');
    await page.getByLabel(/^Password/).fill('not-the-demo-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('Wrong e-mail or password.').waitFor();
  });
});
