/**
 * The cross-check as a reviewer uses it (issue 15): on the demo plant's Results tab the reviewer
 * types a path count key by key, starts a cross-check, watches it run on the queue and reads the
 * verdict beside the lattice's figures; the version's validation report then carries the verdict
 * and the engine's published checks, and the reviewer keeps it with the case's documents; the
 * stored row keeps the case and engine versions.
 * Through the API: a run beyond the work bound is refused before it is queued, an organisation
 * cannot queue more than its share, a viewer cannot start one, and a cancelled one says so.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { ENGINE_VERSION } from '@/lattice';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';
import { pdfText } from '../support/pdf-text';

let plant: Awaited<ReturnType<typeof demoCase>>;

beforeAll(async () => {
  plant = await demoCase('Phased bio-resin plant', 'Volatile demand');
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('cross-checking a case', () => {
  it('a reviewer starts one from the Results tab and reads the verdict', async () => {
    const { page } = await signedInPage('reviewer@kestrelbay.example');
    await page.goto(plant.url);
    await page.getByRole('tab', { name: 'Results' }).click();
    const paths = page.getByLabel('Cross-check paths (each pass)');
    // The field comes with the Results tab's figures: 30 s was not enough once in CI on a loaded machine.
    await expect.poll(() => paths.isVisible(), { timeout: 90_000, interval: 1_000 }).toBe(true);
    await paths.click();
    await paths.press('Control+a');
    await paths.pressSequentially('8000', { delay: 40 });
    await page.getByRole('button', { name: 'Cross-check', exact: true }).click();
    await expect
      .poll(
        () =>
          page
            .getByText(/^(Agrees|Disagrees by)/)
            .first()
            .isVisible(),
        { timeout: 120_000, interval: 1_000 },
      )
      .toBe(true);
    await expect.poll(() => page.getByText('Agrees.').isVisible()).toBe(true);
    // The field belongs to the cross-check, not to the case: typing in it leaves the case saved.
    expect(await page.getByText('Checks the saved version: save first').count()).toBe(0);
    expect(await page.getByRole('table', { name: 'The lattice and the Monte Carlo, expanded NPV' }).isVisible()).toBe(true);
    expect(await page.getByText(/8,000 paths in each pass/).isVisible()).toBe(true);
    await page.getByRole('heading', { name: 'Independent cross-check' }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: '.data/cross-check.png', fullPage: false });

    // The validation report of this version now carries the cross-check; the reviewer keeps it with the case.
    const report = await page.request.get(`/api/v1/cases/${plant.caseId}/validation-report?size=A4`, { timeout: 120_000 });
    expect(report.headers()['content-type']).toBe('application/pdf');
    const text = pdfText(Buffer.from(await report.body()));
    expect(text).toContain('Verdict: the two agree');
    expect(text).toMatch(/\d+ of \d+ lie within their tolerance/);
    await page.getByRole('button', { name: 'Keep it with the case’s documents' }).click();
    await expect.poll(() => page.getByText(/^Kept with the case’s documents as/).isVisible(), { timeout: 120_000, interval: 1_000 }).toBe(true);
    await page.getByRole('tab', { name: 'Documents' }).click();
    await expect
      .poll(
        () =>
          page
            .getByRole('link', { name: /validation report v\d+\.pdf/ })
            .first()
            .isVisible(),
        { timeout: 30_000 },
      )
      .toBe(true);

    const row = await db
      .selectFrom('cross_check')
      .select(['case_version', 'engine_version', 'paths', 'status'])
      .where('case_id', '=', plant.caseId)
      .orderBy('created_at', 'desc')
      .executeTakeFirstOrThrow();
    const stored = await db.selectFrom('case').select('version').where('id', '=', plant.caseId).executeTakeFirstOrThrow();
    expect(row).toEqual({ case_version: stored.version, engine_version: ENGINE_VERSION, paths: 8000, status: 'done' });
  }, 240_000);

  it('refuses what it cannot run, for whom it may not, and cancels on request', async () => {
    const analyst = (await signedInPage('analyst@kestrelbay.example')).page.request;
    const url = `/api/v1/cases/${plant.caseId}/cross-checks`;
    // Outside the schema's bounds: refused by field.
    const tooMany = await analyst.post(url, { data: { paths: 10_000_000 } });
    expect(tooMany.status()).toBe(422);
    expect((await tooMany.json()).error.fields.paths).toBeTruthy();
    // A viewer reads cross-checks but does not start them.
    const viewer = (await signedInPage('executive@kestrelbay.example')).page.request;
    expect((await viewer.post(url, { data: {} })).status()).toBe(403);
    expect((await viewer.get(url)).status()).toBe(200);
    // Two at once is the organisation's share; the third waits its turn.
    const first = await (await analyst.post(url, { data: { paths: 200_000, seed: 1 } })).json();
    const second = await (await analyst.post(url, { data: { paths: 200_000, seed: 2 } })).json();
    const third = await analyst.post(url, { data: { paths: 200_000, seed: 3 } });
    expect(third.status()).toBe(429);
    expect(third.headers()['retry-after']).toBeTruthy();
    for (const id of [first.id, second.id]) {
      const cancelled = await analyst.delete(`${url}/${id}`);
      expect(cancelled.status()).toBe(200);
      expect((await (await viewer.get(`${url}/${id}`)).json()).status).toBe('cancelled');
      // Cancelling twice says it has ended.
      expect((await analyst.delete(`${url}/${id}`)).status()).toBe(409);
    }
  }, 120_000);
});
