/**
 * Debian's Chromium driven by playwright-core. Each test gets a fresh context with its own
 * client address header, so the sign-in rate limit (per address) counts each context separately.
 */
import { randomInt } from 'node:crypto';
import { chromium, type Browser, type BrowserContext, type BrowserContextOptions, type Page } from 'playwright-core';
import { expect } from 'vitest';
import { BASE_URL, DEMO_PASSWORD } from './env';

let browser: Browser | null = null;

export async function openBrowser(): Promise<Browser> {
  browser ??= await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--no-sandbox',
      '--headless',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--disable-dev-shm-usage',
    ],
  });
  return browser;
}

export async function closeBrowser() {
  await browser?.close();
  browser = null;
}

/**
 * A random address of the 198.18.0.0/15 benchmarking range (a header only; no traffic goes
 * there): a client sending it as X-Forwarded-For counts against the sign-in rate limit on its own.
 */
export const visitorAddress = () => `198.${18 + randomInt(2)}.${randomInt(256)}.${1 + randomInt(254)}`;

export async function newContext(options: BrowserContextOptions = {}): Promise<BrowserContext> {
  const b = await openBrowser();
  return b.newContext({
    viewport: { width: 1280, height: 800 },
    ...options,
    baseURL: BASE_URL,
    // Every context, in every test file, has an address of its own (visitorAddress).
    // The app's own Origin, as a browser sends it: API calls from page.request would otherwise
    // carry none, and the app refuses state-changing requests without it (lib/same-origin.ts).
    extraHTTPHeaders: { 'x-forwarded-for': visitorAddress(), origin: BASE_URL },
  });
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

export async function signedInPage(email: string, options: BrowserContextOptions = {}): Promise<{ context: BrowserContext; page: Page }> {
  const context = await newContext(options);
  const page = await context.newPage();
  await signIn(page, email);
  await page.waitForURL('**/portfolio');
  return { context, page };
}

export async function navLabels(page: Page): Promise<string[]> {
  const nav = page.getByRole('navigation', { name: 'Main' });
  await expect.poll(async () => nav.isVisible()).toBe(true);
  return nav.getByRole('link').allInnerTexts();
}
