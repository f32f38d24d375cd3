/**
 * The lattice is navigable beyond its first steps, in Chromium: the analyst jumps to the first
 * node where a right is used (found in the node grid the engine returns), the window moves there
 * with the node selected and explained, the window moves on by buttons and a typed step, and a
 * node is chosen with the keyboard alone; the exercise timing by year opens by keyboard too. The
 * demo plant's figures are invented.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

let url = '';

beforeAll(async () => {
  ({ url } = await demoCase('Phased bio-resin plant', 'Base case'));
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('the lattice window', () => {
  it('jumps to the first use of a right, moves by step, and selects nodes by keyboard', async () => {
    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    await page.goto(url);
    await page.getByRole('tab', { name: 'Lattice' }).click();
    const jumps = page.getByRole('group', { name: 'Jump to where a right is first used' });
    await expect.poll(() => jumps.getByRole('button', { name: 'Sell the plant' }).isEnabled(), { timeout: 60_000 }).toBe(true);

    await jumps.getByRole('button', { name: 'Sell the plant' }).click();
    const note = page.getByText(/Sell the plant is first used at step \d+/);
    await expect.poll(() => note.isVisible(), { timeout: 30_000 }).toBe(true);
    const step = Number(/first used at step (\d+)/.exec((await note.textContent())!)![1]);
    expect(step).toBeGreaterThan(10);
    // The chosen node is in the window, pressed, and it takes that right.
    const chosen = page.locator('[role="button"][aria-pressed="true"]');
    expect(await chosen.getAttribute('aria-label')).toMatch(new RegExp(`^V .* W .*: step ${step}, node \\d+, .*decision: Sell the plant$`));
    const inspector = page.getByRole('region', { name: 'Node inspector' });
    await expect.poll(async () => (await inspector.textContent()) ?? '', { timeout: 30_000 }).toMatch(new RegExp(`Step ${step}, node`, 'i'));
    // Modes in words, as the mode menu names them, not the engine's ids ("closed", "operating+Phase 2").
    expect(await inspector.textContent()).toContain('Sell the plant (to Closed (sold or abandoned)): worth');
    expect(await inspector.textContent()).toMatch(/· Operating/i);
    const from = Number(await page.getByLabel('From step').inputValue());
    expect(step).toBeGreaterThanOrEqual(from);

    // Later ▶ moves by the window's width; a typed step moves there.
    const width = Number(await page.getByLabel('Steps in the window').inputValue());
    await page.getByRole('button', { name: 'Later ▶' }).click();
    expect(Number(await page.getByLabel('From step').inputValue())).toBe(from + width);
    const typed = page.getByLabel('From step');
    await typed.fill('');
    await typed.pressSequentially('30');
    await expect.poll(() => page.getByRole('group', { name: /^Lattice, steps 30 to/ }).isVisible(), { timeout: 30_000 }).toBe(true);

    // Keyboard only: focus a node of the window and press Enter to inspect it.
    const node = page
      .getByRole('group', { name: /^Lattice, steps 30 to/ })
      .locator('[role="button"]')
      .first();
    await node.focus();
    await page.keyboard.press('Enter');
    expect(await node.getAttribute('aria-pressed')).toBe('true');
    expect(await node.getAttribute('aria-label')).toMatch(/^V .* W .*: step 30, node \d+,/);

    // The timing of each right's first use, year by year, opens by keyboard too (not a hover tooltip only).
    await page.getByRole('tab', { name: 'Results' }).click();
    const byYear = page.locator('summary', { hasText: 'By year' }).first();
    await expect.poll(() => byYear.isVisible(), { timeout: 30_000 }).toBe(true);
    await byYear.focus();
    await page.keyboard.press('Enter');
    const list = page.getByRole('list', { name: /^Probability of first exercise of / }).first();
    await expect.poll(() => list.isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await list.textContent()).toMatch(/year \d+–\d+: \d+\.\d %/);
    await context.close();
  }, 120_000);
});
