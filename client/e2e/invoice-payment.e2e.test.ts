import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  BASE_URL,
  DESKTOP,
  PHONE,
  api,
  launchBrowser,
  overflowsHorizontally,
  screenshot,
  signIn,
  type Browser,
  openFromNavigation,
} from './browser';

const MAIL_CATCHER_URL = process.env.MAIL_CATCHER_URL?.replace(/\/$/, '');

interface Ticket {
  id: string;
  lines: { id: string }[];
}

/** The pay link in the invoice e-mail the customer received (from the local mail catcher). */
async function payLinkMailedTo(email: string): Promise<string> {
  if (!MAIL_CATCHER_URL) throw new Error('Set MAIL_CATCHER_URL to the mail catcher the server sends to');
  const deadline = Date.now() + 15_000;
  for (;;) {
    const { items } = (await (await fetch(`${MAIL_CATCHER_URL}/messages`)).json()) as {
      items: { to: string[]; subject: string; text: string }[];
    };
    const mail = items.find((item) => item.to.some((to) => to.includes(email)) && /Invoice KR-/.test(item.subject));
    const link = mail && /https?:\/\/[^\s)>\]]+\/pay\/[A-Za-z0-9._-]+/.exec(mail.text)?.[0];
    if (link) return link;
    if (Date.now() > deadline) throw new Error(`No invoice e-mail with a pay link reached ${email}.`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

describe('an invoice sent, paid online, and shown paid', () => {
  let browser: Browser;
  const tag = randomUUID().slice(0, 6);
  const customerName = `Invoice Test Groomer ${tag}`;
  const customerEmail = `invoice-test-${tag}@demo.keenroute.test`;

  beforeAll(async () => {
    browser = await launchBrowser();
    // The sharpener's part, done through the API: a customer's pair worked on a visit and left for an invoice.
    const office = await api('office@demo.keenroute.test');
    const stop = await office<{ id: string }>('POST', '/api/stops', {
      name: `Invoice Test Salon ${tag}`,
      kind: 'salon',
      street: '104 Alder Row',
      city: 'Larkhaven',
      latitude: 44.8123,
      longitude: -92.4071,
      openingHours: {},
      cadenceWeeks: 8,
      taxRateBp: 825,
    });
    const customer = await office<{ id: string }>('POST', '/api/customers', {
      name: customerName,
      email: customerEmail,
      stopId: stop.id,
    });
    const shear = await office<{ tagCode: string }>('POST', '/api/shears', {
      customerId: customer.id,
      make: 'Invented Make',
      model: 'Demo 6',
      lengthIn: 6,
      edgeType: 'convex',
      toolKind: 'straight',
      handedness: 'right',
      use: 'hair',
    });
    let ticket = await office<Ticket>('POST', '/api/tickets', {
      customerId: customer.id,
      stopId: stop.id,
      kind: 'visit',
    });
    ticket = await office<Ticket>('POST', `/api/tickets/${ticket.id}/lines`, { tagCode: shear.tagCode });
    for (const benchStatus of ['on-the-bench', 'ready']) {
      await office('PATCH', `/api/tickets/${ticket.id}/lines/${ticket.lines[0]!.id}`, { benchStatus });
    }
    await office('POST', `/api/tickets/${ticket.id}/finish`);
    await office('POST', `/api/tickets/${ticket.id}/settle`, { settlement: 'to-invoice' });
  });

  afterAll(async () => {
    await browser?.close();
  });

  it('the office makes and sends the invoice, the customer pays on the checkout page, and the invoice shows paid', async () => {
    const { page, context } = browser;
    await page.setViewportSize(DESKTOP);
    await signIn(page, 'office@demo.keenroute.test');

    await openFromNavigation(page, /Invoices/);
    await page.getByRole('link', { name: 'New invoice' }).click();
    const group = page.getByRole('region', { name: customerName });
    await group.getByRole('button', { name: 'Make the draft invoice' }).click();
    await page.getByRole('heading', { name: /Draft/ }).first().waitFor();
    await screenshot(page, 'invoice-draft-desktop');

    await page.getByRole('button', { name: 'Send by e-mail' }).click();
    const dialog = page.getByRole('dialog', { name: 'Send the invoice' });
    await expect(dialog.getByRole('textbox', { name: 'To' }).inputValue()).resolves.toBe(customerEmail);
    await dialog.getByRole('button', { name: 'Issue and send' }).click();
    await dialog.waitFor({ state: 'hidden' });
    await page
      .getByText(/KR-\d{4}-\d{4}/)
      .first()
      .waitFor();
    const invoiceUrl = page.url();
    await screenshot(page, 'invoice-sent-desktop');

    // The customer, signed out on a phone, follows the link in the e-mail.
    const payLink = await payLinkMailedTo(customerEmail);
    expect(payLink.startsWith(`${BASE_URL}/pay/`)).toBe(true);
    const phone = await context.newPage();
    await phone.setViewportSize(PHONE);
    await phone.goto(payLink);
    const payButton = phone.getByRole('button', { name: /^Pay \$\d+\.\d{2} online$/ });
    await payButton.waitFor();
    const amount = /\$\d+\.\d{2}/.exec((await payButton.textContent()) ?? '')![0];
    expect(await overflowsHorizontally(phone)).toBe(false);
    await screenshot(phone, 'invoice-pay-page-phone');
    await payButton.click();

    // The local payment stand-in's checkout page: the same amount, then Pay.
    await phone.getByRole('button', { name: 'Pay', exact: true }).waitFor();
    await phone.getByText(amount).first().waitFor();
    await screenshot(phone, 'invoice-checkout-phone');
    await phone.getByRole('button', { name: 'Pay', exact: true }).click();

    // Back on Keenroute, which waits for the signed webhook rather than trusting the redirect.
    await phone.waitForURL(/\/pay\/[^/]+\/done/);
    await phone.getByText(/Paid\. A receipt is on its way\./).waitFor({ timeout: 60_000 });
    await screenshot(phone, 'invoice-paid-phone');
    await phone.close();

    await page.goto(invoiceUrl);
    await page.getByText('Paid online').first().waitFor();
    await expect(page.getByText('Paid', { exact: true }).first().isVisible()).resolves.toBe(true);
    await screenshot(page, 'invoice-paid-desktop');
  });
});
