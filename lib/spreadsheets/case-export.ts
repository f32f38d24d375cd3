/**
 * A case as a workbook: summary with the headline figures and the cautions, the cash flows in
 * the import layout (so an export can be imported again as it is), the settings, the options,
 * each right's value, and the first steps of the lattice with values and decisions. Text that a
 * spreadsheet would read as a formula is neutralised (lib/spreadsheet-safe.ts).
 */
import ExcelJS from 'exceljs';
import { VALUATION_CAUTION } from '@/lib/caution';
import type { ValuationResult } from '@/lattice';
import { decisionRule, ruleInFull } from '../decision-rules';
import { formatDateTime } from '../format';
import { optionKindLabels, rightKindLabel } from '../option-form';
import { describeRights } from '../option-words';
import type { CaseInput } from '../validations/case';
import { addCashFlowSheets } from './cash-flow-workbook';
import { table } from './sheet-table';
import { treeLabels } from '../tree-words';
import { volatilitySourceText } from '../volatility/method-words';
import type { CaseStatus } from '@/db/types';
import { statusLabels } from '../review/transitions';
import { timingLabels } from '../timing-words';

export interface CaseExport {
  projectName: string;
  currency: string;
  caseName: string;
  version: number;
  status: CaseStatus;
  inputs: CaseInput;
  result: ValuationResult;
  valuedAt: string;
}

export async function caseWorkbook(c: CaseExport): Promise<Buffer> {
  const book = new ExcelJS.Workbook();
  book.creator = 'Leeway';
  const summary = book.addWorksheet('Summary');
  table(
    summary,
    ['Item', 'Value'],
    [
      ['Project', c.projectName],
      ['Case', c.caseName],
      ['Version', c.version],
      ['Status', statusLabels[c.status]],
      ['Currency', c.currency],
      ['Valued', formatDateTime(c.valuedAt)],
      ['Engine', c.result.engineVersion],
      ['Static NPV', c.result.staticNpv],
      ['Option premium', c.result.optionPremium],
      ['Expanded NPV', c.result.expandedNpv],
      ['Caution', VALUATION_CAUTION],
    ],
  );
  summary.getColumn(2).width = 90;

  addCashFlowSheets(book, { rows: c.inputs.cashFlows.rows, wacc: c.inputs.cashFlows.wacc });

  const settings = book.addWorksheet('Settings');
  const s = c.inputs.settings;
  table(
    settings,
    ['Setting', 'Value'],
    [
      ['Volatility', s.volatility],
      ['Volatility source', volatilitySourceText(s.volatilitySource)],
      ['Risk-free rate (continuous)', s.riskFreeRate],
      ['Lattice steps', s.steps],
      ['Tree', treeLabels[s.tree ?? 'crr']],
      ['Cash-flow timing', timingLabels[c.inputs.cashFlows.timing ?? 'end-of-year']],
    ],
  );

  const rights = book.addWorksheet('Rights');
  table(
    rights,
    ['Right', 'Kind', 'Terms'],
    describeRights(c.inputs.options, c.currency).map((r) => [r.id, optionKindLabels[r.option.kind], r.terms]),
  );
  rights.getColumn(3).width = 100;

  const results = book.addWorksheet('Results');
  table(
    results,
    ['Right', 'Kind', 'Stand-alone value', 'Incremental value', 'Probability ever exercised', 'Decision rule'],
    c.result.rights.map((r) => [r.id, rightKindLabel(r.kind), r.standalone, r.incremental, r.exerciseProbability, ruleInFull(decisionRule(r, c.currency))]),
  );
  results.getColumn(6).width = 100;

  const lattice = book.addWorksheet('Lattice');
  if (c.result.grid) {
    // The engine names the start mode; results stored before it did are found by their root value.
    const start = c.result.startMode ?? Object.keys(c.result.modes).find((m) => c.result.modes[m] === c.result.value) ?? Object.keys(c.result.modes)[0]!;
    table(
      lattice,
      ['Step', 'Node (up-moves)', 'Year', 'Project value V', `Value with flexibility W (${start})`, 'Decision'],
      c.result.grid.steps.flatMap((step, i) =>
        step.underlying.map((v, j) => [i, j, Number(step.t.toFixed(10)), v, step.modes[start]?.value[j] ?? null, step.modes[start]?.decision[j] ?? 'continue']),
      ),
    );
  }

  const cautions = book.addWorksheet('Cautions');
  cautions.getColumn(1).width = 120;
  cautions.addRow([VALUATION_CAUTION]).alignment = { wrapText: true };
  return Buffer.from(await book.xlsx.writeBuffer());
}
