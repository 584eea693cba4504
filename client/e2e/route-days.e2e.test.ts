import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  DESKTOP,
  PHONE,
  launchBrowser,
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

/** Drags with the mouse the way a person does: press on the handle, move in steps, let go over the target. */
async function drag(page: Page, handle: Locator, target: Locator): Promise<void> {
  await handle.scrollIntoViewIfNeeded();
  const from = (await handle.boundingBox())!;
  const to = (await target.boundingBox())!;
  await page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
  await page.mouse.down();
  await page.mouse.move(from.x + from.width / 2 + 10, from.y + from.height / 2 + 10, { steps: 4 });
  await page.mouse.move(to.x + to.width / 2, to.y + to.height - 8, { steps: 20 });
  await page.mouse.up();
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

  it('the office plans next week and drags a stop to another day, where it stays locked', async () => {
    const { page } = browser;
    await page.setViewportSize(DESKTOP);
    await signIn(page, 'office@demo.keenroute.test');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Week plan' }).click();
    await page.getByRole('heading', { name: 'Week plan' }).waitFor();
    await page.getByRole('button', { name: 'Next week' }).click();

    await page.getByRole('button', { name: 'Plan the week' }).click();
    await page.getByText('Week planned').waitFor({ timeout: 60_000 });
    const days = daysOf(page, 'Tomas Reyne');
    await expect.poll(() => days.count()).toBe(5);
    await screenshot(page, 'week-plan-desktop');
    await screenshot(page, 'week-plan-desktop');

    // Move the last stop of the first day that has two or more onto the next day that has fewer.
    const counts = await Promise.all([0, 1, 2, 3, 4].map((i) => stopsIn(days.nth(i)).count()));
    const from = counts.findIndex((n) => n >= 1);
    const to = counts.findIndex((n, i) => i !== from && n === Math.min(...counts.filter((_, j) => j !== from)));
    expect(from).toBeGreaterThanOrEqual(0);
    const moving = stopsIn(days.nth(from)).last();
    const name = ((await moving.getAttribute('aria-label')) ?? '').replace(/^\d+\. /, '');
    await drag(page, moving.getByRole('button', { name: `Drag ${name}` }), days.nth(to).locator('ol'));

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
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'My week' }).click();
    await page.getByRole('heading', { name: 'My week' }).waitFor();
    await page.getByRole('button', { name: 'Next week' }).click();
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
