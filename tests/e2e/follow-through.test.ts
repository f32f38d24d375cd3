/**
 * Following an approved case (issue 13): the demo plant, approved 800 days ago, arrives with its
 * values recorded, a right near its boundary and one alert in the inbox; an analyst records the
 * project's value and the team's decisions; the watch says where each approved right stands
 * today and re-values the approved model from today in the mode the decisions made; alerts go
 * out once per change (mail sink); refusals name their rule, roles are enforced, another
 * organisation gets 404 and a case never approved 409. Figures invented.
 */
import { promises as fs } from 'node:fs';
import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';
import { E2E_MAIL_DIR } from './support/env';
import { waitForMail } from './support/mail';
import { pdfText } from '../support/pdf-text';

type Request = Awaited<ReturnType<typeof signedInPage>>['page']['request'];
let analyst: Request;
let viewer: Request;
let reviewer: Request;
let plant: Awaited<ReturnType<typeof demoCase>>;
const day = (offset: number) => new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);

beforeAll(async () => {
  analyst = (await signedInPage('analyst@kestrelbay.example')).page.request;
  viewer = (await signedInPage('executive@kestrelbay.example')).page.request;
  reviewer = (await signedInPage('reviewer@kestrelbay.example')).page.request;
  plant = await demoCase('Phased bio-resin plant', 'Base case');
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

/** A new project with one case holding `options`, submitted and approved today through the API. */
async function approvedCase(name: string, options: unknown[]) {
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
    data: { name: 'Base case', cashFlows: { wacc: 0.09, rows }, settings: { volatility: 0.3, riskFreeRate: 0.03, steps: 48 }, options },
  });
  expect(made.status()).toBe(201);
  const caseId: string = (await made.json()).case.id;
  expect((await analyst.post(`/api/v1/cases/${caseId}/submit`, { data: { recommendation: 'Approve; follow the rights.' } })).status()).toBe(201);
  expect((await reviewer.post(`/api/v1/cases/${caseId}/approve`)).status()).toBe(200);
  return { caseId, projectId: project.id as string, name };
}

const watchOf = async (caseId: string) => {
  const res = await viewer.get(`/api/v1/cases/${caseId}/watch`, { timeout: 60_000 });
  expect(res.status()).toBe(200);
  return res.json();
};

/** Waits until the worker has run every check queued for the case. */
async function checksDone(caseId: string) {
  await expect
    .poll(
      async () =>
        (
          await sql<{
            n: number;
          }>`select count(*)::int as n from pgboss.job where name = 'watch-check' and data->>'caseId' = ${caseId} and state not in ('completed', 'failed', 'cancelled')`.execute(
            db,
          )
        ).rows[0]!.n,
      { timeout: 90_000, interval: 500 },
    )
    .toBe(0);
}

const alertsOf = (caseId: string) => db.selectFrom('watch_alert').select(['kind', 'right_id']).where('case_id', '=', caseId).orderBy('created_at').execute();

/** Messages in the mail sink to `to` whose subject matches. */
async function mailsTo(to: string, subject: RegExp) {
  const names = (await fs.readdir(E2E_MAIL_DIR).catch(() => [] as string[])).filter((n) => n.endsWith('.json'));
  const all = await Promise.all(names.map(async (n) => JSON.parse(await fs.readFile(`${E2E_MAIL_DIR}/${n}`, 'utf8')) as { to: string; subject: string }));
  return all.filter((m) => m.to.includes(to) && subject.test(m.subject));
}

