/**
 * An admin changes the organisation's defaults on the settings page, typing as a person does:
 * the server action saves them (with its audit entry), a reload shows them, and a value the
 * schema refuses is named at its field and saves nothing; a save that cannot reach the server says
 * so. Real browser, server and database.
 * Harrow Fen's owner is used so that the Kestrel Bay defaults other tests read stay as seeded;
 * the figures are put back at the end.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { NO_ANSWER } from '@/lib/reach-action';
import { closeBrowser, signedInPage } from './support/browser';

afterAll(closeBrowser);

describe('organisation defaults', () => {
  it('are saved by an admin, shown after a reload, and an invalid WACC is refused at its field', async () => {
    const { context, page } = await signedInPage('owner@harrowfen.example');
    await page.goto('/settings');
    const wacc = page.getByLabel('WACC (% a year)');
    const days = page.getByLabel('Alert before a window closes (days)');
    const before = { wacc: await wacc.inputValue(), days: await days.inputValue() };

    await wacc.fill('');
    await wacc.pressSequentially('9.25');
    await days.fill('');
    await days.pressSequentially('45');
    await page.getByRole('button', { name: 'Save defaults' }).click();
    await expect.poll(() => page.getByText('Organisation defaults saved.').isVisible()).toBe(true);
    await page.reload();
    await expect.poll(() => wacc.inputValue()).toBe('9.25');
    expect(await days.inputValue()).toBe('45');

    // A WACC of 250 % is outside the schema's range: the field says so and nothing is saved.
    await wacc.fill('');
    await wacc.pressSequentially('250');
    await page.getByRole('button', { name: 'Save defaults' }).click();
    await expect.poll(() => page.getByText('Must be at most 50 %.').isVisible()).toBe(true);
    expect(await wacc.getAttribute('aria-invalid')).toBe('true');
    await page.reload();
    await expect.poll(() => wacc.inputValue()).toBe('9.25');

    await wacc.fill(before.wacc);
    await days.fill(before.days);
    await page.getByRole('button', { name: 'Save defaults' }).click();
    await expect.poll(() => page.getByText('Organisation defaults saved.').count()).toBeGreaterThan(0);
    await page.reload();
    await expect.poll(() => wacc.inputValue()).toBe(before.wacc);
    await context.close();
  });

  it('says so when the server cannot be reached, and keeps what was typed', async () => {
    // Before, a save whose request never arrived threw in the page and the form said nothing.
    const { context, page } = await signedInPage('owner@harrowfen.example');
    await page.goto('/settings');
    const save = page.getByRole('button', { name: 'Save defaults' });
    await expect.poll(() => save.isEnabled(), { timeout: 30_000 }).toBe(true);
    const wacc = page.getByLabel('WACC (% a year)');
    const before = await wacc.inputValue();
    await context.setOffline(true);
    await wacc.fill('');
    await wacc.pressSequentially('11.5');
    await save.click();
    await expect.poll(() => page.getByText(NO_ANSWER).isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await wacc.inputValue()).toBe('11.5');
    expect(await save.isEnabled()).toBe(true);
    await context.setOffline(false);
    await page.reload();
    await expect.poll(() => wacc.inputValue()).toBe(before);
    await context.close();
  });
});
