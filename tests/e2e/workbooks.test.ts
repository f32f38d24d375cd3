/**
 * Spreadsheets in and out: the template downloads; a case's export imports into another case
 * with identical numbers, shown before it is confirmed; formula-laden, mistyped and oversized
 * files are refused with their own messages and change nothing; roles and organisations are
 * respected.
 */
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { optionKindLabels } from '@/lib/option-form';
import { CASH_FLOW_SHEET } from '@/lib/spreadsheets/cash-flow-workbook';
import { closeBrowser, signedInPage } from './support/browser';
import { demoCase } from './support/demo';

const ids: Record<'plant' | 'line', { caseId: string; projectId: string }> = {} as never;

beforeAll(async () => {
  ids.plant = await demoCase('Phased bio-resin plant', 'Base case');
  ids.line = await demoCase('Older extrusion line', 'Without mothballing');
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('workbooks', () => {
  it("downloads the template, and imports one case's export into another with identical numbers", async () => {
    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    const template = await page.request.get('/api/v1/templates/cash-flows.xlsx');
    expect(template.status()).toBe(200);
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(Buffer.from(await template.body()) as never);
    expect(book.worksheets.map((w) => w.name)).toEqual([CASH_FLOW_SHEET, 'How to fill this in']);

    const exported = await page.request.get(`/api/v1/cases/${ids.plant.caseId}/export.xlsx`);
    expect(exported.status()).toBe(200);
    const exportBook = new ExcelJS.Workbook();
    await exportBook.xlsx.load(Buffer.from(await exported.body()) as never);
    expect(exportBook.worksheets.map((w) => w.name)).toEqual([
      'Summary',
      CASH_FLOW_SHEET,
      'How to fill this in',
      'Settings',
      'Rights',
      'Results',
      'Lattice',
      'Cautions',
    ]);
    // The Rights sheet names each right's kind in the cards' words, not the engine's codes.
    const kinds = exportBook.getWorksheet('Rights')!.getColumn(2).values.slice(2);
    expect(kinds.length).toBeGreaterThan(0);
    for (const kind of kinds) expect(Object.values(optionKindLabels)).toContain(kind);

    const before = (await (await page.request.get(`/api/v1/cases/${ids.line.caseId}`)).json()).case;
    await page.goto(`/projects/${ids.line.projectId}/cases/${ids.line.caseId}`);

    // The blank template reads back as six years, shown before anything is saved; cancelling keeps the case.
    await page.getByLabel('Import from a workbook:').setInputFiles({
      name: 'template.xlsx',
      mimeType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
      buffer: Buffer.from(await template.body()),
    });
    await expect
      .poll(
        () =>
          page
            .getByRole('dialog')
            .getByText(/^Read 6 years at a WACC of 8\.5 %/)
            .isVisible(),
        { timeout: 20_000 },
      )
      .toBe(true);
    await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();

    // The export link of the case editor downloads the workbook.
    const download = page.waitForEvent('download');
    await page.getByRole('link', { name: 'Export workbook' }).click();
    expect((await download).suggestedFilename()).toBe('Older extrusion line - Without mothballing.xlsx');

    await page.getByLabel('Import from a workbook:').setInputFiles({
      name: 'plant-export.xlsx',
      mimeType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
      buffer: Buffer.from(await exported.body()),
    });
    await expect
      .poll(
        () =>
          page
            .getByRole('dialog')
            .getByText(/^Read 9 years at a WACC of 8\.5 %/)
            .isVisible(),
        { timeout: 20_000 },
      )
      .toBe(true);
    // Nothing is saved by the preview.
    expect((await (await page.request.get(`/api/v1/cases/${ids.line.caseId}`)).json()).case.version).toBe(before.version);
    await page.getByRole('button', { name: 'Replace the cash flows and save' }).click();
    await expect.poll(() => page.getByText('Imported the cash flows from “plant-export.xlsx” and saved the case.').isVisible(), { timeout: 20_000 }).toBe(true);

    const plant = (await (await page.request.get(`/api/v1/cases/${ids.plant.caseId}`)).json()).case;
    const after = (await (await page.request.get(`/api/v1/cases/${ids.line.caseId}`)).json()).case;
    expect(after.version).toBe(before.version + 1);
    expect(after.cashFlows.rows).toEqual(plant.cashFlows.rows);
    expect(after.cashFlows.wacc).toBe(plant.cashFlows.wacc);
    expect(after.options).toEqual(before.options);
    await context.close();
  });

  it('refuses formula-laden, mistyped and oversized files, changing nothing, and respects roles and organisations', async () => {
    const analyst = await signedInPage('analyst@kestrelbay.example');
    const url = `/api/v1/cases/${ids.line.caseId}/cash-flows/import`;
    const before = (await (await analyst.page.request.get(`/api/v1/cases/${ids.line.caseId}`)).json()).case;
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(Buffer.from(await (await analyst.page.request.get('/api/v1/templates/cash-flows.xlsx')).body()) as never);
    book.getWorksheet(CASH_FLOW_SHEET)!.getCell('B3').value = { formula: 'HYPERLINK("http://example.invalid","x")', result: 0 } as ExcelJS.CellFormulaValue;
    const withFormula = Buffer.from(await book.xlsx.writeBuffer());
    const upload = (name: string, buffer: Buffer, who = analyst) =>
      who.page.request.post(url, {
        multipart: { file: { name, mimeType: 'application/octet-stream', buffer }, confirm: 'true', version: String(before.version) },
      });

    const formula = await upload('cash-flows.xlsx', withFormula);
    expect(formula.status()).toBe(422);
    expect((await formula.json()).error.fields.file).toEqual(['Cash flows!B3: holds a formula; type the value instead.']);
    const mistyped = await upload('cash-flows.xlsx', Buffer.from('year,revenue\n0,10\n'));
    expect([mistyped.status(), (await mistyped.json()).error.message]).toEqual([422, '“cash-flows.xlsx” is named XLSX but its content is CSV.']);
    expect((await upload('cash-flows.xlsx', Buffer.alloc(11 * 1024 * 1024, 1))).status()).toBe(413);
    expect((await (await analyst.page.request.get(`/api/v1/cases/${ids.line.caseId}`)).json()).case.version).toBe(before.version);

    const viewer = await signedInPage('executive@kestrelbay.example');
    expect((await upload('cash-flows.xlsx', withFormula, viewer)).status()).toBe(403);
    expect((await viewer.page.request.get(`/api/v1/cases/${ids.line.caseId}/export.xlsx`)).status()).toBe(200);
    const outsider = await signedInPage('owner@harrowfen.example');
    expect((await outsider.page.request.get(`/api/v1/cases/${ids.line.caseId}/export.xlsx`)).status()).toBe(404);
    expect((await upload('cash-flows.xlsx', withFormula, outsider)).status()).toBe(404);
    for (const c of [analyst, viewer, outsider]) await c.context.close();
  });
});
