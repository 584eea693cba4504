import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  BASE_URL,
  DEMO_PASSWORD,
  DESKTOP,
  PHONE,
  launchBrowser,
  openFromNavigation,
  openPhoneNavigation,
  overflowsHorizontally,
  screenshot,
  signIn,
  type Browser,
} from './browser';

/** The route day cards of one sharpener, in day order. */
function daysOf(page: Page, sharpener: string): Locator {
  return page.locator(`section[aria-label*=" with ${sharpener}"]`);
}

/** The stop rows of a day card (an empty day's list holds only a "No stops yet" line). */
function stopsIn(day: Locator): Locator {
  return day.locator('ol > li[aria-label]');
}

/** Next week's Monday by the business's calendar, as the API tells it. */
async function nextMonday(): Promise<string> {
  const login = await fetch(`${BASE_URL}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'office@demo.keenroute.test', password: DEMO_PASSWORD }),
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  const week = (await (
    await fetch(`${BASE_URL}/api/route-days`, { headers: { authorization: `Bearer ${accessToken}` } })
  ).json()) as { weekStart: string };
  const monday = new Date(`${week.weekStart}T12:00:00Z`);
  monday.setUTCDate(monday.getUTCDate() + 7);
  return monday.toISOString().slice(0, 10);
}

describe('route days in the browser', () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser.close();
  });
  beforeEach(async () => {
    await browser.context.clearCookies();
  });

  it('the office plans next week and moves a stop to another day, where it stays locked', async () => {
    const { page } = browser;
    await page.setViewportSize(DESKTOP);
    await signIn(page, 'office@demo.keenroute.test');
    await openFromNavigation(page, 'Week plan');
    await page.getByRole('heading', { name: 'Week plan' }).waitFor();
    // Straight to next week by its address (the picker's own button is covered by component tests).
    await page.goto(`${BASE_URL}/week?week=${await nextMonday()}`);
    await page.getByText('Next week', { exact: true }).waitFor();

    await page.getByRole('button', { name: 'Plan the week' }).click();
    await page.getByText('Week planned').waitFor({ timeout: 60_000 });
    const days = daysOf(page, 'Tomas Reyne');
    await expect.poll(() => days.count()).toBe(5);
    await screenshot(page, 'week-plan-desktop');

    // Move the last stop of the first day that has two or more onto the next day that has fewer.
    const counts = await Promise.all([0, 1, 2, 3, 4].map((i) => stopsIn(days.nth(i)).count()));
    const from = counts.findIndex((n) => n >= 1);
    const to = counts.findIndex((n, i) => i !== from && n === Math.min(...counts.filter((_, j) => j !== from)));
    expect(from).toBeGreaterThanOrEqual(0);
    const moving = stopsIn(days.nth(from)).last();
    const name = ((await moving.getAttribute('aria-label')) ?? '').replace(/^\d+\. /, '');
    // Through the stop's menu (Move to…): the same move a drag makes, without a pointer's timing on a busy machine.
    await moving.getByRole('button', { name: `More for ${name}` }).click();
    await page.getByRole('menuitem', { name: 'Move to…' }).click();
    const dialog = page.getByRole('dialog', { name: `Move ${name}` });
    const target = ((await days.nth(to).getAttribute('aria-label')) ?? '').replace(/ with .*$/, '');
    await dialog.getByRole('combobox', { name: 'Day' }).click();
    await page.getByRole('option', { name: new RegExp(`^${target.split(',')[0]}.*Tomas Reyne`) }).click();
    await dialog.getByRole('button', { name: 'Move here' }).click();

    const moved = stopsIn(days.nth(to)).filter({ hasText: name });
    await moved.waitFor();
    await expect.poll(() => stopsIn(days.nth(from)).filter({ hasText: name }).count()).toBe(0);
    await expect.poll(() => moved.getByRole('button', { name: /locked|unlock/i }).count()).toBeGreaterThan(0);

    // The move was saved: it is still there after a reload.
    await page.reload();
    await stopsIn(daysOf(page, 'Tomas Reyne').nth(to)).filter({ hasText: name }).waitFor();
    await screenshot(page, 'week-plan-moved-desktop');

    await page.setViewportSize(PHONE);
    await page.reload();
    await page.getByRole('heading', { name: 'Week plan' }).waitFor();
    expect(await overflowsHorizontally(page)).toBe(false);
    await screenshot(page, 'week-plan-phone');
  });

  it('the sharpener opens a day sheet of next week on a phone', async () => {
    const { page } = browser;
    await page.setViewportSize({ width: 390, height: 844 });
    await signIn(page, 'sharpener@demo.keenroute.test');
    await openPhoneNavigation(page);
    await openFromNavigation(page, 'My week');
    await page.getByRole('heading', { name: 'My week' }).waitFor();
    await page.goto(`${BASE_URL}/week?week=${await nextMonday()}`);
    await page.getByText('Next week', { exact: true }).waitFor();
    const dayWithStops = page
      .locator('section[aria-label*=" with "]')
      .filter({ has: page.getByRole('button', { name: /^Drag / }) })
      .first();
    const firstStop = ((await stopsIn(dayWithStops).first().getAttribute('aria-label')) ?? '').replace(/^\d+\. /, '');
    await dayWithStops.getByRole('link', { name: /^Day sheet for / }).click();
    await page.getByText(firstStop).first().waitFor();
    await page.getByRole('button', { name: /Print|PDF/ }).waitFor();
    expect(await overflowsHorizontally(page)).toBe(false);
    await screenshot(page, 'day-sheet-phone');
  });
});
