/**
 * From case to decision in Chromium: the analyst submits a case; the reviewer is e-mailed,
 * comments and returns it with a reason; edits during review are refused; the analyst fixes the
 * case and resubmits; the reviewer approves; the analyst's approval e-mail carries the board
 * pack; the executive downloads the pack, whose text holds the snapshot's figures exactly as the
 * app shows them. Another organisation gets 404 from every review route.
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { valueProject } from '@/lattice';
import { caseToModel } from '@/lib/case-model';
import { decisionRule } from '@/lib/decision-rules';
import { formatMoney } from '@/lib/format';
import { warningSentence } from '@/lib/warning-words';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';
import { pdfText } from '../support/pdf-text';
import { firstLink, waitForMail } from './support/mail';

let caseId = '';
let projectId = '';
let baseCaseId = '';

beforeAll(async () => {
  ({ caseId, projectId } = await demoCase('Phased bio-resin plant', 'Volatile demand'));
  baseCaseId = (await demoCase('Phased bio-resin plant', 'Base case')).caseId;
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

async function openReviewTab(page: Page) {
  await page.goto(`/projects/${projectId}/cases/${caseId}`);
  await page.getByRole('tab', { name: 'Review' }).click();
  await expect.poll(() => page.getByRole('heading', { name: 'Review history' }).isVisible(), { timeout: 20_000 }).toBe(true);
}

/** Submits as an analyst does: the dialog asks for the recommendation, typed key by key. */
async function submitWithRecommendation(page: Page, text: string) {
  await page.getByRole('button', { name: 'Submit for review…' }).click();
  await page.getByLabel('Your recommendation to the committee').pressSequentially(text);
  await page.getByRole('dialog').getByRole('button', { name: 'Submit for review' }).click();
}

/**
 * Opens the submit dialog on a case with no unsaved edits and expects it to list the engine's
 * warnings on the saved case, valued here apart from the page, as the board pack will print
 * them; then closes it. Returns how many there were.
 */
async function expectWarningsInSubmitDialog(page: Page): Promise<number> {
  const saved = (await (await page.request.get(`/api/v1/cases/${caseId}`)).json()).case;
  const { warnings } = valueProject(caseToModel(saved).model);
  await page.getByRole('button', { name: 'Submit for review…' }).click();
  for (const warning of warnings)
    await expect
      .poll(
        () =>
          page
            .getByRole('dialog')
            .getByText(`The board pack prints the engine’s warning: ${warningSentence(warning)}`)
            .isVisible(),
        { timeout: 30_000 },
      )
      .toBe(true);
  await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();
  return warnings.length;
}

