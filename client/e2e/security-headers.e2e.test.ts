import { crc32, deflateSync } from 'node:zlib';
import type { Page, Response } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, DEMO_PASSWORD, launchBrowser, signIn, type Browser } from './browser';

interface Violation {
  page: string;
  directive: string;
  blocked: string;
  source?: string;
}

/** A small valid PNG, so a shear has a photo whose thumbnail the page shows through a blob: URL. */
function png(width: number, height: number): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([length, body, crc]);
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8; // bit depth
  header[9] = 2; // truecolour
  const rows = Buffer.alloc((width * 3 + 1) * height, 0x80);
  for (let y = 0; y < height; y++) rows[y * (width * 3 + 1)] = 0; // filter: none
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([
    signature,
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(rows)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** One sign-in for the set-up: reads as JSON, and uploads a photo as the shear page's own form would. */
async function signedInApi(email: string) {
  const login = await fetch(`${BASE_URL}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  if (!login.ok) throw new Error(`Signing in as ${email}: HTTP ${login.status}`);
  const { accessToken } = (await login.json()) as { accessToken: string };
  const authorization = `Bearer ${accessToken}`;
  return {
    get: async <T>(path: string): Promise<T> => {
      const response = await fetch(`${BASE_URL}${path}`, { headers: { authorization } });
      if (!response.ok) throw new Error(`GET ${path}: HTTP ${response.status}`);
      return (await response.json()) as T;
    },
    uploadPhoto: async (shearId: string): Promise<void> => {
      const form = new FormData();
      form.append('photo', new Blob([new Uint8Array(png(64, 48))], { type: 'image/png' }), 'blade.png');
      const response = await fetch(`${BASE_URL}/api/shears/${shearId}/photos`, {
        method: 'POST',
        headers: { authorization },
        body: form,
      });
      if (!response.ok) throw new Error(`Uploading a photo: HTTP ${response.status} ${await response.text()}`);
    },
  };
}

/** Waits until the page has loaded and its API calls have settled (charts, photos, lazy chunks). */
async function settle(page: Page): Promise<void> {
  await page.waitForLoadState('networkidle');
}

/**
 * The built client under the server's content security policy: every page of each role is opened and every policy
 * violation (the `securitypolicyviolation` event, and Chromium's console report of one) is recorded; there must be none.
 */
describe('the content security policy in a browser', () => {
  let browser: Browser;
  const violations: Violation[] = [];
  const documents: Response[] = [];
  const visited: string[] = [];

  beforeAll(async () => {
    browser = await launchBrowser();
    const { context } = browser;
    await context.exposeBinding('reportPolicyViolation', ({ page }, violation: Omit<Violation, 'page'>) => {
      violations.push({ page: page.url(), ...violation });
    });
    await context.addInitScript(() => {
      document.addEventListener('securitypolicyviolation', (event) => {
        const report = (window as unknown as { reportPolicyViolation: (v: object) => void }).reportPolicyViolation;
        void report({ directive: event.effectiveDirective, blocked: event.blockedURI, source: event.sourceFile });
      });
    });
    const watch = (page: Page) => {
      page.on('console', (message) => {
        if (/Content Security Policy/i.test(message.text())) {
          violations.push({ page: page.url(), directive: 'console', blocked: message.text() });
        }
      });
      page.on('response', (response) => {
        if (response.request().resourceType() === 'document' && response.url().startsWith(BASE_URL)) {
          documents.push(response);
        }
      });
    };
    context.pages().forEach(watch);
    context.on('page', watch);
  });

  afterAll(async () => {
    await browser?.close();
  });

  async function visitEveryNavPage(page: Page): Promise<void> {
    // By position: some links carry a count badge in their name (the Outbox).
    const links = page.getByRole('navigation', { name: 'Main' }).getByRole('link');
    const count = await links.count();
    expect(count).toBeGreaterThan(3);
    for (let index = 0; index < count; index++) {
      await links.nth(index).click();
      await settle(page);
      visited.push(new URL(page.url()).pathname);
    }
  }

  it('serves the page itself with the policy and helmet headers', async () => {
    const { page } = browser;
    const response = (await page.goto(`${BASE_URL}/sign-in`))!;
    const headers = response.headers();
    expect(headers['content-security-policy']).toContain("script-src 'self'");
    expect(headers['content-security-policy']).toContain("frame-ancestors 'none'");
    expect(headers['x-content-type-options']).toBe('nosniff');
    expect(headers['cross-origin-opener-policy']).toBe('same-origin');
    await settle(page);
  });

  it('the owner: every page in the navigation, a stop, an invoice and a shear with a photo', async () => {
    const { page } = browser;
    const owner = await signedInApi('owner@demo.keenroute.test');
    const shears = await owner.get<{ items: { id: string }[] }>('/api/shears');
    const shearId = shears.items[0]!.id;
    await owner.uploadPhoto(shearId);

    await signIn(page, 'owner@demo.keenroute.test');
    await visitEveryNavPage(page);

    const stops = await owner.get<{ items: { id: string }[] }>('/api/stops');
    await page.goto(`${BASE_URL}/stops/${stops.items[0]!.id}`);
    await settle(page);
    const invoices = await owner.get<{ items: { id: string }[] }>('/api/invoices');
    expect(invoices.items.length).toBeGreaterThan(0);
    await page.goto(`${BASE_URL}/invoices/${invoices.items[0]!.id}`);
    await settle(page);
    await page.goto(`${BASE_URL}/shears/${shearId}`);
    await page.locator('img[src^="blob:"]').first().waitFor();
    await settle(page);
    await page.goto(`${BASE_URL}/api/docs`);
    await page.locator('.swagger-ui').first().waitFor();
    await settle(page);
    expect(violations).toEqual([]);
  });

  it('the sharpener and the client: every page in their navigation', async () => {
    const { page } = browser;
    for (const email of ['sharpener@demo.keenroute.test', 'client@demo.keenroute.test']) {
      await browser.context.clearCookies();
      await signIn(page, email);
      await visitEveryNavPage(page);
    }
    expect(visited.length).toBeGreaterThan(20);
    expect(violations).toEqual([]);
  });

  it('the public pay page, and the hand-over to the payment service’s own checkout page', async () => {
    const { page } = browser;
    const office = await signedInApi('office@demo.keenroute.test');
    const list = await office.get<{ items: { id: string; status: string }[] }>('/api/invoices');
    const open = list.items.find((invoice) => ['sent', 'part-paid', 'overdue'].includes(invoice.status));
    expect(open, 'the demo has an invoice waiting for payment').toBeDefined();
    const invoice = await office.get<{ payUrl: string | null }>(`/api/invoices/${open!.id}`);
    await browser.context.clearCookies();
    await page.goto(invoice.payUrl!);
    const pay = page.getByRole('button', { name: /^Pay \$\d+\.\d{2} online$/ });
    await pay.waitFor();
    await pay.click();
    await page.getByRole('button', { name: 'Pay', exact: true }).waitFor();
    expect(new URL(page.url()).origin).not.toBe(BASE_URL);
    expect(violations).toEqual([]);
    expect(documents.every((response) => response.headers()['content-security-policy'] !== undefined)).toBe(true);
  });
});
