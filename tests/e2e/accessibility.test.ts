/**
 * Every page, as each role sees it, passes axe-core's checks (WCAG 2 A and AA, and axe's best
 * practices), run in Chromium on the page once its figures have loaded. The first run found:
 * muted text at 4.42:1 on paper and 3.98:1 on the sunk panels (AA asks 4.5:1), the case page
 * without a level-one heading for those who may edit its name, tab panels whose sections jumped
 * from h1 to h3, and lattice nodes whose names did not contain the words they show. And a
 * keyboard user's first Tab offers to skip the navigation (it led through every link first).
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { axeFindings } from './support/axe';
import { closeBrowser, signedInPage } from './support/browser';
import { caseTabUrls, demoCase } from './support/demo';

/** Opens each address and waits (generously: the machine may be loaded) until axe finds nothing. */
async function expectClean(page: Page, addresses: string[]) {
  for (const address of addresses) {
    await page.goto(address);
    // Pages load their figures after the script: judge the page once its requests have settled,
    // not the skeleton before them (a page that keeps polling is judged after 30 s).
    await page.waitForLoadState('networkidle', { timeout: 30_000 }).catch(() => undefined);
    await expect.poll(async () => ({ address, found: await axeFindings(page) }), { timeout: 45_000, interval: 1_500 }).toEqual({ address, found: [] });
  }
}

let caseUrl: string;
let projectUrl: string;

beforeAll(async () => {
  const plant = await demoCase('Phased bio-resin plant', 'Volatile demand');
  caseUrl = plant.url;
  projectUrl = `/projects/${plant.projectId}`;
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('accessibility (axe-core)', () => {
  it("the analyst's pages, every tab of a case included", async () => {
    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    await expectClean(page, ['/portfolio', '/projects', projectUrl, '/compare', '/alerts', ...caseTabUrls(caseUrl)]);
    await context.close();
  }, 600_000);

  it('the reviewer’s queue and a case read-only, as the executive sees it', async () => {
    const reviewer = await signedInPage('reviewer@kestrelbay.example');
    await expectClean(reviewer.page, ['/review', `${caseUrl}?tab=review`]);
    await reviewer.context.close();
    const executive = await signedInPage('executive@kestrelbay.example');
    await expectClean(executive.page, ['/portfolio', ...caseTabUrls(caseUrl)]);
    await executive.context.close();
  }, 600_000);

  it("the admin's settings, members, keys and the API reference", async () => {
    const { context, page } = await signedInPage('admin@kestrelbay.example');
    await expectClean(page, ['/settings', '/settings/members', '/settings/api-keys', '/api-reference']);
    await context.close();
  }, 600_000);

  it('the keyboard’s first stop skips the navigation: Enter, then Tab, lands in the page', async () => {
    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    await page.goto(projectUrl);
    await page.getByRole('button', { name: 'New case', exact: true }).waitFor({ timeout: 30_000 });
    const focused = () =>
      page.evaluate(() => {
        const el = document.activeElement as HTMLElement;
        const box = el.getBoundingClientRect();
        return {
          text: el.textContent?.trim() ?? '',
          inMain: el.closest('main') !== null,
          inNav: el.closest('nav[aria-label="Main"]') !== null,
          shown: box.width > 1 && box.height > 1,
        };
      });
    await page.keyboard.press('Tab');
    expect(await focused()).toEqual({ text: 'Skip to the page', inMain: false, inNav: false, shown: true });
    await page.keyboard.press('Enter');
    await page.keyboard.press('Tab');
    const next = await focused();
    expect([next.inMain, next.inNav]).toEqual([true, false]);
    await context.close();
  }, 300_000);
});
