/**
 * What an executive and an admin need from the portfolio and a project page, in Chromium at
 * 1280×800: each project's approval (what was approved, when, and its board pack, which
 * downloads), renaming and archiving a project in the page (typed key by key), and a ten-year
 * cash-flow grid that fits without scrolling sideways, year 0 beside the line labels and no
 * figure clipped.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { db } from '@/db';
import { filenameOf } from '@/lib/api-client';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

let plant: Awaited<ReturnType<typeof demoCase>>;

beforeAll(async () => {
  plant = await demoCase('Phased bio-resin plant', 'Base case');
});

/** The project's latest approved snapshot, whichever of its cases it was (other tests approve cases too). */
function latestApproval(projectId: string) {
  return db
    .selectFrom('case_snapshot')
    .innerJoin('case', 'case.id', 'case_snapshot.case_id')
    .select(['case_snapshot.case_id', 'case_snapshot.result', 'case_snapshot.case_version', 'case_snapshot.case_name'])
    .where('case.project_id', '=', projectId)
    .where('case_snapshot.status', '=', 'approved')
    .orderBy('case_snapshot.decided_at', 'desc')
    .executeTakeFirstOrThrow();
}

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('the portfolio and project pages', () => {
  it('show each project’s approval with a board pack that downloads', async () => {
    const executive = await signedInPage('executive@kestrelbay.example');
    await executive.page.goto('/portfolio');
    // The projects table's row (the watch list beside it may name the same project).
    const row = executive.page.getByRole('table', { name: /^Projects with their latest valuation/ }).getByRole('row', { name: /Phased bio-resin plant/ });
    await expect.poll(() => row.getByText('Approved').isVisible(), { timeout: 30_000 }).toBe(true);
    const approved = await latestApproval(plant.projectId);
    expect(await row.textContent()).toContain(`${approved.case_name} v${approved.case_version}`);
    const link = row.getByRole('link', { name: /^Board pack of Phased bio-resin plant/ });
    const href = await link.getAttribute('href');
    expect(href).toBe(`/api/v1/cases/${approved.case_id}/board-pack?size=A4`);
    const pdf = await executive.page.request.get(href!);
    expect([pdf.status(), pdf.headers()['content-type']]).toEqual([200, 'application/pdf']);
    // Named by project and case: every project's pack of its "Base case" would otherwise share one name.
    expect(filenameOf(pdf.headers()['content-disposition']!)).toBe(`Phased bio-resin plant - ${approved.case_name} - board pack (A4).pdf`);
    // A project with nothing approved says so instead of showing a link.
    expect(
      await executive.page
        .getByRole('row', { name: /Staged pilot line/ })
        .getByRole('link', { name: /Board pack/ })
        .count(),
    ).toBe(0);
    // The executive reads; the project page offers them no rename or archive.
    await executive.page.goto(`/projects/${plant.projectId}`);
    await expect.poll(() => executive.page.getByRole('heading', { name: 'Cases' }).isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await executive.page.getByRole('button', { name: 'Rename…' }).count()).toBe(0);
    await executive.context.close();
  }, 120_000);

  it('lets an admin rename, archive and restore a project in the page', async () => {
    const admin = await signedInPage('admin@kestrelbay.example');
    const made = await admin.page.request.post('/api/v1/projects', { data: { name: 'Quay crane refit (test)' } });
    expect(made.status()).toBe(201);
    const { project } = await made.json();
    await admin.page.goto(`/projects/${project.id}`);
    await admin.page.getByRole('button', { name: 'Rename…' }).click();
    const name = admin.page.getByLabel('Project name');
    await name.fill('');
    await name.pressSequentially('Quay crane refit, phase 2');
    await admin.page.getByRole('button', { name: 'Save name' }).click();
    await expect.poll(() => admin.page.getByRole('heading', { level: 1, name: 'Quay crane refit, phase 2' }).isVisible(), { timeout: 30_000 }).toBe(true);

    await admin.page.getByRole('button', { name: 'Archive…' }).click();
    await admin.page.getByRole('button', { name: 'Archive project' }).click();
    await expect.poll(() => admin.page.getByRole('button', { name: 'Restore project' }).isVisible(), { timeout: 30_000 }).toBe(true);
    const stored = await db.selectFrom('project').select(['name', 'status']).where('id', '=', project.id).executeTakeFirstOrThrow();
    expect(stored).toEqual({ name: 'Quay crane refit, phase 2', status: 'archived' });
    await admin.page.goto('/portfolio');
    await expect
      .poll(
        () =>
          admin.page
            .getByRole('row', { name: /Quay crane refit, phase 2/ })
            .getByText('Archived')
            .isVisible(),
        { timeout: 30_000 },
      )
      .toBe(true);

    await admin.page.goto(`/projects/${project.id}`);
    await admin.page.getByRole('button', { name: 'Restore project' }).click();
    await expect.poll(() => admin.page.getByRole('button', { name: 'Archive…' }).isVisible(), { timeout: 30_000 }).toBe(true);
    expect((await db.selectFrom('project').select('status').where('id', '=', project.id).executeTakeFirstOrThrow()).status).toBe('active');
    const audit = await db.selectFrom('audit_log').select('action').where('subject_id', '=', project.id).where('action', '=', 'project.update').execute();
    expect(audit).toHaveLength(3);
    await admin.context.close();
  }, 120_000);

  it('lets an analyst delete a project never submitted, and tells why one with an approval cannot be', async () => {
    const analyst = await signedInPage('analyst@kestrelbay.example');
    const made = await analyst.page.request.post('/api/v1/projects', { data: { name: 'Scrap trial (test)' } });
    expect(made.status()).toBe(201);
    const { project } = await made.json();
    await analyst.page.goto(`/projects/${project.id}`);
    // The cases load once the page's script runs; the buttons work from then on (a click before is lost).
    await expect.poll(() => analyst.page.getByRole('heading', { name: 'No cases yet' }).isVisible(), { timeout: 30_000 }).toBe(true);
    await analyst.page.getByRole('button', { name: 'Delete…' }).click();
    await analyst.page.getByRole('button', { name: 'Delete project' }).click();
    await analyst.page.waitForURL(/\/projects$/, { timeout: 30_000 });
    expect((await analyst.page.request.get(`/api/v1/projects/${project.id}`)).status()).toBe(404);

    // The demo plant has an approved case: the server refuses, the dialog says why, nothing goes.
    await analyst.page.goto(`/projects/${plant.projectId}`);
    await expect.poll(() => analyst.page.getByRole('link', { name: 'Base case', exact: true }).isVisible(), { timeout: 30_000 }).toBe(true);
    await analyst.page.getByRole('button', { name: 'Delete…' }).click();
    await analyst.page.getByRole('button', { name: 'Delete project' }).click();
    await expect
      .poll(
        () =>
          analyst.page
            .getByRole('dialog')
            .getByText(/archive it instead of deleting it/)
            .isVisible(),
        { timeout: 30_000 },
      )
      .toBe(true);
    expect((await analyst.page.request.get(`/api/v1/projects/${plant.projectId}`)).status()).toBe(200);
    await analyst.context.close();
  }, 120_000);

  it('fits a ten-year cash-flow grid at 1280 px with year 0 beside the labels', async () => {
    const analyst = await signedInPage('analyst@kestrelbay.example');
    const { project } = await (await analyst.page.request.post('/api/v1/projects', { data: { name: 'Ten-year grid (test)' } })).json();
    const rows = Array.from({ length: 11 }, (_, year) => ({
      year,
      revenue: year === 0 ? 0 : 1234.5,
      operatingCost: year === 0 ? 0 : 987.25,
      capex: year === 0 ? 15000 : 0,
      tax: 0,
      workingCapital: 0,
    }));
    const made = await analyst.page.request.post(`/api/v1/projects/${project.id}/cases`, {
      data: {
        name: 'Ten years',
        cashFlows: { wacc: 0.08, rows },
        settings: { volatility: 0.3, riskFreeRate: 0.03, steps: 100 },
        options: [],
      },
    });
    expect(made.status()).toBe(201);
    const { case: created } = await made.json();
    await analyst.page.goto(`/projects/${project.id}/cases/${created.id}`);
    const year0 = analyst.page.getByLabel('Revenue, year 0', { exact: true });
    const year10 = analyst.page.getByLabel('Revenue, year 10', { exact: true });
    await expect.poll(() => year10.isVisible(), { timeout: 30_000 }).toBe(true);
    const scroller = analyst.page.locator('table:has(caption:text("Cash flows by year")) >> xpath=..');
    const { scrollWidth, clientWidth } = await scroller.evaluate((el) => ({ scrollWidth: el.scrollWidth, clientWidth: el.clientWidth }));
    expect(scrollWidth).toBeLessThanOrEqual(clientWidth);
    const label = await analyst.page.getByRole('rowheader', { name: 'Revenue' }).boundingBox();
    const first = await year0.boundingBox();
    const last = await year10.boundingBox();
    expect(first!.x).toBeGreaterThanOrEqual(label!.x + label!.width - 1);
    expect(last!.x + last!.width).toBeLessThanOrEqual(1280);
    // And every figure is shown whole: no input's text is wider than the input.
    const clipped = await analyst.page
      .locator('input[data-cell]')
      .evaluateAll((inputs) => inputs.filter((i) => i.scrollWidth > i.clientWidth).map((i) => i.getAttribute('aria-label')));
    expect(clipped).toEqual([]);
    await analyst.context.close();
  }, 120_000);

  it('exports each project’s approved figures as CSV and XLSX, equal to the approved snapshot', async () => {
    const executive = await signedInPage('executive@kestrelbay.example');
    const csv = await executive.page.request.get('/api/v1/portfolio.csv');
    expect(csv.status()).toBe(200);
    expect(csv.headers()['content-type']).toMatch(/^text\/csv/);
    const rows = Papa.parse<Record<string, string>>(await csv.text(), { header: true, skipEmptyLines: true }).data;
    const plantRow = rows.find((r) => r.Project === 'Phased bio-resin plant')!;
    const snapshot = await latestApproval(plant.projectId);
    const result = snapshot.result as { staticNpv: number; optionPremium: number; expandedNpv: number };
    expect(plantRow).toMatchObject({ Approval: 'approved', 'Approved case': snapshot.case_name, 'Approved version': String(snapshot.case_version) });
    // Exported to 4 decimals.
    expect(Math.abs(Number(plantRow['Static NPV']) - result.staticNpv)).toBeLessThanOrEqual(5e-5);
    expect(Math.abs(Number(plantRow['Expanded NPV']) - result.expandedNpv)).toBeLessThanOrEqual(5e-5);
    expect(Math.abs(Number(plantRow['Option premium']) - result.optionPremium)).toBeLessThanOrEqual(5e-5);
    const xlsx = await executive.page.request.get('/api/v1/portfolio.xlsx');
    expect(xlsx.status()).toBe(200);
    expect(xlsx.headers()['content-type']).toContain('spreadsheetml');

    // The portfolio page's CSV link saves the same file under the server's name.
    await executive.page.goto('/portfolio');
    const download = executive.page.waitForEvent('download');
    await executive.page.getByRole('link', { name: 'CSV', exact: true }).click();
    const saved = await download;
    expect(saved.suggestedFilename()).toBe('Leeway portfolio.csv');
    const { readFileSync } = await import('node:fs');
    expect(readFileSync((await saved.path())!, 'utf8')).toBe(await csv.text());
    await executive.context.close();
  });
});
