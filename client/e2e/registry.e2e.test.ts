import { randomUUID } from 'node:crypto';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  BASE_URL,
  DESKTOP,
  PHONE,
  launchBrowser,
  openFromNavigation,
  overflowsHorizontally,
  screenshot,
  signIn,
  type Browser,
} from './browser';

/** Picks an option of a Mantine Select by its visible label. */
async function choose(page: Page, scope: ReturnType<Page['getByRole']>, label: string, option: string) {
  await scope.getByRole('combobox', { name: label }).click();
  await page.getByRole('option', { name: option, exact: true }).click();
}

describe('the registry in the browser', () => {
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

  it('the office creates a stop, adds a customer and a shear, and finds the shear by its tag code', async () => {
    const { page, context } = browser;
    const tag = randomUUID().slice(0, 6);
    const stopName = `Browser Test Salon ${tag}`;
    const customerName = `Wren Halloway ${tag}`;
    await page.setViewportSize(DESKTOP);
    await signIn(page, 'office@demo.keenroute.test');

    await openFromNavigation(page, 'Stops');
    await page
      .getByRole('link', { name: 'Add a stop' })
      .or(page.getByRole('button', { name: 'Add a stop' }))
      .first()
      .click();
    await page.getByRole('heading', { name: 'New stop' }).waitFor();
    await page.getByRole('textbox', { name: 'Name' }).fill(stopName);
    // An address of the invented demo town, which the local geocoder stand-in knows.
    await page.getByRole('textbox', { name: 'Street address' }).fill('104 Alder Row');
    await page.getByRole('textbox', { name: 'City' }).fill('Larkhaven');
    await page.getByRole('textbox', { name: 'Postal code' }).fill('55901');
    await screenshot(page, 'stop-new-desktop');
    await page.getByRole('button', { name: 'Add the stop' }).click();

    await page.getByRole('heading', { level: 1, name: stopName }).waitFor();
    expect(page.url()).toMatch(/\/stops\/[0-9a-f-]{36}$/);

    await page.getByRole('button', { name: 'Add customer' }).click();
    const customerDialog = page.getByRole('dialog', { name: 'Add a customer' });
    await customerDialog.getByRole('textbox', { name: 'Name' }).fill(customerName);
    await customerDialog.getByRole('textbox', { name: 'E-mail' }).fill(`wren.${tag}@demo.keenroute.test`);
    await customerDialog.getByRole('button', { name: 'Add customer' }).click();
    await customerDialog.waitFor({ state: 'hidden' });

    await page.getByRole('button', { name: `Add shear for ${customerName}` }).click();
    const shearDialog = page.getByRole('dialog', { name: 'Register a shear' });
    await shearDialog.getByRole('textbox', { name: 'Make' }).fill('Corvane');
    await shearDialog.getByRole('textbox', { name: /Length/ }).fill('6.5');
    await choose(page, shearDialog, 'Edge type', 'Convex');
    await choose(page, shearDialog, 'Tool kind', 'Straight shear');
    await shearDialog.getByRole('button', { name: 'Register shear' }).click();
    const tagCode = (await page.getByLabel('New tag code').innerText()).trim();
    expect(tagCode).toMatch(/^KR-\d{6,}$/);
    await screenshot(page, 'shear-registered-desktop', { fullPage: false });
    await page.getByRole('button', { name: 'Done' }).click();
    await page.getByText(tagCode).first().waitFor();

    await openFromNavigation(page, 'Shears');
    // Typed the way people read a tag aloud: the digits alone find it.
    await page
      .getByRole('searchbox', { name: 'Find by tag code, make or customer' })
      .fill(String(Number(tagCode.slice(3))));
    await page.getByRole('link', { name: `Go to ${tagCode}` }).click();
    await page.waitForURL(/\/shears\/[0-9a-f-]{36}$/);
    await page.getByText(tagCode, { exact: true }).filter({ visible: true }).first().waitFor();
    await page.getByRole('link', { name: customerName }).first().waitFor();
    // The shear page carries its edge recipe with the bench cautions.
    await page
      .getByText(/dust mask|dust extraction/i)
      .first()
      .waitFor();
    await screenshot(page, 'shear-page-desktop');

    await page.setViewportSize(PHONE);
    await page.reload();
    await page.getByText(customerName).first().waitFor();
    expect(await overflowsHorizontally(page)).toBe(false);
    await screenshot(page, 'shear-page-phone');
    await context.clearCookies();
  });

  it('a client sees only their own shears', async () => {
    const { page, context } = browser;
    await page.setViewportSize(PHONE);
    await signIn(page, 'client@demo.keenroute.test');
    await page.goto(`${BASE_URL}/my-shears`);
    await page.getByRole('heading', { name: 'My shears' }).waitFor();
    await page
      .getByText(/KR-\d{6}/)
      .first()
      .waitFor();
    expect(await overflowsHorizontally(page)).toBe(false);
    await screenshot(page, 'client-my-shears-phone');
    await context.clearCookies();
  });
});