describe('review workflow', () => {
  it('goes from submission through a return and a resubmission to approval and the board pack', async () => {
    const analyst = await signedInPage('analyst@kestrelbay.example');
    await openReviewTab(analyst.page);
    // The demo's "Volatile demand" at its 96 steps warns of its error band: the dialog has one to show.
    expect(await expectWarningsInSubmitDialog(analyst.page)).toBeGreaterThan(0);
    await submitWithRecommendation(analyst.page, 'Proceed with phase 1; keep the sale option open.');
    await expect
      .poll(() => analyst.page.getByText('Submitted for review; the reviewers have been told by e-mail.').isVisible(), { timeout: 20_000 })
      .toBe(true);

    const submitted = await waitForMail('reviewer@kestrelbay.example', /^For review: Phased bio-resin plant — Volatile demand$/);
    expect(firstLink(submitted)).toContain(`/cases/${caseId}`);

    // Frozen while in review: the API refuses a save.
    const current = (await (await analyst.page.request.get(`/api/v1/cases/${caseId}`)).json()).case;
    const refused = await analyst.page.request.patch(`/api/v1/cases/${caseId}`, { data: { ...current, name: 'Edited in review', version: current.version } });
    expect(refused.status()).toBe(409);
    expect((await refused.json()).error.message).toContain('in review');

    const reviewer = await signedInPage('reviewer@kestrelbay.example');
    await reviewer.page.goto('/review');
    await expect.poll(() => reviewer.page.getByRole('link', { name: 'Phased bio-resin plant — Volatile demand' }).isVisible(), { timeout: 20_000 }).toBe(true);
    await reviewer.page.getByRole('link', { name: 'Phased bio-resin plant — Volatile demand' }).click();
    await reviewer.page.waitForURL(/\/cases\//);
    await reviewer.page.getByRole('tab', { name: 'Review' }).click();
    await reviewer.page.getByLabel('About').selectOption('uncertainty');
    await reviewer.page.getByLabel('Comment').fill('Where does 42 % come from? Show the comparables.');
    await reviewer.page.getByRole('button', { name: 'Add comment' }).click();
    await expect.poll(() => reviewer.page.getByText('Where does 42 % come from? Show the comparables.').isVisible()).toBe(true);
    await reviewer.page.getByRole('button', { name: 'Return to the analyst…' }).click();
    await reviewer.page.getByLabel('Reason (sent to the analyst)').fill('Justify the volatility before approval.');
    await reviewer.page.getByRole('button', { name: 'Return the case' }).click();
    await expect.poll(() => reviewer.page.getByText('Returned to the analyst with your reason.').isVisible(), { timeout: 20_000 }).toBe(true);

    const returned = await waitForMail('analyst@kestrelbay.example', /^Returned: Phased bio-resin plant — Volatile demand$/);
    expect(returned.text).toContain('Justify the volatility before approval.');

    // The analyst fixes the case (a lower volatility), saves and submits again.
    await analyst.page.goto(`/projects/${projectId}/cases/${caseId}`);
    await analyst.page.getByRole('tab', { name: 'Uncertainty' }).click();
    await analyst.page.getByLabel('Volatility (%)', { exact: true }).fill('38');
    await analyst.page.getByRole('tab', { name: 'Review' }).click();
    await expect
      .poll(() => analyst.page.getByText('Justify the volatility before approval.', { exact: false }).first().isVisible(), { timeout: 20_000 })
      .toBe(true);
    await submitWithRecommendation(analyst.page, 'Proceed; volatility now justified from the history.');
    await expect
      .poll(() => analyst.page.getByText('Submitted for review; the reviewers have been told by e-mail.').isVisible(), { timeout: 20_000 })
      .toBe(true);

    await reviewer.page.goto(`/projects/${projectId}/cases/${caseId}`);
    await reviewer.page.getByRole('tab', { name: 'Review' }).click();
    // Before deciding, the reviewer sees what changed since they returned version 1: the volatility, and the figures with it.
    await expect.poll(() => reviewer.page.getByText('What changed since version 1 was returned', { exact: false }).isVisible(), { timeout: 30_000 }).toBe(true);
    const volatilityChange = reviewer.page.getByRole('row', { name: /^Assumptions: Volatility/ });
    expect(await volatilityChange.textContent()).toMatch(/42 %.*38 %/);
    expect(await reviewer.page.getByRole('row', { name: /^Valuation: Expanded NPV/ }).count()).toBe(1);
    await reviewer.page.getByRole('button', { name: 'Approve' }).click();
    await expect.poll(() => reviewer.page.getByText('Approved. The board pack is ready.').isVisible(), { timeout: 30_000 }).toBe(true);

    const approved = await waitForMail('analyst@kestrelbay.example', /^Approved: Phased bio-resin plant — Volatile demand$/, 30_000);
    expect(approved.attachments?.map((a) => a.contentType)).toEqual(['application/pdf']);

    // Every list shows the approved version's figures beside its status: the submission stored them as the case's latest run.
    const [approvedSnapshot] = (await (await reviewer.page.request.get(`/api/v1/cases/${caseId}/snapshots`)).json()).snapshots;
    const frozen = await db.selectFrom('case_snapshot').select('result').where('id', '=', approvedSnapshot.id).executeTakeFirstOrThrow();
    const listed = (await (await reviewer.page.request.get(`/api/v1/projects/${projectId}/cases`)).json()).cases.find((c: { id: string }) => c.id === caseId);
    expect([listed.latest.caseVersion, listed.latest.expandedNpv]).toEqual([
      approvedSnapshot.caseVersion,
      (frozen.result as { expandedNpv: number }).expandedNpv,
    ]);
    const compared = (await (await reviewer.page.request.get(`/api/v1/compare?cases=${caseId},${baseCaseId}`)).json()).cases[0];
    expect([compared.figuresVersion, compared.expandedNpv]).toEqual([approvedSnapshot.caseVersion, (frozen.result as { expandedNpv: number }).expandedNpv]);

    // Two decisions on one snapshot: the second is refused; the reviewed record cannot be deleted.
    expect((await reviewer.page.request.post(`/api/v1/cases/${caseId}/approve`)).status()).toBe(409);
    expect((await analyst.page.request.delete(`/api/v1/cases/${caseId}`)).status()).toBe(409);
    expect((await analyst.page.request.delete(`/api/v1/projects/${projectId}`)).status()).toBe(409);
    await analyst.context.close();
    await reviewer.context.close();
  });

  it('lets the executive download the board pack, whose text holds the figures the app shows', async () => {
    const { context, page } = await signedInPage('executive@kestrelbay.example');
    await openReviewTab(page);
    const snapshots = (await (await page.request.get(`/api/v1/cases/${caseId}/snapshots`)).json()).snapshots;
    expect(snapshots.map((s: { status: string }) => s.status)).toEqual(['approved', 'returned']);
    const shown = formatMoney(snapshots[0].expandedNpv, 'EUR');
    await expect.poll(() => page.getByRole('cell', { name: shown }).first().isVisible()).toBe(true);

    const download = page.waitForEvent('download');
    await page.getByRole('link', { name: 'Board pack (PDF, A4)' }).click();
    const file = await (await download).path();
    const { readFileSync } = await import('node:fs');
    const pdf = readFileSync(file);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const text = pdfText(pdf, { layout: true });
    const snapshot = await db.selectFrom('case_snapshot').select(['result', 'decided_at']).where('id', '=', snapshots[0].id).executeTakeFirstOrThrow();
    const result = snapshot.result as { staticNpv: number; optionPremium: number; expandedNpv: number; rights: never[] };
    for (const figure of [result.staticNpv, result.optionPremium, result.expandedNpv]) expect(text).toContain(formatMoney(figure, 'EUR'));
    expect(text).toContain('Approval record');
    expect(text).toContain('Tomasz Okafor');
    // The record holds the whole road: the first submission, its return with the reason, the resubmission and the approval.
    expect(text).toContain('Returned: “Justify the volatility before approval.”');
    // The recommendation is the analyst's own, as written at submission; Leeway's reading is labelled as generated.
    expect(text).toContain('Proceed; volatility now justified from the history.');
    expect(text).toContain('Written by Priya Lindqvist when submitting version');
    expect(text).toContain("Leeway's reading of the figures (generated, for reference)");
    expect(text.match(/Submitted for review/g)).toHaveLength(2);
    expect(text).toContain(decisionRule(result.rights[0]!, 'EUR').text.slice(0, 40));

    // The same snapshot always gives the same document, and Letter is there too.
    const again = await page.request.get(`/api/v1/cases/${caseId}/board-pack?size=A4`);
    expect(Buffer.from(await again.body()).equals(pdf)).toBe(true);
    const letter = await page.request.get(`/api/v1/cases/${caseId}/board-pack?size=letter`);
    expect(letter.status()).toBe(200);
    expect(letter.headers()['content-type']).toBe('application/pdf');
    expect((await page.request.get(`/api/v1/cases/${caseId}/board-pack?size=A3`)).status()).toBe(422);

    // A refused download says why beside its link, and the page stays: here the Letter pack is
    // answered as the server answers when renders are busy (lib/board-pack/pdf-thread.ts).
    const busy = 'Other documents are being rendered right now; try again in a few seconds.';
    await page.route('**/board-pack?size=LETTER', (route) =>
      route.fulfill({
        status: 429,
        headers: { 'retry-after': '3' },
        contentType: 'application/json',
        body: JSON.stringify({ error: { code: 'rate_limited', message: busy } }),
      }),
    );
    const where = page.url();
    await page.getByRole('link', { name: 'Board pack (PDF, US Letter)' }).focus();
    await page.keyboard.press('Enter');
    await expect.poll(() => page.getByRole('alert').filter({ hasText: busy }).isVisible(), { timeout: 30_000 }).toBe(true);
    expect(page.url()).toBe(where);
    await context.close();
  });

  it('answers another organisation 404 on every review route, whatever its role, and a viewer 403 on every action', async () => {
    const outsider = await signedInPage('owner@harrowfen.example');
    const viewer = await signedInPage('executive@kestrelbay.example');
    const harrowMember = await db
      .selectFrom('member')
      .innerJoin('user', 'user.id', 'member.userId')
      .select('member.id')
      .where('user.email', '=', 'owner@harrowfen.example')
      .executeTakeFirstOrThrow();
    // The other organisation's member takes, in turn, the role each route needs, so only the organisation differs.
    const actAs = (role: string) => db.updateTable('member').set({ role }).where('id', '=', harrowMember.id).execute();
    const routes: ['get' | 'post', string, string, unknown?][] = [
      ['post', 'analyst', `/api/v1/cases/${caseId}/submit`, { recommendation: 'Not yours to submit.' }],
      ['post', 'reviewer', `/api/v1/cases/${caseId}/approve`],
      ['post', 'reviewer', `/api/v1/cases/${caseId}/return`, { reason: 'Not yours to return.' }],
      ['get', 'viewer', `/api/v1/cases/${caseId}/comments`],
      ['post', 'reviewer', `/api/v1/cases/${caseId}/comments`, { section: 'general', body: 'Hello' }],
      ['get', 'viewer', `/api/v1/cases/${caseId}/snapshots`],
      ['get', 'viewer', `/api/v1/cases/${caseId}/board-pack`],
    ];
    const got: Record<string, [number, number]> = {};
    try {
      for (const [method, role, url, data] of routes) {
        await actAs(role);
        const options = data === undefined ? {} : { data };
        got[`${method} ${url.split('/').at(-1)}`] = [
          (await outsider.page.request[method](url, options)).status(),
          (await viewer.page.request[method](url, options)).status(),
        ];
      }
      await actAs('reviewer');
      expect((await (await outsider.page.request.get('/api/v1/reviews')).json()).cases).toEqual([]);
    } finally {
      await actAs('admin');
    }
    // [other organisation, Kestrel Bay's executive]: the executive may read, never act.
    expect(got).toEqual({
      'post submit': [404, 403],
      'post approve': [404, 403],
      'post return': [404, 403],
      'get comments': [404, 200],
      'post comments': [404, 403],
      'get snapshots': [404, 200],
      'get board-pack': [404, 200],
    });
    await outsider.context.close();
    await viewer.context.close();
  });

  it('keeps an approved case as approved until someone starts a revision, which leaves the approval and its pack untouched', async () => {
    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    await page.goto(`/projects/${projectId}/cases/${caseId}`);
    await page.getByRole('tab', { name: 'Cash flows' }).click();
    await expect.poll(() => page.getByRole('button', { name: 'Start a revision' }).isVisible(), { timeout: 20_000 }).toBe(true);
    // No keystroke can change it: the fields are read-only and a direct save is refused.
    expect(await page.getByLabel('Revenue, year 1', { exact: true }).getAttribute('readonly')).not.toBeNull();
    const current = (await (await page.request.get(`/api/v1/cases/${caseId}`)).json()).case;
    const refused = await page.request.patch(`/api/v1/cases/${caseId}`, { data: { ...current, name: 'Edited after approval', version: current.version } });
    expect(refused.status()).toBe(409);
    expect((await refused.json()).error.message).toContain('start a revision');
    const packBefore = Buffer.from(await (await page.request.get(`/api/v1/cases/${caseId}/board-pack?size=A4`)).body());

    await page.getByRole('button', { name: 'Start a revision' }).click();
    await expect.poll(async () => (await (await page.request.get(`/api/v1/cases/${caseId}`)).json()).case.status, { timeout: 20_000 }).toBe('draft');
    const revised = (await (await page.request.get(`/api/v1/cases/${caseId}`)).json()).case;
    expect(revised.version).toBe(current.version + 1);
    await expect.poll(() => page.getByLabel('Revenue, year 1', { exact: true }).getAttribute('readonly'), { timeout: 20_000 }).toBeNull();
    // The approval, its snapshot and its pack are as they were.
    const snapshots = (await (await page.request.get(`/api/v1/cases/${caseId}/snapshots`)).json()).snapshots;
    expect(snapshots[0].status).toBe('approved');
    const packAfter = Buffer.from(await (await page.request.get(`/api/v1/cases/${caseId}/board-pack?size=A4`)).body());
    expect(packAfter.equals(packBefore)).toBe(true);
    // A second revision of a draft is refused: it is edited as it is.
    expect((await page.request.post(`/api/v1/cases/${caseId}/revisions`)).status()).toBe(409);

    // Submitted again unchanged, the reviewer is told these very inputs were approved before.
    expect((await page.request.post(`/api/v1/cases/${caseId}/submit`, { data: { recommendation: 'Unchanged; resubmitted.' } })).status()).toBe(201);
    const reviewer = await signedInPage('reviewer@kestrelbay.example');
    await reviewer.page.goto(`/projects/${projectId}/cases/${caseId}`);
    await reviewer.page.getByRole('tab', { name: 'Review' }).click();
    const approvedVersion = snapshots[0].caseVersion;
    await expect
      .poll(() => reviewer.page.getByText(`These inputs are identical to version ${approvedVersion}, approved on`).isVisible(), { timeout: 30_000 })
      .toBe(true);
    // Left in review for nobody: the analyst withdraws it again.
    expect((await page.request.post(`/api/v1/cases/${caseId}/withdraw`)).status()).toBe(200);
    await reviewer.context.close();
    await context.close();
  });
});
