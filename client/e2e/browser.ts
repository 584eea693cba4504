import { mkdir, mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const BASE_URL = (process.env.KEENROUTE_E2E_BASE_URL ?? 'http://127.0.0.1:3000').replace(/\/$/, '');
export const ARTIFACTS_DIR = process.env.ARTIFACTS_DIR ?? fileURLToPath(new URL('../../artifacts', import.meta.url));
export const DEMO_PASSWORD = 'keenroute-demo';

export const DESKTOP = { width: 1280, height: 800 };
export const PHONE = { width: 360, height: 740 };

export interface Browser {
  context: BrowserContext;
  page: Page;
  close: () => Promise<void>;
}

/** Debian's Chromium in a throwaway profile; nothing is downloaded. */
export async function launchBrowser(): Promise<Browser> {
  const profile = await mkdtemp(join(tmpdir(), 'keenroute-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    viewport: DESKTOP,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  context.setDefaultTimeout(20_000);
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      await rm(profile, { recursive: true, force: true });
    },
  };
}

export async function screenshot(page: Page, name: string, { fullPage = true } = {}): Promise<void> {
  await mkdir(ARTIFACTS_DIR, { recursive: true });
  await page.screenshot({ path: join(ARTIFACTS_DIR, `${name}.png`), fullPage });
}

/** Opens the phone's navigation and waits until it has slid fully into view. */
export async function openPhoneNavigation(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Open navigation' }).click();
  await page.waitForFunction(() => {
    const nav = document.querySelector('nav[aria-label="Main"]');
    return nav !== null && nav.getBoundingClientRect().left >= 0;
  });
}

/** Follows a link of the main navigation, as a person would from any page (on a phone, open the navigation first). */
export async function openFromNavigation(page: Page, name: string | RegExp): Promise<void> {
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name }).click();
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByRole('textbox', { name: 'E-mail' }).fill(email);
  await page.getByLabel(/^Password/).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}

export async function navLabels(page: Page): Promise<string[]> {
  const links = page.getByRole('navigation', { name: 'Main' }).getByRole('link');
  const texts = await links.evaluateAll((nodes) =>
    nodes.map((node) => node.querySelector('.mantine-NavLink-label')?.textContent?.trim() ?? ''),
  );
  return texts;
}

/** A page wider than the screen means something does not fit a phone. */
export async function overflowsHorizontally(page: Page): Promise<boolean> {
  return page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth + 1);
}

/** The badges whose words do not fit inside them (shown cut short with "…"): a squeezed status or day name. */
export async function cutBadges(page: Page): Promise<string[]> {
  return page.evaluate(() =>
    [...document.querySelectorAll('.mantine-Badge-label')]
      .filter((label) => label.scrollWidth > label.clientWidth + 1)
      .map((label) => label.textContent ?? ''),
  );
}

/** Calls the API as a demo user, for the set-up the office or a planner would have done before the journey. */
export async function api(email: string, password = DEMO_PASSWORD) {
  const login = await fetch(`${BASE_URL}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (!login.ok) throw new Error(`Signing in as ${email}: HTTP ${login.status}`);
  const { accessToken } = (await login.json()) as { accessToken: string };
  return async <T>(method: string, path: string, body?: unknown): Promise<T> => {
    const response = await fetch(`${BASE_URL}${path}`, {
      method,
      headers: { authorization: `Bearer ${accessToken}`, 'content-type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    if (!response.ok) throw new Error(`${method} ${path}: HTTP ${response.status} ${await response.text()}`);
    return (response.status === 204 ? undefined : await response.json()) as T;
  };
}
