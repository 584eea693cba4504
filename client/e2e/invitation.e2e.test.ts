import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, navLabels, openFromNavigation, screenshot, signIn, type Browser } from './browser';

interface CaughtMessage {
  to: string | string[];
  subject: string;
  text?: string;
  html?: string;
}

const MAIL_CATCHER_URL = process.env.MAIL_CATCHER_URL?.replace(/\/$/, '');
const SET_PASSWORD_LINK = /https?:\/\/[^\s"'<>]+\/set-password\?token=[^\s"'<>&]+/;

async function waitForLinkTo(address: string): Promise<string> {
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    const response = await fetch(`${MAIL_CATCHER_URL}/messages`);
    const { items } = (await response.json()) as { items: CaughtMessage[] };
    const message = items.find((item) =>
      [item.to].flat().some((to) => to.toLowerCase().includes(address.toLowerCase())),
    );
    const link = message && `${message.text ?? ''} ${message.html ?? ''}`.match(SET_PASSWORD_LINK)?.[0];
    if (link) return link.replace(/&amp;/g, '&');
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
  throw new Error(`No invitation e-mail to ${address} reached the mail catcher within 30 s`);
}

describe('the invitation journey', () => {
  let browser: Browser;
  const stamp = Date.now().toString(36);
  const invitee = { name: `Morgan Strop ${stamp}`, email: `morgan.${stamp}@demo.keenroute.test` };

  beforeAll(async () => {
    if (!MAIL_CATCHER_URL) throw new Error('Set MAIL_CATCHER_URL to the mail catcher the server sends to');
    browser = await launchBrowser();
  });

  afterAll(async () => {
    await browser?.close();
  });

  it('invites a sharpener who sets a password and lands signed in; the link then works no more', async () => {
    const { page, context } = browser;
    await signIn(page, 'owner@demo.keenroute.test');
    await openFromNavigation(page, 'Team');
    await page.getByRole('button', { name: 'Invite someone' }).click();

    const dialog = page.getByRole('dialog', { name: 'Invite someone to Keenroute' });
    await dialog.getByRole('textbox', { name: 'Name' }).fill(invitee.name);
    await dialog.getByRole('textbox', { name: 'E-mail' }).fill(invitee.email);
    await dialog.getByRole('combobox', { name: 'Role' }).click();
    await page.getByRole('option', { name: 'Sharpener' }).click();
    await dialog.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText('Invitation sent').waitFor();
    await page.getByText(invitee.email).first().waitFor();
    await screenshot(page, 'invitation-sent');

    const link = await waitForLinkTo(invitee.email);

    await openFromNavigation(page, 'Outbox');
    await page.getByRole('link', { name: link }).first().waitFor();

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
    await context.clearCookies();

    await page.goto(link);
    await page.getByRole('heading', { level: 1, name: 'Welcome to Keenroute' }).waitFor();
    await page.getByText(invitee.name).waitFor();
    await page.getByLabel(/^New password/).fill('steady hands on the flat hone');
    await page.getByLabel(/^The same password again/).fill('steady hands on the flat hone');
    await screenshot(page, 'invitation-set-password');
    await page.getByRole('button', { name: 'Set password and sign in' }).click();

    await page.getByRole('heading', { level: 1, name: /^Good (morning|afternoon|evening), Morgan$/ }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/');
    expect(await navLabels(page)).toEqual([
      'Home',
      'Today',
      'My week',
      'Tickets',
      'Coming due',
      'Stops',
      'Customers',
      'Shears',
      'Drop-offs',
      'Edge recipes',
    ]);
    expect(await page.getByTestId('signed-in-as').textContent()).toContain('Sharpener');
    await screenshot(page, 'invitation-signed-in');

    await page.goto(link);
    await page.getByText('This link has expired or was already used; ask for a new one.').waitFor();
    await screenshot(page, 'invitation-link-used');
  });
});
