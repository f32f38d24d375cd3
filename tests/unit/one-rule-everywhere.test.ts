/**
 * One case, one decision rule: the text the results page shows for a stored run (read back as
 * PostgreSQL's jsonb returns it), the workbook's Results sheet and the board pack print the same
 * words for every right. Before, the workbook showed the grid's first exercise (year 0.8) and
 * the pack a rule from "year 0.0". The demo plant (invented figures).
 */
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { valueProject, type ValuationResult } from '@/lattice';
import { decisionRule } from '@/lib/decision-rules';
import { caseWorkbook } from '@/lib/spreadsheets/case-export';
import { demoPlant, pdfText, renderPlantPack } from './support/demo-pack';

describe('the decision rule of a case', () => {
  it('reads the same from the stored run, the workbook and the board pack', async () => {
    const { inputs, model } = demoPlant();
    const stored = JSON.parse(JSON.stringify(valueProject(model, { grid: { steps: 4 } }))) as ValuationResult;
    const rules = stored.rights.map((s) => decisionRule(s, 'EUR').text);
    expect(rules.length).toBe(2);

    const book = new ExcelJS.Workbook();
    await book.xlsx.load(
      (await caseWorkbook({
        projectName: 'Plant',
        currency: 'EUR',
        caseName: inputs.name,
        version: 1,
        status: 'approved',
        inputs,
        result: stored,
        valuedAt: new Date(0).toISOString(),
      })) as never,
    );
    const sheet = book.getWorksheet('Results')!;
    const fromWorkbook = stored.rights.map((_, k) => String(sheet.getRow(k + 2).getCell(6).value));
    expect(fromWorkbook).toEqual(rules);

    const pack = pdfText(await renderPlantPack(model, stored));
    for (const rule of rules) expect(pack).toContain(rule);
  }, 60_000);
});
