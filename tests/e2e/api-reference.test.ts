/**
 * The API reference page (issue 14), in Chromium at 1280×800: any signed-in role reads every
 * operation of the OpenAPI document, grouped, with its fields and an example request that the
 * keyboard can reach and copy; without a session the page sends the visitor to sign in.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { operations } from '@/lib/openapi/operations';
import { closeBrowser, newContext, signedInPage } from './support/browser';

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('the API reference page', () => {
  it('shows every operation with its example request, and copies one with the keyboard', async () => {
    const { page, context } = await signedInPage('executive@kestrelbay.example');
    await context.grantPermissions(['clipboard-read', 'clipboard-write']);
    await page.goto('/api-reference');
    await expect.poll(() => page.getByRole('heading', { name: 'API reference', level: 1 }).isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await page.locator('article').count()).toBe(Object.keys(operations).length);
    for (const op of Object.values(operations)) expect(await page.getByRole('heading', { name: op.summary, exact: true }).count(), op.summary).toBe(1);
    const create = page.locator('article#createApiKey');
    expect(await create.getByRole('cell', { name: 'expiresInDays' }).isVisible()).toBe(true);
    expect(await create.getByText('"analyst" | "reviewer" | "viewer"').isVisible()).toBe(true);

    // Reach the example's copy button with Tab from the example before it, as a keyboard user does.
    const button = create.getByRole('button', { name: /Copy the example request/ });
    await page.locator('article#listApiKeys pre').focus();
    for (let k = 0; k < 12 && !(await button.evaluate((b) => b === document.activeElement)); k++) await page.keyboard.press('Tab');
    expect(await button.evaluate((b) => b === document.activeElement)).toBe(true);
    await page.keyboard.press('Enter');
    await expect.poll(() => button.textContent(), { timeout: 30_000 }).toBe('Copied');
    const copied = await page.evaluate(() => navigator.clipboard.readText());
    expect(copied).toContain('curl -X POST');
    expect(copied).toContain('/api/v1/api-keys');
    expect(copied).toContain('Bearer $LEEWAY_API_KEY');
    await page.screenshot({ path: '.data/api-reference.png', fullPage: false });
  }, 120_000);

  it('sends a visitor without a session to sign in', async () => {
    const context = await newContext();
    const page = await context.newPage();
    await page.goto('/api-reference');
    await expect.poll(() => new URL(page.url()).pathname, { timeout: 30_000 }).toBe('/sign-in');
    await context.close();
  });
});
