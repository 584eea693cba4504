import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  BASE_URL,
  DEMO_PASSWORD,
  DESKTOP,
  PHONE,
  launchBrowser,
  openPhoneNavigation,
  overflowsHorizontally,
  screenshot,
  signIn,
  type Browser,
  openFromNavigation,
} from './browser';

const OWNER = 'owner@demo.keenroute.test';

/** "$1,234.50" → 123450. */
function cents(text: string): number {
  const match = /\$([\d,]+)\.(\d{2})/.exec(text);
  if (!match) throw new Error(`No amount in "${text}"`);
  return Number(match[1]!.replace(/,/g, '')) * 100 + Number(match[2]);
}

async function ownerToken(): Promise<string> {
  const response = await fetch(`${BASE_URL}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: OWNER, password: DEMO_PASSWORD }),
  });
  if (!response.ok) throw new Error(`Signing in as ${OWNER}: HTTP ${response.status}`);
  return ((await response.json()) as { accessToken: string }).accessToken;
}

describe('the owner reads revenue per stop', () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });

  afterAll(async () => {
    await browser?.close();
  });

  it('opens Reports, sees the chart and a stop that earned, and downloads the CSV', async () => {
    const { page } = browser;
    await page.setViewportSize(DESKTOP);
    await signIn(page, OWNER);
    await openFromNavigation(page, /Reports/);
    await page.getByRole('heading', { level: 1, name: 'Revenue per stop' }).waitFor();

    // The demo data has two years of history, so the last 12 months have stops with revenue.
    const chart = page.getByRole('region', { name: 'Top stops' });
    await chart.locator('svg.recharts-surface').first().waitFor();
    expect(await chart.locator('.recharts-bar-rectangle').count()).toBeGreaterThan(0);

    const table = page.getByRole('table', { name: 'Revenue per stop' });
    await table.waitFor();
    const headers = await table.getByRole('columnheader').allTextContents();
    const revenueColumn = headers.indexOf('Revenue');
    expect(revenueColumn).toBeGreaterThan(0);
    const revenues = await table
      .locator('tbody tr')
      .evaluateAll((rows, column) => rows.map((row) => row.children[column]?.textContent ?? ''), revenueColumn);
    expect(revenues.length).toBeGreaterThan(0);
    expect(revenues.map(cents).some((amount) => amount > 0)).toBe(true);
    await screenshot(page, 'reports-stops-desktop');

    // A stop's name opens its monthly trend, drawn as a line.
    await table.locator('tbody tr').first().getByRole('button').click();
    const drawer = page.getByRole('dialog', { name: /: revenue by month$/ });
    await drawer.locator('svg.recharts-surface').first().waitFor();
    await screenshot(page, 'reports-stop-trend-desktop', { fullPage: false });
    await drawer.getByRole('button', { name: 'Close the trend' }).click();
    await drawer.waitFor({ state: 'hidden' });

    // The CSV, fetched with the sign-in and saved by the browser.
    const from = new URL(page.url()).searchParams.get('from');
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download CSV: Revenue per stop' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^keenroute-stops-\d{4}-\d{2}-\d{2}-\d{4}-\d{2}-\d{2}\.csv$/);
    const saved = await readFile(await download.path(), 'utf8');
    const [header, firstRow] = saved.replace(/^\uFEFF/, '').split(/\r?\n/);
    expect(header).toMatch(/^Stop,City,Cadence weeks,/);
    expect(header).toContain('Revenue');
    expect(header).toContain('Per route hour');
    expect(firstRow?.length).toBeGreaterThan(0);

    // The server names the same file for the same query.
    const response = await fetch(`${BASE_URL}/api/reports/stops/csv${from ? `?from=${from}` : ''}`, {
      headers: { authorization: `Bearer ${await ownerToken()}` },
    });
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toMatch(/^text\/csv/);
    expect(response.headers.get('content-disposition')).toMatch(/filename="keenroute-stops-/);
  });

  it('fits a phone: the table scrolls inside its box, not the page', async () => {
    const { page } = browser;
    await page.setViewportSize(PHONE);
    await page.goto(`${BASE_URL}/`);
    await openPhoneNavigation(page);
    await openFromNavigation(page, /Reports/);
    await page.getByRole('table', { name: 'Revenue per stop' }).waitFor();
    await page.getByRole('region', { name: 'Top stops' }).locator('svg.recharts-surface').first().waitFor();
    expect(await overflowsHorizontally(page)).toBe(false);
    await screenshot(page, 'reports-stops-phone');

    for (const report of ['Revenue', 'Drive cost', 'Cadence', 'What is owed']) {
      await page.getByRole('navigation', { name: 'Reports' }).getByRole('link', { name: report, exact: true }).click();
      await page.locator('[data-report-page] table, [data-report-page] article').first().waitFor();
      expect(await overflowsHorizontally(page)).toBe(false);
      await screenshot(page, `reports-${report.toLowerCase().replace(/ /g, '-')}-phone`);
    }
  });
});
