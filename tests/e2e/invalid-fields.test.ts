/**
 * A field holding text that is not a valid value blocks the case: the headline says its figures
 * use the last valid values and names the field, Save refuses and nothing is stored (before, the
 * field showed its message while Save stored the old values and the header said "saved"). The
 * steps field allows what the engine's budget allows for the case's rights. The demo case is
 * invented.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

let context: BrowserContext;
let page: Page;
let caseId = '';

const saved = async () => (await (await page.request.get(`/api/v1/cases/${caseId}`)).json()).case;

beforeAll(async () => {
  const demo = await demoCase('Older extrusion line', 'Without mothballing');
  caseId = demo.caseId;
  ({ context, page } = await signedInPage('analyst@kestrelbay.example'));
  await page.goto(demo.url);
  await page.getByRole('tab', { name: 'Cash flows' }).click();
  await page.getByLabel('WACC (%)').waitFor({ timeout: 20_000 });
});

afterAll(async () => {
  await context.close();
  await closeBrowser();
  await db.destroy();
});

describe('invalid fields', () => {
  it('block saving, and the headline names the field whose value it is not using', async () => {
    const before = await saved();
    const wacc = page.getByLabel('WACC (%)');
    await wacc.click();
    await wacc.press('ControlOrMeta+a');
    await wacc.pressSequentially('nine', { delay: 40 });
    const alert = page.getByRole('alert').filter({ hasText: 'These figures use the last valid values' });
    await expect.poll(() => alert.isVisible()).toBe(true);
    expect(await alert.innerText()).toContain('WACC (%): “nine” is not a number.');
    await page.getByRole('button', { name: 'Save' }).click();
    await expect.poll(() => page.getByText('Fix “WACC (%)” (“nine” is not a number.) first.').isVisible()).toBe(true);
    expect((await saved()).version).toBe(before.version);

    await page.getByRole('tab', { name: 'Uncertainty' }).click();
    const steps = page.getByLabel('Lattice steps');
    await steps.click();
    await steps.press('ControlOrMeta+a');
    await steps.pressSequentially('100000', { delay: 20 });
    await expect.poll(() => alert.innerText()).toMatch(/Lattice steps: Use at most [\d,]+ steps/);

    // Fixed, the case saves again with the figures on screen.
    await steps.press('ControlOrMeta+a');
    await steps.pressSequentially('90', { delay: 20 });
    await page.getByRole('tab', { name: 'Cash flows' }).click();
    await wacc.click();
    await wacc.press('ControlOrMeta+a');
    await wacc.pressSequentially('9.5', { delay: 40 });
    await expect.poll(() => alert.count()).toBe(0);
    await page.getByRole('button', { name: 'Save' }).click();
    await expect.poll(async () => (await saved()).cashFlows.wacc, { timeout: 20_000 }).toBe(0.095);
    expect((await saved()).settings.steps).toBe(90);
  });

  it('marks the option card the engine refuses, naming it', async () => {
    await page.getByRole('tab', { name: 'Flexibility' }).click();
    await page.getByRole('button', { name: 'Defer', exact: true }).click();
    await page.getByRole('button', { name: 'Stage', exact: true }).click();
    const refusal = page.getByRole('alert').filter({ hasText: 'The engine cannot use this right' });
    await expect.poll(() => refusal.count(), { timeout: 20_000 }).toBe(1);
    expect(await refusal.innerText()).toContain('right “Stages” cannot be combined with a defer right');
    await page.getByRole('tab', { name: 'Results' }).click();
    await expect.poll(() => page.getByText('The engine cannot value this case as it stands.').isVisible()).toBe(true);
  });
});
