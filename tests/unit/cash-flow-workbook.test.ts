/**
 * The cash-flow workbook: the template reads back as written; a case's export imports again
 * with identical numbers (the round trip); every problem is named by sheet and cell, all at
 * once, and a formula is refused (common practice, no source).
 */
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { valueProject } from '@/lattice';
import { demoPortfolio } from '@/demo/portfolio';
import { caseToModel } from '@/lib/case-model';
import { caseWorkbook } from '@/lib/spreadsheets/case-export';
import { CASH_FLOW_SHEET, cashFlowTemplate, readCashFlowWorkbook } from '@/lib/spreadsheets/cash-flow-workbook';

async function edit(bytes: Buffer, change: (sheet: ExcelJS.Worksheet) => void): Promise<Uint8Array> {
  const book = new ExcelJS.Workbook();
  await book.xlsx.load(bytes as never);
  change(book.getWorksheet(CASH_FLOW_SHEET)!);
  return new Uint8Array(await book.xlsx.writeBuffer());
}

describe('cash-flow workbook', () => {
  it('reads the blank template back as six years of zeros at its WACC', async () => {
    const read = await readCashFlowWorkbook(new Uint8Array(await cashFlowTemplate(0.085)));
    expect(read).toEqual({
      ok: true,
      input: { wacc: 0.085, rows: [0, 1, 2, 3, 4, 5].map((year) => ({ year, revenue: 0, operatingCost: 0, tax: 0, workingCapital: 0, capex: 0 })) },
    });
  });

  it("imports a case's export with identical numbers", async () => {
    const inputs = demoPortfolio[0]!.cases[0]!;
    const { model } = caseToModel(inputs);
    const bytes = await caseWorkbook({
      projectName: 'Phased bio-resin plant',
      currency: 'EUR',
      caseName: inputs.name,
      version: 1,
      status: 'draft',
      inputs,
      result: valueProject(model, { grid: { steps: 3 } }),
      valuedAt: '2026-12-01T00:00:00.000Z',
    });
    const read = await readCashFlowWorkbook(new Uint8Array(bytes));
    expect(read).toEqual({ ok: true, input: { rows: inputs.cashFlows.rows, wacc: inputs.cashFlows.wacc } });
  });

  it('names every problem by sheet and cell, formulas included, and returns nothing else', async () => {
    const bytes = await edit(await cashFlowTemplate(0.08), (sheet) => {
      sheet.getCell('B3').value = 'n/a';
      // Text with a comma that may be a decimal comma is flagged, never read as 235.
      sheet.getCell('B4').value = '23,5';
      sheet.getCell('C4').value = { formula: 'B4*0.6', result: 0 } as ExcelJS.CellFormulaValue;
      sheet.getCell('A5').value = 2.5;
      sheet.getCell('I2').value = null;
    });
    const read = await readCashFlowWorkbook(bytes);
    expect(read).toEqual({
      ok: false,
      problems: [
        'Cash flows!I2: is empty; expected a number.',
        'Cash flows!B3: “n/a” is not a number.',
        'Cash flows!B4: “23,5”: write decimals with a point (23.5).',
        'Cash flows!C4: holds a formula; type the value instead.',
        'Cash flows!A5: the year must be a whole number from 0, got 2.5.',
      ],
    });
  });

  it('refuses years out of order with the cell, a workbook without the sheet, and a file that is not a workbook', async () => {
    const shuffled = await edit(await cashFlowTemplate(0.08), (sheet) => {
      sheet.getCell('A4').value = 7;
    });
    expect(await readCashFlowWorkbook(shuffled)).toEqual({
      ok: false,
      problems: ['Cash flows!A4: Years must follow one another: expected 2, got 7.', 'Cash flows!A5: Years must follow one another: expected 8, got 3.'],
    });
    const other = new ExcelJS.Workbook();
    other.addWorksheet('Sheet1');
    expect(await readCashFlowWorkbook(new Uint8Array(await other.xlsx.writeBuffer()))).toEqual({
      ok: false,
      problems: ['The workbook has no sheet named "Cash flows"; start from Leeway\'s template.'],
    });
    expect(await readCashFlowWorkbook(new TextEncoder().encode('not a zip'))).toEqual({
      ok: false,
      problems: ['The workbook could not be read; save it again as .xlsx.'],
    });
  });
});
