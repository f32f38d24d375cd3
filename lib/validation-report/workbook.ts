/**
 * The validation report as a workbook, one sheet per section of the PDF (./document.tsx), with
 * figures as numbers a reviewer can recompute from: summary and cautions, inputs, convergence,
 * the premium's split, sensitivities, the cross-check and the engine's published-value checks.
 */
import ExcelJS from 'exceljs';
import { VALUATION_CAUTION } from '@/lib/caution';
import { assumptionRows } from '../board-pack/pdf-parts';
import { formatDateTime } from '../format';
import { describeRights } from '../option-words';
import { table } from '../spreadsheets/sheet-table';
import { volatilityMethodLabels } from '../volatility/method-words';
import type { ValidationReportData } from './data';

export async function validationWorkbook(data: ValidationReportData): Promise<Buffer> {
  const { result, crossCheck, references, inputs } = data;
  const book = new ExcelJS.Workbook();
  book.creator = 'Leeway';
  table(
    book.addWorksheet('Summary'),
    ['Item', 'Value'],
    [
      ['Organisation', data.organisation],
      ['Project', data.project.name],
      ['Case', data.caseName],
      ['Version', data.caseVersion],
      ['Currency', data.project.currency],
      ['Valued', formatDateTime(data.generatedAt)],
      ['Engine', result.engineVersion],
      ['Static NPV', result.staticNpv],
      ['Option premium', result.optionPremium],
      ['Expanded NPV', result.expandedNpv],
      [
        'Cross-check',
        crossCheck ? (crossCheck.result.verdict.agrees ? 'agrees' : `disagrees by ${crossCheck.result.verdict.gap}`) : 'not run for this version',
      ],
      [
        'Published checks within tolerance',
        references ? `${references.checks.filter((c) => c.passes).length} of ${references.checks.length}` : 'not in this build',
      ],
      ['Input fingerprint (SHA-256)', data.inputHash],
      ['Result hash', data.resultHash],
      ...(data.isDemo ? [['Note', 'Demo organisation: every figure is invented.']] : []),
      ['Caution', VALUATION_CAUTION],
    ],
  );
  const source = inputs.settings.volatilitySource;
  table(
    book.addWorksheet('Inputs'),
    ['Input', 'Value'],
    [
      ...assumptionRows(inputs, data.model, data.project.currency),
      ['Volatility method', source ? volatilityMethodLabels[source.method] : 'Not stated'],
      ...describeRights(inputs.options, data.project.currency).map((r) => [r.id, r.terms]),
    ],
  );
  const convergence = result.convergence;
  table(
    book.addWorksheet('Convergence'),
    ['Steps', 'Expanded NPV'],
    [
      ...(convergence?.points.map((p) => [p.steps, p.expandedNpv]) ?? []),
      ['Extrapolated', convergence?.extrapolated ?? null],
      ['Error estimate', convergence && Number.isFinite(convergence.errorEstimate) ? convergence.errorEstimate : null],
      ['Band, low', convergence?.band?.low ?? null],
      ['Band, high', convergence?.band?.high ?? null],
    ],
  );
  table(
    book.addWorksheet('Premium split'),
    ['Figure', 'Value'],
    [
      ['Static NPV', result.staticNpv],
      ['Option premium', result.optionPremium],
      ['A better plan (volatility → 0)', result.premiumSplit?.betterPlan ?? null],
      ['Flexibility under uncertainty', result.premiumSplit?.uncertainty ?? null],
      ['Expanded NPV', result.expandedNpv],
      ...result.warnings.map((w) => ['Warning', w]),
    ],
  );
  table(
    book.addWorksheet('Sensitivities'),
    ['Input', 'Base', 'Low input', 'Expanded NPV (low)', 'High input', 'Expanded NPV (high)'],
    (result.sensitivities ?? []).map((s) => [s.label, s.base, s.low.input, s.low.expandedNpv, s.high.input, s.high.expandedNpv]),
  );
  const cross = book.addWorksheet('Cross-check');
  if (crossCheck) {
    const { lattice, monteCarlo, verdict } = crossCheck.result;
    table(
      cross,
      ['Figure', 'Value', 'Standard error'],
      [
        ['Paths in each pass', monteCarlo.paths, null],
        ['Seed', monteCarlo.seed, null],
        ['Decision dates', monteCarlo.dates, null],
        ['Lattice expanded NPV', lattice.expandedNpv, null],
        ['Lattice band, low', lattice.band?.low ?? null, null],
        ['Lattice band, high', lattice.band?.high ?? null, null],
        ['Monte Carlo, fresh paths (biased down)', monteCarlo.lowBiased.expandedNpv, monteCarlo.lowBiased.standardError],
        ['Monte Carlo, fitting paths (biased up)', monteCarlo.highBiased.expandedNpv, monteCarlo.highBiased.standardError],
        ['Agrees', verdict.agrees ? 'yes' : 'no', null],
        ['Gap', verdict.gap, null],
        ...verdict.rights.map((r) => [`Used: ${r.id} (lattice ${r.lattice})`, r.monteCarlo, r.standardError]),
      ],
    );
  } else table(cross, ['Cross-check'], [[`No cross-check of version ${data.caseVersion} has finished.`]]);
  table(
    book.addWorksheet('Published checks'),
    ['Source', 'Case', 'Published', 'Engine', 'Tolerance', 'Within'],
    (references?.checks ?? []).map((c) => [c.source, c.what, c.published, c.engine, c.tolerance, c.passes ? 'yes' : 'no']),
  );
  return Buffer.from(await book.xlsx.writeBuffer());
}
