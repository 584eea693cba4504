import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DESKTOP, PHONE, launchBrowser, openFromNavigation, screenshot, signIn, type Browser } from './browser';

describe('edge recipes and rates in the browser', () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser.close();
  });

  it("a sharpener opens a convex straight shear's recipe and sees its steps and cautions", async () => {
    const { page, context } = browser;
    await page.setViewportSize(DESKTOP);
    await signIn(page, 'sharpener@demo.keenroute.test');
    await openFromNavigation(page, /Edge recipes/);
    await page.getByRole('heading', { name: 'Edge recipes' }).waitFor();

    await page.getByRole('button', { name: /Open recipe: Convex straight/i }).click();
    const drawer = page.getByRole('dialog');
    await drawer.waitFor();
    const text = await drawer.innerText();
    // Disc sequence and paste-pad finish: common practice defaults of the rules package.
    for (const grade of ['80 µm', '60 µm', '30 µm', '15 µm', '9 µm']) expect(text).toContain(grade);
    expect(text).toMatch(/paste/i);
    expect(text).toContain('Cautions at the bench');
    expect(text).toMatch(/dust mask|dust extraction/i);
    expect(text).toMatch(/equipment maker/i);
    await screenshot(page, 'edge-recipe-convex-desktop');

    await page.setViewportSize(PHONE);
    await screenshot(page, 'edge-recipe-convex-phone');
    await context.clearCookies();
  });

  it('the owner opens Rates and sees the demo card and a quote preview', async () => {
    const { page } = browser;
    await page.setViewportSize(DESKTOP);
    await signIn(page, 'owner@demo.keenroute.test');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: /Rates/ }).click();
    await page.getByRole('heading', { name: 'Rates', exact: true }).waitFor();
    await expect.poll(() => page.getByRole('textbox', { name: 'Card name' }).inputValue()).toMatch(/demo/i);

    const preview = page.getByRole('region', { name: 'Quote preview' }).or(page.getByLabel('Quote preview'));
    await preview.first().waitFor();
    expect(await page.getByLabel('Ticket totals').innerText()).toMatch(/Total/);
    await screenshot(page, 'rates-owner-desktop');
    await page.setViewportSize(PHONE);
    await screenshot(page, 'rates-owner-phone');
  });
});
