/**
 * Figures typed into the cash-flow grid are the figures used: "23.5" typed key by key, slowly,
 * is 23.5 (it became 235 when the grid re-rendered "23." as "23"); a comma that may be a decimal
 * comma is flagged with how to write it, not guessed; a block copied from a spreadsheet
 * (tab-separated, two lines and three years) pastes from the cell it lands in; a figure typed
 * while a save is on its way stays unsaved. The demo case is invented.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

let context: BrowserContext;
let page: Page;
let caseId = '';

const cell = (line: string, year: number) => page.getByLabel(`${line}, year ${year}`, { exact: true });
const stored = async () => (await (await page.request.get(`/api/v1/cases/${caseId}`)).json()).case.cashFlows.rows as Record<string, number>[];

beforeAll(async () => {
  const demo = await demoCase('Cold-storage hub', 'Calmer market');
  caseId = demo.caseId;
  ({ context, page } = await signedInPage('analyst@kestrelbay.example'));
  await page.goto(demo.url);
  await page.getByRole('tab', { name: 'Cash flows' }).click();
  await cell('Revenue', 1).waitFor({ timeout: 20_000 });
});

afterAll(async () => {
  await context.close();
  await closeBrowser();
  await db.destroy();
});

async function typeSlowly(target: ReturnType<typeof cell>, text: string) {
  await target.click();
  await target.press('ControlOrMeta+a');
  await target.pressSequentially(text, { delay: 120 });
}

describe('typing into the cash-flow grid', () => {
  it('keeps decimals typed key by key, and saves them', async () => {
    await typeSlowly(cell('Revenue', 1), '23.5');
    expect(await cell('Revenue', 1).inputValue()).toBe('23.5');
    await typeSlowly(cell('Tax', 2), '0.5');
    await cell('Tax', 2).press('Tab');
    expect(await cell('Tax', 2).inputValue()).toBe('0.5');
    expect(await cell('Revenue', 1).inputValue()).toBe('23.5');
    await page.getByRole('button', { name: 'Save' }).click();
    await expect.poll(async () => (await stored())[1]!.revenue, { timeout: 20_000 }).toBe(23.5);
    expect((await stored())[2]!.tax).toBe(0.5);
  });

  it('flags a comma that may be a decimal comma instead of guessing', async () => {
    await typeSlowly(cell('Operating cost', 3), '3,0');
    await expect.poll(() => page.getByText('Operating cost, year 3: “3,0”: write decimals with a point (3.0).').isVisible()).toBe(true);
    expect(await cell('Operating cost', 3).getAttribute('aria-invalid')).toBe('true');
    await typeSlowly(cell('Operating cost', 3), '19');
    await expect.poll(() => page.getByText('“3,0”', { exact: false }).count()).toBe(0);
  });

  it('pastes a block copied from a spreadsheet', async () => {
    await cell('Revenue', 1).click();
    await cell('Revenue', 1).evaluate((input) => {
      const data = new DataTransfer();
      data.setData('text/plain', '31\t32.5\t33\n16\t17\t18.25\n');
      input.dispatchEvent(new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }));
    });
    await expect.poll(() => cell('Revenue', 2).inputValue()).toBe('32.5');
    expect(await cell('Operating cost', 3).inputValue()).toBe('18.25');
    await page.getByRole('button', { name: 'Save' }).click();
    await expect
      .poll(async () => (await stored()).slice(1, 4).map((r) => [r.revenue, r.operatingCost]), { timeout: 20_000 })
      .toEqual([
        [31, 16],
        [32.5, 17],
        [33, 18.25],
      ]);
  });

  it('keeps a figure typed while a save is on its way marked unsaved, and saves it next', async () => {
    // Before, the save's answer marked the whole draft saved, so a figure typed meanwhile was lost
    // without a warning on leaving the page. 2 s of latency leaves time to type one, even on a loaded machine.
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 2000, downloadThroughput: -1, uploadThroughput: -1 });
    const version = (await (await page.request.get(`/api/v1/cases/${caseId}`)).json()).case.version as number;
    await typeSlowly(cell('Revenue', 4), '41');
    await page.getByRole('button', { name: 'Save' }).click();
    await cell('Revenue', 5).click();
    await cell('Revenue', 5).press('ControlOrMeta+a');
    await cell('Revenue', 5).pressSequentially('52');
    await cell('Revenue', 5).press('Tab');
    // An earlier save's message may still be showing: this one names the next version.
    await expect.poll(() => page.getByText(`Saved as version ${version + 1}`, { exact: false }).isVisible(), { timeout: 20_000 }).toBe(true);
    expect(await page.getByText('· unsaved changes').isVisible()).toBe(true);
    expect(await page.getByText('the changes made since are not saved yet', { exact: false }).isVisible()).toBe(true);
    expect((await stored())[4]!.revenue).toBe(41);
    expect((await stored())[5]!.revenue).not.toBe(52);
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
    await page.getByRole('button', { name: 'Save' }).click();
    await expect.poll(async () => (await stored())[5]!.revenue, { timeout: 20_000 }).toBe(52);
    expect(await page.getByText('· saved').isVisible()).toBe(true);
  });
});
