import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, PHONE, launchBrowser, overflowsHorizontally, screenshot, type Browser, api } from './browser';

const MAIL_CATCHER_URL = process.env.MAIL_CATCHER_URL?.replace(/\/$/, '');

function addDays(isoDate: string, days: number): string {
  const date = new Date(`${isoDate}T12:00:00Z`);
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}

describe('booking a drop-off in the browser', () => {
  let browser: Browser;
  const tag = randomUUID().slice(0, 6);
  const stopName = `Drop-off Test Grooming ${tag}`;

  beforeAll(async () => {
    browser = await launchBrowser();
    // The office's part: a stop of the owner's round, planned onto a route day two weeks out.
    const owner = await api('owner@demo.keenroute.test');
    const me = await owner<{ id: string }>('GET', '/api/auth/me');
    const allDay = [{ opens: '07:00', closes: '19:00' }];
    const stop = await owner<{ id: string }>('POST', '/api/stops', {
      name: stopName,
      kind: 'grooming-shop',
      street: '104 Alder Row',
      city: 'Larkhaven',
      latitude: 44.8123,
      longitude: -92.4071,
      openingHours: { mon: allDay, tue: allDay, wed: allDay, thu: allDay, fri: allDay },
      assignedSharpenerId: me.id,
    });
    const week = await owner<{ today: string }>('GET', '/api/route-days');
    await owner('POST', '/api/route-days/plan', { week: addDays(week.today, 14), sharpenerIds: [me.id] });
    expect(stop.id).toBeTruthy();
  });
  afterAll(async () => {
    await browser.close();
  });

  it('a groomer finds the stop, books two convex shears for its route day, and gets the link to change it', async () => {
    const { page } = browser;
    const email = `groomer-${tag}@example.test`;
    await browser.context.clearCookies();
    await page.setViewportSize(PHONE);
    await page.goto(`${BASE_URL}/book`);
    await page.getByLabel('Stop name or town').fill(stopName);
    await page
      .getByRole('list', { name: 'Matching stops' })
      .getByRole('button', { name: new RegExp(stopName) })
      .click();

    await page
      .getByRole('radio', { name: /, \d\d:\d\d–\d\d:\d\d$/ })
      .first()
      .check();
    const row = page.getByRole('group', { name: 'Shears row 1' });
    await row.getByRole('combobox', { name: 'Tool kind' }).click();
    await page.getByRole('option', { name: /^straight/i }).click();
    await row.getByRole('combobox', { name: 'Edge type' }).click();
    await page.getByRole('option', { name: /^convex$/i }).click();
    await row.getByRole('textbox', { name: 'Pairs' }).fill('2');
    await page.getByRole('textbox', { name: 'Your name' }).fill(`Marlo Fenwick ${tag}`);
    await page.getByRole('textbox', { name: 'E-mail' }).fill(email);
    await page.getByRole('textbox', { name: 'Phone' }).fill('555-0177');
    await page.getByRole('checkbox', { name: /may e-mail me/ }).check();
    await page.getByLabel('Estimate').getByText(/\$\d/).first().waitFor();
    expect(await overflowsHorizontally(page)).toBe(false);
    await screenshot(page, 'drop-off-form-phone');

    await page.getByRole('button', { name: 'Book the drop-off' }).dblclick();
    await page.getByRole('status', { name: 'Drop-off booked' }).waitFor();
    await screenshot(page, 'drop-off-booked-phone');

    if (!MAIL_CATCHER_URL) throw new Error('Set MAIL_CATCHER_URL to the mail catcher the server sends to');
    let link: string | undefined;
    for (let tries = 0; tries < 50 && !link; tries++) {
      const { items } = (await (await fetch(`${MAIL_CATCHER_URL}/messages`)).json()) as {
        items: { to: string[]; text: string }[];
      };
      const mails = items.filter((mail) => mail.to.some((to) => to.includes(email)));
      // A double click made one booking: one confirmation.
      if (mails.length > 0) {
        expect(mails).toHaveLength(1);
        link = /\/drop-off\/[A-Za-z0-9_-]+/.exec(mails[0]!.text)?.[0];
      } else await new Promise((resolve) => setTimeout(resolve, 100));
    }
    expect(link).toBeDefined();
    await page.goto(`${BASE_URL}${link}`);
    await page.getByText(stopName).first().waitFor();
    await page.getByRole('form', { name: 'Change the drop-off' }).waitFor();
    await screenshot(page, 'drop-off-manage-phone');
  });
});
