/**
 * Following an approved case (issue 13, first part): an analyst records the project's value;
 * the watch says where each approved right stands and re-values the approved model from that
 * date. Refusals name their rule (before approval, in the future), roles are enforced, another
 * organisation gets 404 and a case never approved 409. Figures invented (the demo plant).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

type Request = Awaited<ReturnType<typeof signedInPage>>['page']['request'];
let analyst: Request;
let viewer: Request;
let plant: Awaited<ReturnType<typeof demoCase>>;
const day = (offset: number) => new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);

beforeAll(async () => {
  analyst = (await signedInPage('analyst@kestrelbay.example')).page.request;
  viewer = (await signedInPage('executive@kestrelbay.example')).page.request;
  plant = await demoCase('Phased bio-resin plant', 'Base case');
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('following an approved case', () => {
  it('records an observation and says where each right stands, re-valuing the approved model from that date', async () => {
    const snapshot = await db
      .selectFrom('case_snapshot')
      .select(['result', 'model', 'decided_at'])
      .where('case_id', '=', plant.caseId)
      .where('status', '=', 'approved')
      .orderBy('decided_at', 'desc')
      .executeTakeFirstOrThrow();
    const model = snapshot.model as { underlying: { value: number } };
    const approvedOn = snapshot.decided_at!.toISOString().slice(0, 10);
    // The value it was approved at, observed on the approval date: the re-valued NPV is the approved one.
    const recorded = await analyst.post(`/api/v1/cases/${plant.caseId}/observations`, {
      data: { date: approvedOn, value: model.underlying.value, note: 'As approved', source: 'approval' },
    });
    expect(recorded.status()).toBe(201);
    const watch = await (await viewer.get(`/api/v1/cases/${plant.caseId}/watch`, { timeout: 60_000 })).json();
    expect(watch.asOf).toBe(approvedOn);
    expect(watch.followed.valuationDate).toBe(approvedOn);
    expect(Math.abs(watch.revaluedExpandedNpv - (snapshot.result as { expandedNpv: number }).expandedNpv)).toBeLessThan(1e-9);
    expect(watch.rights.length).toBeGreaterThanOrEqual(2);
    for (const r of watch.rights) expect(['in_region', 'near', 'outside', 'window_not_open', 'window_closed']).toContain(r.status);
    expect(watch.observations.at(-1)).toMatchObject({ observedOn: approvedOn, source: 'approval', recordedBy: expect.any(String) });

    // A much higher value makes the expansion's region closer (or reached) than the approved value does.
    const phase2 = (w: { rights: { name: string; distanceRatio: number | null }[] }) => w.rights.find((r) => r.name === 'Phase 2')!;
    expect(
      (await analyst.post(`/api/v1/cases/${plant.caseId}/observations`, { data: { date: approvedOn, value: model.underlying.value * 1.6 } })).status(),
    ).toBe(201);
    const higher = await (await viewer.get(`/api/v1/cases/${plant.caseId}/watch`, { timeout: 60_000 })).json();
    expect(phase2(higher).distanceRatio!).toBeLessThan(phase2(watch).distanceRatio!);
    expect(higher.revaluedExpandedNpv).toBeGreaterThan(watch.revaluedExpandedNpv);
  }, 120_000);

  it('refuses dates before approval or in the future with the rule named, and enforces roles and organisations', async () => {
    const before = await analyst.post(`/api/v1/cases/${plant.caseId}/observations`, { data: { date: '2020-01-01', value: 100 } });
    expect(before.status()).toBe(422);
    expect((await before.json()).error.fields.date[0]).toMatch(/before .* approved/);
    const future = await analyst.post(`/api/v1/cases/${plant.caseId}/observations`, { data: { date: day(2), value: 100 } });
    expect(future.status()).toBe(422);
    expect((await future.json()).error.fields.date[0]).toMatch(/future/);
    expect((await analyst.post(`/api/v1/cases/${plant.caseId}/observations`, { data: { date: '2026-02-30', value: 100 } })).status()).toBe(422);
    expect((await analyst.post(`/api/v1/cases/${plant.caseId}/observations`, { data: { date: day(0), value: -5 } })).status()).toBe(422);
    expect((await viewer.post(`/api/v1/cases/${plant.caseId}/observations`, { data: { date: day(0), value: 100 } })).status()).toBe(403);
    const reviewer = (await signedInPage('reviewer@kestrelbay.example')).page.request;
    expect((await reviewer.post(`/api/v1/cases/${plant.caseId}/observations`, { data: { date: day(0), value: 100 } })).status()).toBe(403);
    const outsider = (await signedInPage('owner@harrowfen.example')).page.request;
    expect((await outsider.get(`/api/v1/cases/${plant.caseId}/watch`)).status()).toBe(404);
    const draft = await demoCase('Staged pilot line', 'Base case');
    expect((await viewer.get(`/api/v1/cases/${draft.caseId}/watch`)).status()).toBe(409);
  }, 120_000);

  it('records a value in the browser, typed key by key, and shows the status and the chart', async () => {
    const { page } = await signedInPage('analyst@kestrelbay.example');
    await page.goto(plant.url);
    await page.getByRole('tab', { name: 'Watch' }).click();
    await expect.poll(() => page.getByRole('heading', { name: /^Where each right stands on/ }).isVisible(), { timeout: 60_000 }).toBe(true);
    await page.getByLabel('Value (EUR)').pressSequentially('131.5');
    await page.getByLabel('Source').pressSequentially('offer received');
    await page.getByRole('button', { name: 'Record' }).click();
    await expect.poll(() => page.getByRole('cell', { name: 'offer received' }).isVisible(), { timeout: 60_000 }).toBe(true);
    expect(await page.getByRole('cell', { name: 'EUR 131.5' }).first().isVisible()).toBe(true);
    // The status column speaks in words for every right, and the chart is drawn with the observed values.
    const statuses = await page.getByRole('table', { name: 'Where each right stands' }).getByRole('row').count();
    expect(statuses).toBeGreaterThanOrEqual(3);
    expect(await page.getByText('The project value as observed', { exact: false }).isVisible()).toBe(true);
    await page.screenshot({ path: '.data/watch.png', fullPage: true });
  }, 120_000);

  it("lists a right in its region on the portfolio's watch list, for an executive", async () => {
    const name = `Watched kiln ${Date.now().toString(36)}`;
    const project = (await (await analyst.post('/api/v1/projects', { data: { name, description: 'Invented for a test' } })).json()).project;
    const rows = [0, 1, 2, 3, 4].map((year) => ({
      year,
      revenue: year ? 60 : 0,
      operatingCost: year ? 20 : 0,
      capex: year ? 0 : 90,
      tax: year ? 5 : 0,
      workingCapital: 0,
    }));
    const made = await analyst.post(`/api/v1/projects/${project.id}/cases`, {
      data: {
        name: 'Base case',
        cashFlows: { wacc: 0.09, rows },
        settings: { volatility: 0.3, riskFreeRate: 0.03, steps: 48 },
        options: [{ type: 'expand', id: 'Second kiln', factor: 0.5, cost: 70, window: { kind: 'american', from: 0, to: 3 } }],
      },
    });
    expect(made.status()).toBe(201);
    const caseId = (await made.json()).case.id;
    expect((await analyst.post(`/api/v1/cases/${caseId}/submit`, { data: { recommendation: 'Build one kiln; watch for the second.' } })).status()).toBe(201);
    const reviewer = (await signedInPage('reviewer@kestrelbay.example')).page.request;
    expect((await reviewer.post(`/api/v1/cases/${caseId}/approve`)).status()).toBe(200);
    // Far above any expansion boundary: the model says expand now.
    expect((await analyst.post(`/api/v1/cases/${caseId}/observations`, { data: { date: day(0), value: 2000, source: 'offer received' } })).status()).toBe(201);
    const watch = await (await viewer.get(`/api/v1/cases/${caseId}/watch`, { timeout: 60_000 })).json();
    expect(watch.rights[0]).toMatchObject({ name: 'Second kiln', status: 'in_region' });
    const executive = await signedInPage('executive@kestrelbay.example');
    await executive.page.goto('/portfolio');
    const row = executive.page.getByRole('table', { name: 'Rights to act on' }).getByRole('row', { name: new RegExp(name) });
    await expect.poll(() => row.isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await row.getByText('Use it now').isVisible()).toBe(true);
  }, 120_000);
});
