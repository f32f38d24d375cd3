/**
 * An analyst takes back their own submission before a reviewer decides: in Chromium the button
 * appears only for them, the case is a draft again at the same version, the review history keeps
 * the snapshot marked "Withdrawn", the reviewers are told by e-mail, and the audit log records it. A reviewer can then no longer
 * decide on it (409); other roles are refused (403). Another organisation's analyst gets 404
 * (tests/e2e/route-matrix.test.ts).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';
import { firstLink, waitForMail } from './support/mail';

let caseId = '';
let url = '';

beforeAll(async () => {
  ({ caseId, url } = await demoCase('Staged pilot line', 'Base case'));
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('withdrawing a submission', () => {
  it('turns the case back into a draft and keeps the withdrawn snapshot in the history', async () => {
    const analyst = await signedInPage('analyst@kestrelbay.example');
    const before = (await (await analyst.page.request.get(`/api/v1/cases/${caseId}`)).json()).case;
    expect(before.status).toBe('draft');

    await analyst.page.goto(url);
    await analyst.page.getByRole('tab', { name: 'Review' }).click();
    await analyst.page.getByRole('button', { name: 'Submit for review…' }).click();
    await analyst.page.getByLabel('Your recommendation to the committee').pressSequentially('Build the pilot line in two stages.');
    await analyst.page.getByRole('dialog').getByRole('button', { name: 'Submit for review' }).click();
    await expect.poll(() => analyst.page.getByRole('button', { name: 'Withdraw my submission' }).isVisible(), { timeout: 30_000 }).toBe(true);

    // Nobody else is offered the button, and the server refuses them too.
    const reviewer = await signedInPage('reviewer@kestrelbay.example');
    await reviewer.page.goto(url);
    await reviewer.page.getByRole('tab', { name: 'Review' }).click();
    await expect.poll(() => reviewer.page.getByRole('button', { name: 'Approve' }).isVisible(), { timeout: 30_000 }).toBe(true);
    // The reviewer reads the analyst's recommendation beside the actions.
    expect(await reviewer.page.getByText('Build the pilot line in two stages.').isVisible()).toBe(true);
    expect(await reviewer.page.getByRole('button', { name: 'Withdraw my submission' }).count()).toBe(0);
    expect((await reviewer.page.request.post(`/api/v1/cases/${caseId}/withdraw`)).status()).toBe(403);
    const admin = await signedInPage('admin@kestrelbay.example');
    expect((await admin.page.request.post(`/api/v1/cases/${caseId}/withdraw`)).status()).toBe(403);
    // An admin of another organisation is refused by role before anything is looked up.
    const outsider = await signedInPage('owner@harrowfen.example');
    expect((await outsider.page.request.post(`/api/v1/cases/${caseId}/withdraw`)).status()).toBe(403);

    await analyst.page.getByRole('button', { name: 'Withdraw my submission' }).click();
    await expect
      .poll(() => analyst.page.getByText('Submission withdrawn. The case is a draft again', { exact: false }).isVisible(), { timeout: 30_000 })
      .toBe(true);
    await expect.poll(() => analyst.page.getByRole('button', { name: 'Submit for review…' }).isVisible(), { timeout: 30_000 }).toBe(true);
    await expect.poll(() => analyst.page.getByRole('cell', { name: /Withdrawn/ }).isVisible(), { timeout: 30_000 }).toBe(true);

    // The reviewers, told of the submission, are told of its withdrawal too.
    const told = await waitForMail('reviewer@kestrelbay.example', /^Withdrawn: Staged pilot line — Base case$/, 60_000);
    expect(firstLink(told)).toContain(`/cases/${caseId}`);

    const after = (await (await analyst.page.request.get(`/api/v1/cases/${caseId}`)).json()).case;
    expect([after.status, after.version]).toEqual(['draft', before.version]);
    const { snapshots } = await (await analyst.page.request.get(`/api/v1/cases/${caseId}/snapshots`)).json();
    expect(snapshots[0].status).toBe('withdrawn');
    expect(snapshots[0].decidedAt).not.toBeNull();

    // Once withdrawn there is nothing to decide on, and nothing to withdraw again.
    expect((await reviewer.page.request.post(`/api/v1/cases/${caseId}/approve`)).status()).toBe(409);
    expect((await analyst.page.request.post(`/api/v1/cases/${caseId}/withdraw`)).status()).toBe(409);

    const audit = await db
      .selectFrom('audit_log')
      .select(['action', 'detail'])
      .where('subject_id', '=', caseId)
      .where('action', '=', 'case.withdraw')
      .execute();
    expect(audit).toHaveLength(1);
    expect((audit[0]!.detail as { snapshot: string }).snapshot).toBe(snapshots[0].id);

    for (const who of [analyst, reviewer, admin, outsider]) await who.context.close();
  }, 180_000);
});
