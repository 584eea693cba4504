import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, launchBrowser, overflowsHorizontally, screenshot, signIn, type Browser, api } from './browser';

interface Week {
  today: string;
  days: { id: string; day: string; sharpener: { id: string }; stops: { stopId: string }[] }[];
}

describe('working a stop on a phone', () => {
  let browser: Browser;
  let restoreSettings: () => Promise<unknown>;
  const tag = randomUUID().slice(0, 6);
  const stopName = `Phone Test Salon ${tag}`;
  const customerName = `Ines Okafor ${tag}`;
  let tagCode: string;

  beforeAll(async () => {
    browser = await launchBrowser();
    const owner = await api('owner@demo.keenroute.test');
    const sharpener = await api('sharpener@demo.keenroute.test');
    const me = await sharpener<{ id: string }>('GET', '/api/auth/me');
    // Today must be a work day whatever day the tests run: every weekday for this test, then back as it was.
    const settings = await owner<Record<string, unknown>>('GET', '/api/route-days/settings');
    restoreSettings = () => owner('PUT', '/api/route-days/settings', settings);
    await owner('PUT', '/api/route-days/settings', {
      ...settings,
      workWeekdays: ['mon', 'tue', 'wed', 'thu', 'fri', 'sat', 'sun'],
    });
    const allDay = [{ opens: '00:00', closes: '23:59' }];
    const stop = await owner<{ id: string }>('POST', '/api/stops', {
      name: stopName,
      kind: 'salon',
      street: '12 Alder Row',
      city: 'Larkhaven',
      latitude: 44.815,
      longitude: -92.41,
      openingHours: { mon: allDay, tue: allDay, wed: allDay, thu: allDay, fri: allDay, sat: allDay, sun: allDay },
      assignedSharpenerId: me.id,
    });
    const customer = await owner<{ id: string }>('POST', '/api/customers', { name: customerName, stopId: stop.id });
    const shear = await owner<{ tagCode: string }>('POST', '/api/shears', {
      customerId: customer.id,
      lengthIn: 6.5,
      edgeType: 'convex',
      toolKind: 'straight',
    });
    tagCode = shear.tagCode;
    const { today } = await owner<Week>('GET', '/api/route-days');
    const week = await owner<Week>('POST', '/api/route-days/plan', { week: today, sharpenerIds: [me.id] });
    const day = week.days.find((d) => d.day === today && d.sharpener.id === me.id)!;
    if (!day.stops.some((s) => s.stopId === stop.id)) {
      await owner('POST', `/api/route-days/${day.id}/stops`, { stopId: stop.id, position: 0 });
    }
  });
  afterAll(async () => {
    await restoreSettings?.();
    await browser.close();
  });

  it('the sharpener goes from the day sheet to a ticket, sharpens a shear, hands it back and takes cash', async () => {
    const { page } = browser;
    await browser.context.clearCookies();
    await page.setViewportSize({ width: 390, height: 844 });
    await signIn(page, 'sharpener@demo.keenroute.test');
    await page.goto(`${BASE_URL}/today`);
    await page.getByRole('link', { name: `Work ${stopName}` }).click();
    await page.getByRole('button', { name: `Open a ticket for ${customerName}` }).click();

    await page.getByRole('textbox', { name: 'Tag code' }).fill(tagCode.toLowerCase());
    await page.getByRole('button', { name: 'Add', exact: true }).click();
    const status = page.getByRole('radiogroup', { name: `Bench status of ${tagCode}` });
    await status.waitFor();
    await page.getByText(/dust/i).first().waitFor();
    expect(await overflowsHorizontally(page)).toBe(false);
    await screenshot(page, 'ticket-phone');

    await status.getByText('On the bench').click();
    await page.getByText('Saved').first().waitFor();
    await status.getByText('Ready').click();
    await page.getByRole('button', { name: 'Finish ticket' }).click();
    await page.getByRole('button', { name: 'Hand back' }).click();
    await page.getByRole('button', { name: 'Record payment' }).click();
    await page.getByRole('region', { name: 'Done' }).waitFor();
    await screenshot(page, 'ticket-done-phone');

    const tickets = await (
      await api('office@demo.keenroute.test')
    )<{
      items: { id: string; status: string; customer: { name: string } }[];
    }>('GET', `/api/tickets?status=handed-back`);
    expect(tickets.items.some((t) => t.customer.name === customerName)).toBe(true);
  });
});
