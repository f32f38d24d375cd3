/**
 * The case page's tabs are links to the page with that tab open: a click before the page's
 * script has run (a slow machine, a script that failed) still opens the tab, the address names
 * the open tab so a reload or a shared link keeps it, and the keyboard moves between tabs
 * (WAI-ARIA tabs pattern: arrows, Home, End).
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, newContext, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

let plant: Awaited<ReturnType<typeof demoCase>>;

beforeAll(async () => {
  plant = await demoCase('Phased bio-resin plant', 'Volatile demand');
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

/** Waits (generously: the machine may be loaded) until the named tab is the open one. */
async function expectOpen(page: Page, name: string) {
  await expect.poll(() => page.getByRole('tab', { name, exact: true }).getAttribute('aria-selected'), { timeout: 30_000, interval: 500 }).toBe('true');
}

describe('the case page’s tabs', () => {
  it('open without the page’s script, by their address', async () => {
    const { context } = await signedInPage('reviewer@kestrelbay.example');
    const scriptless = await newContext({ javaScriptEnabled: false, storageState: await context.storageState() });
    const page = await scriptless.newPage();
    await page.goto(plant.url);
    await expectOpen(page, 'Cash flows');
    expect(await page.getByRole('tabpanel', { name: 'Results' }).isVisible()).toBe(false);

    await page.getByRole('tab', { name: 'Results' }).click();
    await page.waitForURL(/\?tab=results$/, { timeout: 30_000 });
    await expectOpen(page, 'Results');
    expect(await page.getByRole('tab', { name: 'Cash flows' }).getAttribute('aria-selected')).toBe('false');
    // Without a script the panel holds what the server renders (the figures load with the script).
    expect(await page.getByRole('tabpanel', { name: 'Results' }).isVisible()).toBe(true);
    expect(await page.getByRole('tabpanel', { name: 'Cash flows' }).isVisible()).toBe(false);
    await scriptless.close();
    await context.close();
  });

  it('follow the keyboard, name the open tab in the address and keep it on reload', async () => {
    const { context, page } = await signedInPage('reviewer@kestrelbay.example');
    await page.goto(`${plant.url}?tab=results`);
    await expectOpen(page, 'Results');
    // The paths field appears once the page's script has loaded the cross-checks: the keys work from then on.
    await expect.poll(() => page.getByLabel('Cross-check paths (each pass)').isVisible(), { timeout: 30_000, interval: 500 }).toBe(true);

    await page.getByRole('tab', { name: 'Results' }).focus();
    await page.keyboard.press('ArrowRight');
    await expectOpen(page, 'Lattice');
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Lattice');
    expect(new URL(page.url()).searchParams.get('tab')).toBe('lattice');

    await page.keyboard.press('Home');
    await expectOpen(page, 'Cash flows');
    expect(new URL(page.url()).searchParams.get('tab')).toBe('cash-flows');

    await page.keyboard.press('End');
    await expectOpen(page, 'Review');
    expect(new URL(page.url()).searchParams.get('tab')).toBe('review');
    // The reload is the last step with keys before it: a key pressed before the reloaded page's
    // script runs would be lost, and on a loaded machine that could take a while.
    await page.reload();
    await expectOpen(page, 'Review');

    // An address naming no tab (an old link, a typo) opens the first one.
    await page.goto(`${plant.url}?tab=nonsense`);
    await expectOpen(page, 'Cash flows');
    await context.close();
  });
});