describe('following an approved case', () => {
  it('arrives with the demo plant followed since its approval: values recorded, a right near its boundary, one alert in the inbox', async () => {
    const snapshot = await db
      .selectFrom('case_snapshot')
      .select(['decided_at'])
      .where('case_id', '=', plant.caseId)
      .where('status', '=', 'approved')
      .executeTakeFirstOrThrow();
    const approvedOn = snapshot.decided_at!.toISOString().slice(0, 10);
    expect(approvedOn).toBe(day(-800));
    const watch = await watchOf(plant.caseId);
    expect(watch.followed.valuationDate).toBe(approvedOn);
    expect(watch.asOf).toBe(day(0));
    expect(watch.observations.length).toBeGreaterThanOrEqual(4);
    expect(watch.valueOn).toBe(day(-12));
    const phase2 = watch.rights.find((r: { name: string }) => r.name === 'Phase 2');
    expect(phase2).toMatchObject({ status: 'near', side: 'above' });
    expect(phase2.distanceSd).toBeGreaterThan(0);
    expect(phase2.distanceSd).toBeLessThanOrEqual(1);
    expect(watch.rights.find((r: { name: string }) => r.name === 'Sell the plant').status).toBe('outside');
    // The worker's first check sent the one alert, to the analyst and the reviewers.
    const mail = await waitForMail('reviewer@kestrelbay.example', /^Follow-through: Phased bio-resin plant — Base case: “Phase 2” near its boundary$/, 90_000);
    expect(mail.text).toContain('/cases/');
    await waitForMail('analyst@kestrelbay.example', /^Follow-through: Phased bio-resin plant — Base case/, 30_000);
    await checksDone(plant.caseId);
    expect(await alertsOf(plant.caseId)).toEqual([{ kind: 'near', right_id: 'Phase 2' }]);
    // And the alerts page lists it, for an executive too.
    const { page } = await signedInPage('executive@kestrelbay.example');
    await page.goto('/alerts');
    const row = page.getByRole('table', { name: 'Alerts, newest first' }).getByRole('row', { name: /Phased bio-resin plant — Base case/ });
    await expect.poll(() => row.first().isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await row.first().getByRole('cell', { name: 'Near its boundary', exact: true }).isVisible()).toBe(true);
  }, 180_000);

  it('re-values the approved model from today: at approval, with the approved value, the figures are the approved ones; a higher value moves the expansion closer', async () => {
    const fresh = await approvedCase(`Followed kiln ${Date.now().toString(36)}`, [
      { kind: 'expand', id: 'Second kiln', factor: 0.5, cost: 70, window: { kind: 'american', from: 0, to: 3 } },
      { kind: 'abandon', id: 'Sell', salvage: 40, window: { kind: 'american', from: 0, to: 4 } },
    ]);
    const snapshot = await db
      .selectFrom('case_snapshot')
      .select(['result', 'model'])
      .where('case_id', '=', fresh.caseId)
      .where('status', '=', 'approved')
      .executeTakeFirstOrThrow();
    const v0 = (snapshot.model as { underlying: { value: number } }).underlying.value;
    const watch = await watchOf(fresh.caseId);
    expect(watch.asOf).toBe(day(0));
    expect(watch.observations).toEqual([]);
    expect(Math.abs(watch.revaluedExpandedNpv - (snapshot.result as { expandedNpv: number }).expandedNpv)).toBeLessThan(1e-9);
    const kiln = (w: { rights: { name: string; distanceRatio: number | null }[] }) => w.rights.find((r) => r.name === 'Second kiln')!;
    expect((await analyst.post(`/api/v1/cases/${fresh.caseId}/observations`, { data: { date: day(0), value: v0 * 1.3 } })).status()).toBe(201);
    const higher = await watchOf(fresh.caseId);
    expect(kiln(higher).distanceRatio!).toBeLessThan(kiln(watch).distanceRatio!);
    expect(higher.revaluedExpandedNpv).toBeGreaterThan(watch.revaluedExpandedNpv);
  }, 120_000);

  it('sends an alert once per change: near its boundary, the same value again, then into its region', async () => {
    const fresh = await approvedCase(`Alerted kiln ${Date.now().toString(36)}`, [
      { kind: 'expand', id: 'Second kiln', factor: 0.5, cost: 50, window: { kind: 'american', from: 0, to: 3 } },
    ]);
    // At a cost of 50 the expansion's boundary is already located at the first step after approval.
    const first = await watchOf(fresh.caseId);
    const critical = first.rights[0].critical as number;
    expect(critical).toBeGreaterThan(0);
    // Half a standard deviation of a year's move below an expansion's boundary: near, not in it.
    const nearValue = Math.round(critical * Math.exp(-0.5 * 0.3) * 10) / 10;
    const subject = new RegExp(`^Follow-through: ${fresh.name} — Base case: “Second kiln” near its boundary$`);
    for (let k = 0; k < 2; k++) {
      expect(
        (await analyst.post(`/api/v1/cases/${fresh.caseId}/observations`, { data: { date: day(0), value: nearValue, source: 'updated DCF' } })).status(),
      ).toBe(201);
      await checksDone(fresh.caseId);
    }
    expect((await watchOf(fresh.caseId)).rights[0].status).toBe('near');
    await waitForMail('reviewer@kestrelbay.example', subject, 60_000);
    await waitForMail('analyst@kestrelbay.example', subject, 60_000);
    expect(await alertsOf(fresh.caseId)).toEqual([{ kind: 'near', right_id: 'Second kiln' }]);
    // The mail job is queued with the alert; give a duplicate the time to arrive before counting.
    await new Promise((r) => setTimeout(r, 3000));
    expect(await mailsTo('reviewer@kestrelbay.example', subject)).toHaveLength(1);
    // Far above the boundary: the model says expand now, a new change.
    expect((await analyst.post(`/api/v1/cases/${fresh.caseId}/observations`, { data: { date: day(0), value: critical * 3 } })).status()).toBe(201);
    await checksDone(fresh.caseId);
    expect((await alertsOf(fresh.caseId)).map((a) => a.kind)).toEqual(['near', 'in_region']);
    await waitForMail('reviewer@kestrelbay.example', new RegExp(`^Follow-through: ${fresh.name} — Base case: use “Second kiln” now$`), 60_000);
  }, 240_000);

  it('records decisions: an exercised expansion changes the mode the model is re-valued in; final decisions are not recorded twice', async () => {
    const fresh = await approvedCase(`Decided kiln ${Date.now().toString(36)}`, [
      { kind: 'expand', id: 'Second kiln', factor: 0.5, cost: 70, window: { kind: 'american', from: 0, to: 3 } },
      { kind: 'abandon', id: 'Sell', salvage: 40, window: { kind: 'american', from: 0, to: 4 } },
    ]);
    const before = await watchOf(fresh.caseId);
    const decide = (right: string, data: unknown, who = analyst) =>
      who.post(`/api/v1/cases/${fresh.caseId}/rights/${encodeURIComponent(right)}/decisions`, { data });
    expect((await decide('Second kiln', { decision: 'exercised', reason: 'Board approved the second kiln.' }, viewer)).status()).toBe(403);
    expect((await decide('Second kiln', { decision: 'exercised', reason: 'x' }, reviewer)).status()).toBe(403);
    expect((await decide('Third kiln', { decision: 'exercised', reason: 'No such right.' })).status()).toBe(404);
    expect((await decide('Second kiln', { decision: 'exercised', reason: '' })).status()).toBe(422);
    const early = await decide('Second kiln', { decision: 'exercised', date: '2020-01-01', reason: 'Before approval.' });
    expect(early.status()).toBe(422);
    expect((await early.json()).error.fields.date[0]).toMatch(/before .* approved/);
    expect((await decide('Sell', { decision: 'postponed', reason: 'Not now; look again next quarter.' })).status()).toBe(201);
    expect((await decide('Second kiln', { decision: 'exercised', reason: 'Board approved the second kiln.' })).status()).toBe(201);
    expect((await decide('Second kiln', { decision: 'declined', reason: 'Changed our mind.' })).status()).toBe(409);
    const after = await watchOf(fresh.caseId);
    expect(after.rights.map((r: { name: string; status: string }) => [r.name, r.status])).toEqual([
      ['Second kiln', 'exercised'],
      ['Sell', expect.stringMatching(/^(in_region|near|outside)$/)],
    ]);
    expect(after.decisions.map((d: { rightId: string; decision: string }) => [d.rightId, d.decision])).toEqual([
      ['Sell', 'postponed'],
      ['Second kiln', 'exercised'],
    ]);
    // Expanded at no further cost: the plant (1.5 × V) with its sale is worth more than the
    // approved position, which still had to pay 70 for the expansion.
    expect(after.revaluedExpandedNpv).toBeGreaterThan(before.revaluedExpandedNpv);
    const audit = await db
      .selectFrom('audit_log')
      .select(['action', 'detail'])
      .where('subject_id', '=', fresh.caseId)
      .where('action', '=', 'case.decide_right')
      .orderBy('created_at')
      .execute();
    expect(audit.map((a) => (a.detail as { decision: string }).decision)).toEqual(['postponed', 'exercised']);
    // The next approved version's board pack tells how this one was followed.
    expect((await analyst.post(`/api/v1/cases/${fresh.caseId}/revisions`)).status()).toBeLessThan(300);
    expect((await analyst.post(`/api/v1/cases/${fresh.caseId}/submit`, { data: { recommendation: 'Second kiln built; follow the sale.' } })).status()).toBe(
      201,
    );
    expect((await reviewer.post(`/api/v1/cases/${fresh.caseId}/approve`)).status()).toBe(200);
    const pack = await viewer.get(`/api/v1/cases/${fresh.caseId}/board-pack?size=A4`, { timeout: 120_000 });
    expect(pack.status()).toBe(200);
    const text = pdfText(await pack.body());
    expect((await watchOf(fresh.caseId)).followed).toMatchObject({ caseVersion: 2, replaces: { caseVersion: 1, approvedOn: day(0) } });
    expect(text).toContain('Follow-through of version 1');
    expect(text).toContain('Board approved the second kiln.');
    expect(text).toContain('Not now; look again next quarter.');
    const outsider = (await signedInPage('owner@harrowfen.example')).page.request;
    expect(
      (await outsider.post(`/api/v1/cases/${fresh.caseId}/rights/Sell/decisions`, { data: { decision: 'declined', reason: 'Not yours.' } })).status(),
    ).toBe(404);
  }, 180_000);

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
    expect((await reviewer.post(`/api/v1/cases/${plant.caseId}/observations`, { data: { date: day(0), value: 100 } })).status()).toBe(403);
    const outsider = (await signedInPage('owner@harrowfen.example')).page.request;
    expect((await outsider.get(`/api/v1/cases/${plant.caseId}/watch`)).status()).toBe(404);
    const draft = await demoCase('Staged pilot line', 'Base case');
    expect((await viewer.get(`/api/v1/cases/${draft.caseId}/watch`)).status()).toBe(409);
  }, 120_000);

  it('shows a case never approved as nothing to follow, without asking for its watch (a 409 the console would show)', async () => {
    const draft = await demoCase('Staged pilot line', 'Base case');
    const { page } = await signedInPage('analyst@kestrelbay.example');
    const asked: string[] = [];
    const errors: string[] = [];
    page.on('request', (r) => r.url().endsWith('/watch') && asked.push(r.url()));
    page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
    await page.goto(draft.url);
    await page.getByRole('tab', { name: 'Watch' }).click();
    await expect.poll(() => page.getByText('Nothing to follow yet').isVisible(), { timeout: 60_000 }).toBe(true);
    expect(asked).toEqual([]);
    expect(errors).toEqual([]);
  }, 120_000);

  it('records a value in the browser, typed key by key, and shows the status and the chart', async () => {
    const { page } = await signedInPage('analyst@kestrelbay.example');
    await page.goto(plant.url);
    await page.getByRole('tab', { name: 'Watch' }).click();
    await expect.poll(() => page.getByRole('heading', { name: /^Where each right stands on/ }).isVisible(), { timeout: 60_000 }).toBe(true);
    await page.getByLabel('Value (EUR)').pressSequentially('131.5');
    await page.getByLabel('Source').pressSequentially('offer received');
    await page.getByRole('button', { name: 'Record', exact: true }).click();
    await expect.poll(() => page.getByRole('cell', { name: 'offer received' }).isVisible(), { timeout: 60_000 }).toBe(true);
    expect(await page.getByRole('cell', { name: 'EUR 131.5' }).first().isVisible()).toBe(true);
    // The status column speaks in words for every right, and the chart is drawn with the observed values.
    const statuses = await page.getByRole('table', { name: 'Where each right stands' }).getByRole('row').count();
    expect(statuses).toBeGreaterThanOrEqual(3);
    expect(await page.getByText('The project value as observed', { exact: false }).isVisible()).toBe(true);
    // A dated series from a file: a line before the approval is refused by its line, and nothing is recorded.
    const count = async () =>
      (await db.selectFrom('case_observation').select(db.fn.countAll().as('n')).where('case_id', '=', plant.caseId).executeTakeFirstOrThrow()).n;
    const before = await count();
    await page.getByLabel('A CSV or XLSX of dated values').setInputFiles({
      name: 'values.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(`date,value\n${day(-3)},150\n2020-01-01,140\n`),
    });
    await expect.poll(() => page.getByText(/^Line 3: The date is before/).isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await count()).toBe(before);
    // A decision, typed key by key: postponing keeps the right watched, and the record shows it.
    const decision = page.getByRole('form', { name: 'Record a decision' });
    await decision.getByLabel('Right', { exact: true }).selectOption({ label: 'Phase 2' });
    await decision.getByLabel('Decision', { exact: true }).selectOption('postponed');
    await decision.getByLabel('Reason').pressSequentially('Second offtaker not signed yet; look again in June.');
    await decision.getByRole('button', { name: 'Record decision' }).click();
    const recorded = page.getByRole('table', { name: 'Decisions recorded' }).getByRole('cell', { name: 'Second offtaker not signed yet; look again in June.' });
    await expect.poll(() => recorded.isVisible(), { timeout: 60_000 }).toBe(true);
    await page.screenshot({ path: '.data/watch.png', fullPage: true });
  }, 120_000);

  it("lists a right in its region on the portfolio's watch list, for an executive", async () => {
    const { caseId, name } = await approvedCase(`Watched kiln ${Date.now().toString(36)}`, [
      { kind: 'expand', id: 'Second kiln', factor: 0.5, cost: 70, window: { kind: 'american', from: 0, to: 3 } },
    ]);
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
