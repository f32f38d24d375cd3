/**
 * Monte Carlo volatility as the analyst runs it: mark uncertain lines, run a million paths off
 * the request thread while the progress bar moves, read both estimates and apply the conditional
 * one, which the case records with its seed. A double click starts one run; a run can be
 * cancelled; roles and organisations are respected.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

let caseId = '';
let caseUrl = '';

beforeAll(async () => {
  ({ caseId, url: caseUrl } = await demoCase('Staged pilot line', 'Higher hurdle rate'));
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('Monte Carlo volatility', () => {
  it('runs with a progress bar, shows both estimates and applies the conditional one with its seed', async () => {
    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    await page.goto(caseUrl);
    await page.getByRole('tab', { name: 'Uncertainty' }).click();
    await page.getByLabel('Paths', { exact: true }).fill('1000000');
    await page.getByLabel('Seed (same seed, same result)').fill('2026');
    await page.getByRole('button', { name: 'Run the simulation' }).click();
    const bar = page.getByRole('progressbar', { name: 'Simulation progress' });
    const seen = new Set<number>();
    await expect
      .poll(
        async () => {
          if (await bar.isVisible()) seen.add(Number(await bar.getAttribute('aria-valuenow')));
          return page.getByText('Done', { exact: true }).isVisible();
        },
        { timeout: 60_000, interval: 100 },
      )
      .toBe(true);
    expect([...seen].some((v) => v > 0 && v < 100)).toBe(true);
    const apply = page.getByRole('button', { name: /^Use .* for this case$/ }).last();
    await apply.click();
    await page.getByRole('button', { name: 'Save' }).click();
    await expect.poll(() => page.getByText(/Version 2 · saved/).isVisible()).toBe(true);
    const saved = (await (await page.request.get(`/api/v1/cases/${caseId}`)).json()).case;
    expect(saved.settings.volatilitySource.method).toBe('monte-carlo');
    expect(saved.settings.volatilitySource.note).toContain('1,000,000 paths, seed 2026');
    await context.close();
  });

  it('starts one simulation for a double click on a slow connection', async () => {
    // Before, the button took clicks until the first one's answer came back: a second click
    // started a second job, and the page lost sight of the first, which ran on unseen.
    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    await page.goto(`${caseUrl}?tab=uncertainty`);
    const run = page.getByRole('button', { name: 'Run the simulation' });
    await expect.poll(() => run.isEnabled(), { timeout: 30_000 }).toBe(true);
    const starts: string[] = [];
    page.on('request', (r) => {
      if (r.method() === 'POST' && r.url().endsWith('/api/v1/volatility/simulations')) starts.push(r.url());
    });
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 1000, downloadThroughput: -1, uploadThroughput: -1 });
    await run.dblclick();
    const bar = page.getByRole('progressbar', { name: 'Simulation progress' });
    await expect.poll(() => bar.isVisible(), { timeout: 30_000 }).toBe(true);
    expect(starts).toHaveLength(1);
    // The one run (the default 100,000 paths) ends, and the button takes a click again.
    await expect.poll(() => page.getByText('Done', { exact: true }).isVisible(), { timeout: 60_000 }).toBe(true);
    expect(starts).toHaveLength(1);
    expect(await run.isEnabled()).toBe(true);
    await context.close();
  });

  it('can be cancelled, and answers roles and other organisations as it should', async () => {
    const analyst = await signedInPage('analyst@kestrelbay.example');
    const spec = { drivers: [{ line: 'revenue', distribution: 'normal', spread: 0.2 }], correlations: [], paths: 1_000_000, seed: 1 };
    const started = await analyst.page.request.post('/api/v1/volatility/simulations', { data: { caseId, spec } });
    expect(started.status()).toBe(202);
    const { id } = await started.json();
    const cancel = await analyst.page.request.delete(`/api/v1/volatility/simulations/${id}`);
    expect(cancel.status()).toBe(200);
    expect((await (await analyst.page.request.get(`/api/v1/volatility/simulations/${id}`)).json()).status).toBe('cancelled');
    expect((await analyst.page.request.delete(`/api/v1/volatility/simulations/${id}`)).status()).toBe(409);
    const bad = await analyst.page.request.post('/api/v1/volatility/simulations', { data: { caseId, spec: { ...spec, paths: 10 } } });
    expect(bad.status()).toBe(422);
    expect(Object.keys((await bad.json()).error.fields)).toEqual(['spec.paths']);

    const viewer = await signedInPage('executive@kestrelbay.example');
    expect((await viewer.page.request.post('/api/v1/volatility/simulations', { data: { caseId, spec } })).status()).toBe(403);
    expect((await viewer.page.request.get(`/api/v1/volatility/simulations/${id}`)).status()).toBe(200);
    const outsider = await signedInPage('owner@harrowfen.example');
    expect((await outsider.page.request.get(`/api/v1/volatility/simulations/${id}`)).status()).toBe(404);
    expect((await outsider.page.request.post('/api/v1/volatility/simulations', { data: { caseId, spec } })).status()).toBe(404);
    for (const c of [analyst, viewer, outsider]) await c.context.close();
  });
});
