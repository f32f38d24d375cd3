/**
 * Re-valuing a portfolio is a job: in Chromium an analyst sees that some stored figures come from
 * an older engine, starts the re-valuation, watches its progress, and every stale case gets a run
 * of today's engine, made by a worker from the queue; a double click starts one job. A second
 * request while one runs is refused (409); the executive may read progress but not start one
 * (tests/e2e/route-matrix.test.ts).
 */
import { afterAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { ENGINE_VERSION } from '@/lattice';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

const latestEngine = async (caseId: string) =>
  (await db.selectFrom('valuation_run').select('engine_version').where('case_id', '=', caseId).orderBy('created_at', 'desc').executeTakeFirstOrThrow())
    .engine_version;

describe('re-valuing the portfolio', () => {
  it('re-values every case whose figures come from an older engine, as a job with progress', async () => {
    // Two cases whose latest runs are made to look as if an older engine computed them.
    const stale = [await demoCase('Older extrusion line', 'Base case'), await demoCase('Cold-storage hub', 'Calmer market')];
    for (const { caseId } of stale) {
      const latest = await db.selectFrom('valuation_run').select('id').where('case_id', '=', caseId).orderBy('created_at', 'desc').executeTakeFirstOrThrow();
      await db.updateTable('valuation_run').set({ engine_version: 'leeway-lattice 1.9.0' }).where('id', '=', latest.id).execute();
    }

    // A reader who may not re-value is still told which row an older engine computed.
    const executive = await signedInPage('executive@kestrelbay.example');
    await executive.page.goto('/portfolio');
    const row = executive.page.getByRole('row').filter({ hasText: 'Older extrusion line' });
    await expect.poll(async () => (await row.textContent()) ?? '', { timeout: 30_000 }).toContain('computed by leeway-lattice 1.9.0, before today’s engine');
    expect(await executive.page.getByRole('region', { name: 'Re-value figures' }).count()).toBe(0);
    await executive.page.goto('/projects');
    const card = executive.page.getByRole('listitem').filter({ hasText: 'Older extrusion line' });
    await expect.poll(async () => (await card.textContent()) ?? '', { timeout: 30_000 }).toContain('computed by leeway-lattice 1.9.0, before today’s engine');
    await executive.context.close();

    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    await page.goto('/portfolio');
    const region = page.getByRole('region', { name: 'Re-value figures' });
    await expect.poll(() => region.isVisible(), { timeout: 30_000 }).toBe(true);
    // A double click on a slow connection starts one job. Before, the button took clicks until
    // the first answer came, and the second was refused with a 409 whose "already running"
    // replaced the first job's progress.
    const starts: string[] = [];
    page.on('request', (r) => {
      if (r.method() === 'POST' && r.url().endsWith('/api/v1/portfolio/revaluations')) starts.push(r.url());
    });
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 1000, downloadThroughput: -1, uploadThroughput: -1 });
    await region.getByRole('button', { name: 'Re-value them all' }).dblclick();
    const status = region.getByRole('status');
    await expect.poll(async () => (await status.textContent()) ?? '', { timeout: 90_000, interval: 500 }).toMatch(/^Re-valued \d+ of \d+ cases/);
    expect(await status.textContent()).toMatch(/^Re-valued (\d+) of \1 cases with today's engine\.$/);
    expect(starts).toHaveLength(1);
    for (const { caseId } of stale) expect(await latestEngine(caseId)).toBe(ENGINE_VERSION);

    const request = await db.selectFrom('portfolio_revaluation').selectAll().orderBy('created_at', 'desc').executeTakeFirstOrThrow();
    expect([request.status, request.failed, request.done === request.total]).toEqual(['done', 0, true]);
    expect(request.total).toBeGreaterThanOrEqual(2);
    await context.close();
  }, 150_000);

  it('re-values one case from its project page, where the older engine is named', async () => {
    const { caseId, projectId } = await demoCase('Staged pilot line', 'Higher hurdle rate');
    const latest = await db.selectFrom('valuation_run').select('id').where('case_id', '=', caseId).orderBy('created_at', 'desc').executeTakeFirstOrThrow();
    await db.updateTable('valuation_run').set({ engine_version: 'leeway-lattice 1.9.0' }).where('id', '=', latest.id).execute();

    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    await page.goto(`/projects/${projectId}`);
    const row = page.getByRole('row').filter({ hasText: 'Higher hurdle rate' });
    await expect.poll(async () => (await row.textContent()) ?? '', { timeout: 30_000 }).toContain('computed by leeway-lattice 1.9.0, before today’s engine');
    await row.getByRole('button', { name: "Re-value Higher hurdle rate with today's engine" }).click();
    await expect.poll(() => latestEngine(caseId), { timeout: 60_000, interval: 500 }).toBe(ENGINE_VERSION);
    await expect.poll(async () => (await row.textContent()) ?? '', { timeout: 30_000 }).not.toContain('before today’s engine');
    await context.close();
  }, 120_000);

  it('refuses a second re-valuation while one is running', async () => {
    const { context, page } = await signedInPage('admin@kestrelbay.example');
    const org = await db.selectFrom('organization').select('id').where('slug', '=', 'kestrel-bay-materials').executeTakeFirstOrThrow();
    const running = await db
      .insertInto('portfolio_revaluation')
      .values({ organization_id: org.id, status: 'running' })
      .returning('id')
      .executeTakeFirstOrThrow();
    try {
      const second = await page.request.post('/api/v1/portfolio/revaluations');
      expect(second.status()).toBe(409);
      expect((await second.json()).error.message).toMatch(/already running/);
    } finally {
      await db.updateTable('portfolio_revaluation').set({ status: 'done', finished_at: new Date() }).where('id', '=', running.id).execute();
    }
    await context.close();
  });
});
