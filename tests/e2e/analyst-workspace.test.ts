/**
 * The analyst's main job in Chromium, as a user does it: create a project and a case, type a
 * five-year cash-flow schedule, read the static NPV and V0, attach an expand and an abandon
 * option, read the expanded NPV and the bridge, open the lattice and inspect a node, save,
 * duplicate, raise the copy's volatility and compare. Then an executive opens the same case
 * read-only and is refused a direct write. Every figure on screen is checked against the
 * engine run here on the same inputs.
 */
import type { Page } from 'playwright-core';
import { afterAll, describe, expect, it } from 'vitest';
import { valueProject } from '@/lattice';
import { caseToModel } from '@/lib/case-model';
import { analyseCashFlows } from '@/lib/cash-flows';
import { formatMoney } from '@/lib/format';
import { closeBrowser, signedInPage } from './support/browser';

afterAll(async () => {
  await closeBrowser();
});

const headline = (page: Page, label: string) => page.locator('p', { hasText: new RegExp(`^${label}$`) }).locator('xpath=following-sibling::p[1]');

async function caseJson(page: Page, caseId: string) {
  const res = await page.request.get(`/api/v1/cases/${caseId}`);
  expect(res.status()).toBe(200);
  return (await res.json()).case;
}

describe('the analyst workspace', () => {
  let caseUrl = '';
  let caseId = '';
  let copyId = '';

  it('builds, values, saves and duplicates a case; the copy with higher volatility is worth more', async () => {
    const { context, page } = await signedInPage('analyst@kestrelbay.example');

    await page.goto('/projects');
    await page.getByRole('button', { name: 'New project' }).click();
    await page.getByLabel('Name').fill('Test resin line');
    await page.getByLabel('What is it?').fill('An invented project for the end-to-end test.');
    await page.getByRole('button', { name: 'Create project' }).click();
    await page.waitForURL(/\/projects\/[^/]+$/);
    await expect.poll(() => page.getByRole('heading', { name: 'Test resin line' }).isVisible()).toBe(true);

    await page.getByRole('button', { name: 'New case' }).click();
    await expect.poll(() => page.getByLabel('Case name').inputValue()).toBe('Base case');
    await page.getByRole('button', { name: 'Create case' }).click();
    await page.waitForURL(/\/cases\//);
    caseUrl = new URL(page.url()).pathname;
    caseId = caseUrl.split('/').at(-1)!;

    // Five years of operations after a year-0 outlay, typed cell by cell.
    const cell = (line: string, year: number) => page.getByLabel(`${line}, year ${year}`, { exact: true });
    await cell('Capex', 0).fill('100');
    for (let year = 1; year <= 5; year++) {
      await cell('Revenue', year).fill('60');
      await cell('Operating cost', year).fill('30');
      await cell('Tax', year).fill('5');
    }
    const schedule = {
      wacc: 0.085,
      rows: [0, 1, 2, 3, 4, 5].map((year) => ({
        year,
        revenue: year ? 60 : 0,
        operatingCost: year ? 30 : 0,
        capex: year ? 0 : 100,
        tax: year ? 5 : 0,
        workingCapital: 0,
      })),
    };
    const analysis = analyseCashFlows(schedule);
    await expect.poll(() => page.getByText(formatMoney(analysis.underlyingValue, 'EUR'), { exact: true }).isVisible()).toBe(true);
    await expect.poll(() => headline(page, 'Static NPV').innerText()).toBe(formatMoney(analysis.npvAtWacc, 'EUR'));

    // A cell that is not a number is flagged and keeps the model unchanged.
    await cell('Tax', 3).fill('n/a');
    await expect.poll(() => page.getByText('Tax, year 3: “n/a” is not a number.').isVisible()).toBe(true);
    await cell('Tax', 3).fill('5');

    await page.getByRole('tab', { name: 'Flexibility' }).click();
    await page.getByRole('button', { name: 'Expand', exact: true }).click();
    await page.getByRole('button', { name: 'Abandon', exact: true }).click();
    await expect.poll(() => page.getByLabel('Name of the right').count()).toBe(2);
    // The abandonment is left unnamed: the engine names it by its kind (abandon-1).
    await page.getByLabel('Name of the right').nth(1).click();
    await page.keyboard.press('Control+A');
    await page.keyboard.press('Backspace');

    await page.getByRole('button', { name: 'Save' }).click();
    await expect.poll(() => page.getByText('Saved as version 2.').isVisible()).toBe(true);
    const saved = await caseJson(page, caseId);
    expect(saved.options.map((o: { kind: string; id?: string }) => [o.kind, o.id])).toEqual([
      ['expand', 'Expand'],
      ['abandon', undefined],
    ]);
    const expected = valueProject(caseToModel(saved).model);
    await expect.poll(() => headline(page, 'Expanded NPV').innerText(), { timeout: 20_000 }).toBe(formatMoney(expected.expandedNpv, 'EUR'));
    expect(expected.optionPremium).toBeGreaterThan(0);

    await page.getByRole('tab', { name: 'Results' }).click();
    await expect.poll(() => page.getByRole('img', { name: /^Bridge from static to expanded NPV/ }).isVisible()).toBe(true);
    await expect
      .poll(() =>
        page
          .getByRole('cell', { name: /^Expand/ })
          .first()
          .isVisible(),
      )
      .toBe(true);
    await expect.poll(() => page.getByRole('cell', { name: /^abandon-1/ }).isVisible()).toBe(true);

    // The discussion names each right as the results do, an unnamed one by the engine's id.
    await page.getByRole('tab', { name: 'Review' }).click();
    await expect
      .poll(() => page.getByLabel('About').locator('option').allTextContents(), { timeout: 20_000 })
      .toEqual(expect.arrayContaining(['Right: Expand', 'Right: abandon-1']));

    await page.getByRole('tab', { name: 'Lattice', exact: true }).click();
    const node = page.getByRole('button', { name: /: step 1, node 1,/ });
    await expect.poll(() => node.count(), { timeout: 20_000 }).toBe(1);
    await node.focus();
    await page.keyboard.press('Enter');
    await expect.poll(() => page.getByText(/Step 1, node 1 · year/).isVisible()).toBe(true);
    await expect.poll(() => page.getByText('Equal to the expectation, as no-arbitrage requires.').isVisible()).toBe(true);

    const stored = await page.getByRole('button', { name: 'Value case' });
    await stored.click();
    await expect
      .poll(() => page.getByText(`Valuation stored: expanded NPV ${formatMoney(expected.expandedNpv, 'EUR')}.`).isVisible(), { timeout: 20_000 })
      .toBe(true);

    // Duplicate on the project page, then raise the copy's volatility.
    await page.getByRole('link', { name: 'Test resin line' }).click();
    await page.getByRole('button', { name: 'Duplicate Base case' }).click();
    // The suggested name ("Base case (copy)") is selected as the dialog opens: typing replaces it.
    await expect.poll(() => page.getByLabel('Case name').inputValue(), { timeout: 30_000 }).toBe('Base case (copy)');
    await page.getByLabel('Case name').pressSequentially('Volatile demand', { delay: 20 });
    expect(await page.getByLabel('Case name').inputValue()).toBe('Volatile demand');
    await page.getByRole('button', { name: 'Duplicate', exact: true }).click();
    await page.getByRole('link', { name: 'Volatile demand' }).click();
    await page.waitForURL(/\/cases\//);
    copyId = new URL(page.url()).pathname.split('/').at(-1)!;
    expect(copyId).not.toBe(caseId);
    await page.getByRole('tab', { name: 'Uncertainty' }).click();
    await page.getByLabel('Volatility (%)', { exact: true }).fill('45');
    await page.getByRole('button', { name: 'Save' }).click();
    // The first save's toast may still be up: read the copy's own version line instead.
    await expect.poll(() => page.getByText(/Version 2 · saved/).isVisible()).toBe(true);

    const copy = await caseJson(page, copyId);
    const base = await caseJson(page, caseId);
    expect(copy.settings.volatility).toBe(0.45);
    expect(base.settings.volatility).toBe(0.3);
    const copyValue = valueProject(caseToModel(copy).model).expandedNpv;
    await expect.poll(() => headline(page, 'Expanded NPV').innerText(), { timeout: 20_000 }).toBe(formatMoney(copyValue, 'EUR'));
    // More volatility makes these rights (an expansion and an abandonment) worth more.
    expect(copyValue).toBeGreaterThan(expected.expandedNpv);
    await context.close();
  });

  it('shows the case read-only to an executive, and refuses a direct write with 403', async () => {
    const { context, page } = await signedInPage('executive@kestrelbay.example');
    // The page hands the case it loaded to the editor: the browser does not fetch it a second time.
    const caseFetches: string[] = [];
    page.on('request', (r) => {
      if (new URL(r.url()).pathname === `/api/v1/cases/${caseId}`) caseFetches.push(r.method());
    });
    await page.goto(caseUrl);
    await expect.poll(() => page.getByText('Read-only: your role can read this case but not change it.').isVisible(), { timeout: 20_000 }).toBe(true);
    expect(caseFetches).toEqual([]);
    expect(await page.getByRole('button', { name: 'Save' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Value case' }).count()).toBe(0);
    expect(await page.getByLabel('Revenue, year 1', { exact: true }).getAttribute('readonly')).not.toBeNull();
    const current = await caseJson(page, caseId);
    const write = await page.request.patch(`/api/v1/cases/${caseId}`, { data: { ...current, name: 'Changed by a viewer', version: current.version } });
    expect(write.status()).toBe(403);
    expect((await caseJson(page, caseId)).name).toBe('Base case');
    await context.close();
  });
});
