/**
 * Before the page's script has run (a loaded machine, a slow connection), its buttons do nothing:
 * a plain button ignores the click and a form is sent by the browser itself, as a GET of the page
 * with the fields in its address. So every button is disabled until the script has taken the
 * page over, and says so by its look. Chromium with scripts off stands for that moment: the
 * page is the server's HTML, as a person sees it before it is ready.
 */
import type { Page } from 'playwright-core';
import { afterAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, newContext, signedInPage } from './support/browser';
import { demoCase } from './support/demo';
import { DEMO_PASSWORD } from './support/env';

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

// The buttons in the server's HTML of a project's page, its case table's included (the table
// came only with the script before 2026-12-05).
const buttons = ['Rename…', 'Archive…', 'Delete…', 'Sign out', 'New case', 'Duplicate Base case', 'Delete Base case'];

const enabled = (page: Page) => Promise.all(buttons.map((name) => page.getByRole('button', { name, exact: true }).isEnabled()));

describe('before the page’s script has run', () => {
  it('a project’s cases are there and its buttons disabled, and they work once the script has run', async () => {
    const { projectId } = await demoCase('Older extrusion line', 'Base case');
    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    const scriptless = await newContext({ javaScriptEnabled: false, storageState: await context.storageState() });
    const before = await scriptless.newPage();
    await before.goto(`/projects/${projectId}`);
    expect(await enabled(before)).toEqual(buttons.map(() => false));
    // The cases and their figures are in the server's HTML: a person sees them before the script.
    const table = before.getByRole('table', { name: 'Cases of this project' });
    expect(await table.getByRole('link', { name: 'Base case', exact: true }).isVisible()).toBe(true);
    expect(await table.getByRole('cell', { name: /^EUR / }).count()).toBeGreaterThanOrEqual(3);
    // And so is the project's activity (the demo's cases were valued by the analyst).
    const activity = before.getByRole('region', { name: 'Activity' }).getByRole('listitem');
    expect(await activity.filter({ hasText: /valued “/ }).count()).toBeGreaterThanOrEqual(1);
    await scriptless.close();

    await page.goto(`/projects/${projectId}`);
    await expect.poll(() => enabled(page), { timeout: 30_000, interval: 500 }).toEqual(buttons.map(() => true));
    await page.getByRole('button', { name: 'New case', exact: true }).click();
    await expect.poll(() => page.getByRole('dialog', { name: 'New case' }).isVisible(), { timeout: 30_000 }).toBe(true);
    await context.close();
  });

  it('Enter in the sign-in form sends nothing: the password never reaches the address', async () => {
    const scriptless = await newContext({ javaScriptEnabled: false });
    const page = await scriptless.newPage();
    await page.goto('/sign-in');
    const sent: string[] = [];
    page.on('request', (r) => {
      if (r.isNavigationRequest()) sent.push(r.url());
    });
    expect(await page.getByRole('button', { name: 'Sign in' }).isEnabled()).toBe(false);
    await page.getByLabel('E-mail').pressSequentially('analyst@kestrelbay.example');
    await page.getByLabel('Password').pressSequentially(DEMO_PASSWORD);
    await page.getByLabel('Password').press('Enter');
    // Implicit submission needs an enabled default button (HTML, "implicit submission"). Had the
    // browser sent the form, its request would start at the key press; a second is ample to see it.
    await page.waitForTimeout(1000);
    expect(sent).toEqual([]);
    expect(new URL(page.url()).search).toBe('');
    expect(await page.getByLabel('Password').inputValue()).toBe(DEMO_PASSWORD);
    await scriptless.close();
  });
});
