/**
 * Reproducible runs (issue 15): every stored run of the demo organisation, re-run through the API
 * by a reviewer, reproduces its stored result hash exactly; a run whose stored figures differ
 * from what the engine gives (as after an engine change) is reported as not reproducing, with
 * each moved figure and by how much; in Chromium a reviewer re-runs a run from the Results tab.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

type Request = Awaited<ReturnType<typeof signedInPage>>['page']['request'];
let reviewer: Request;

beforeAll(async () => {
  reviewer = (await signedInPage('reviewer@kestrelbay.example')).page.request;
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('re-running stored runs', () => {
  it('reproduces every stored run of the demo organisation to the last bit', async () => {
    const runs = await db
      .selectFrom('valuation_run')
      .innerJoin('organization', 'organization.id', 'valuation_run.organization_id')
      .select(['valuation_run.id', 'valuation_run.case_id'])
      .where('organization.slug', '=', 'kestrel-bay-materials')
      .execute();
    expect(runs.length).toBeGreaterThanOrEqual(5);
    const failed: string[] = [];
    for (const run of runs) {
      const answer = await reviewer.post(`/api/v1/cases/${run.case_id}/valuations/${run.id}/rerun`, { timeout: 60_000 });
      const body = await answer.json();
      if (answer.status() !== 200 || !body.reproduced) failed.push(`${run.id}: ${answer.status()} ${JSON.stringify(body).slice(0, 300)}`);
    }
    expect(failed).toEqual([]);
  }, 600_000);

  it('says what moved, and by how much, when the stored figures are not what the engine gives', async () => {
    const plant = await demoCase('Phased bio-resin plant', 'Base case');
    const run = await db
      .selectFrom('valuation_run')
      .select(['id', 'result', 'result_hash'])
      .where('case_id', '=', plant.caseId)
      .orderBy('created_at', 'desc')
      .executeTakeFirstOrThrow();
    const result = run.result as { expandedNpv: number; optionPremium: number };
    // As if an older engine had stored figures 1.5 higher, before result hashes were kept.
    await db
      .updateTable('valuation_run')
      .set({
        result: JSON.stringify({ ...result, expandedNpv: result.expandedNpv + 1.5, optionPremium: result.optionPremium + 1.5 }),
        result_hash: null,
      } as never)
      .where('id', '=', run.id)
      .execute();
    try {
      const answer = await reviewer.post(`/api/v1/cases/${plant.caseId}/valuations/${run.id}/rerun`, { timeout: 60_000 });
      expect(answer.status()).toBe(200);
      const body = await answer.json();
      expect(body.reproduced).toBe(false);
      expect(body.storedHash).not.toBe(body.resultHash);
      expect(body.resultHash).toBe(run.result_hash);
      expect(body.moved.map((m: { figure: string }) => m.figure)).toEqual(['Option premium', 'Expanded NPV']);
      for (const m of body.moved) expect(m.change).toBeCloseTo(-1.5, 9);
      expect(body.partsThatDiffer).toEqual(['expandedNpv', 'optionPremium']);
    } finally {
      await db
        .updateTable('valuation_run')
        .set({ result: JSON.stringify(result), result_hash: run.result_hash } as never)
        .where('id', '=', run.id)
        .execute();
    }
    // A viewer may read runs but not re-run them; another organisation does not see them.
    const viewer = await signedInPage('executive@kestrelbay.example');
    expect((await viewer.page.request.post(`/api/v1/cases/${plant.caseId}/valuations/${run.id}/rerun`)).status()).toBe(403);
    const outsider = await signedInPage('owner@harrowfen.example');
    expect((await outsider.page.request.post(`/api/v1/cases/${plant.caseId}/valuations/${run.id}/rerun`)).status()).toBe(404);
  }, 120_000);

  it('lets a reviewer re-run a run from the Results tab', async () => {
    const plant = await demoCase('Phased bio-resin plant', 'Base case');
    const { page } = await signedInPage('reviewer@kestrelbay.example');
    await page.goto(plant.url);
    await page.getByRole('tab', { name: 'Results' }).click();
    const first = page.getByRole('button', { name: /^Re-run the run of/ }).first();
    await expect.poll(() => first.isVisible(), { timeout: 30_000 }).toBe(true);
    await first.click();
    await expect.poll(() => page.getByText(/^Reproduces: leeway-lattice/).isVisible(), { timeout: 60_000 }).toBe(true);
  }, 120_000);
});
