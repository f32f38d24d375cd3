/**
 * One case, one decision rule: the text the results page shows for a stored run (read back as
 * PostgreSQL's jsonb returns it), the workbook's Results sheet and the board pack print the same
 * words for every right, with the decisions a first use leads to (a stage right's later
 * payments, a mothball right's restart). Before, the workbook showed the grid's first exercise
 * (year 0.8) and the pack a rule from "year 0.0". The demo's cases (invented figures).
 */
import { describe, expect, it } from 'vitest';
import { demoBoardPackData } from '@/demo/board-pack-data';
import { demoPortfolio } from '@/demo/portfolio';
import { valueProject, type ValuationResult } from '@/lattice';
import { caseToModel } from '@/lib/case-model';
import { decisionRule, ruleInFull, ruleLines } from '@/lib/decision-rules';
import { renderBoardPack } from '@/lib/board-pack/render';
import type { CaseInput } from '@/lib/validations/case';
import { readCaseWorkbook } from './support/case-workbook';
import { pdfText } from './support/demo-pack';

/** The rules of a stored run, and the same rules as the workbook and the board pack print them. */
async function rulesEverywhere(inputs: CaseInput) {
  const stored = JSON.parse(JSON.stringify(valueProject(caseToModel(inputs).model, { grid: { steps: 4 } }))) as ValuationResult;
  const rules = stored.rights.map((s) => decisionRule(s, 'EUR'));
  const book = await readCaseWorkbook(inputs, stored, 'approved');
  const sheet = book.getWorksheet('Results')!;
  const fromWorkbook = stored.rights.map((_, k) => String(sheet.getRow(k + 2).getCell(6).value));
  const pack = pdfText(await renderBoardPack(demoBoardPackData('A4', { inputs, result: stored })));
  return { rules, fromWorkbook, pack };
}

const demoCase = (name: string) => demoPortfolio.find((p) => p.name === name)!.cases[0]!;

describe('the decision rule of a case', () => {
  it('reads the same from the stored run, the workbook and the board pack', async () => {
    const { rules, fromWorkbook, pack } = await rulesEverywhere(demoCase('Phased bio-resin plant'));
    expect(rules.length).toBe(2);
    expect(fromWorkbook).toEqual(rules.map((r) => r.text));
    for (const rule of rules) expect(pack).toContain(rule.text);
  }, 60_000);

  it('carries the decisions a first use leads to into all three: later stage payments, a restart', async () => {
    for (const name of ['Staged pilot line', 'Older extrusion line']) {
      const { rules, fromWorkbook, pack } = await rulesEverywhere(demoCase(name));
      const followed = rules.filter((r) => r.followUps.length > 0);
      expect(followed.length).toBe(1);
      expect(fromWorkbook).toEqual(rules.map(ruleInFull));
      for (const line of rules.flatMap(ruleLines)) expect(pack).toContain(line);
    }
  }, 120_000);
});
