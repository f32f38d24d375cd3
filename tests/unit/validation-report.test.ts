/**
 * The validation report (lib/validation-report/) for the demo plant: every section is printed,
 * with the figures of its data (the valuation's expanded NPV and band, the cross-check's verdict,
 * each published check as the build valued it), in both page sizes; the workbook carries the
 * same figures as numbers. The reference results are made here as the build makes them, from the
 * tests' own table (tests/lattice/reference/published-checks.ts).
 */
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { ENGINE_VERSION, valueProject } from '@/lattice';
import { demoPortfolio } from '@/demo/portfolio';
import { caseToModel } from '@/lib/case-model';
import { runCrossCheck } from '@/lib/cross-check/run';
import { formatMoney } from '@/lib/format';
import type { ValidationReportData } from '@/lib/validation-report/data';
import { renderValidationReport } from '@/lib/validation-report/render';
import { validationWorkbook } from '@/lib/validation-report/workbook';
import { publishedChecks } from '../lattice/reference/published-checks';
import { pdfText } from '../support/pdf-text';

const plant = demoPortfolio.find((p) => p.name === 'Phased bio-resin plant')!.cases[0]!;
const { model } = caseToModel(plant);
const result = valueProject(model);
const crossCheck = runCrossCheck(model, { paths: 4_000, seed: 9 });
const checks = publishedChecks.map((c) => {
  const engine = c.read(valueProject(c.model, { extras: false }));
  return { source: c.source, what: c.what, published: c.published, engine, tolerance: c.tolerance, passes: Math.abs(engine - c.published) <= c.tolerance };
});

const data = (pageSize: 'A4' | 'LETTER', withCrossCheck = true): ValidationReportData => ({
  pageSize,
  organisation: 'Kestrel Bay Materials',
  isDemo: true,
  generatedAt: '2026-12-03T09:00:00.000Z',
  project: { name: 'Phased bio-resin plant', currency: 'EUR' },
  caseName: plant.name,
  caseVersion: 3,
  inputs: plant,
  model,
  result,
  inputHash: 'a'.repeat(64),
  resultHash: 'b'.repeat(64),
  crossCheck: withCrossCheck ? { paths: 4_000, seed: 9, engineVersion: ENGINE_VERSION, at: '2026-12-03T08:00:00.000Z', result: crossCheck } : null,
  references: { engineVersion: ENGINE_VERSION, generatedAt: '2026-12-03T07:00:00.000Z', checks },
});

describe('the validation report', () => {
  it.each(['A4', 'LETTER'] as const)(
    'prints every section with its figures (%s)',
    async (size) => {
      const text = pdfText(await renderValidationReport(data(size)));
      for (const heading of [
        'The model and its conventions',
        'Inputs and their sources',
        'Convergence and the split of the premium',
        'Sensitivities',
        'Independent cross-check',
        "The engine's published-value checks",
      ])
        expect(text).toContain(heading);
      expect(text).toContain(formatMoney(result.expandedNpv, 'EUR', 2));
      expect(text).toContain(formatMoney(result.convergence!.band!.low, 'EUR', 2));
      expect(text).toContain(crossCheck.verdict.agrees ? 'Verdict: the two agree' : 'Verdict: the two disagree');
      expect(text).toContain(`${checks.filter((c) => c.passes).length} of ${checks.length} lie within their tolerance`);
      expect(text).toContain('Hull, Options, Futures, and Other Derivatives, Example 21.1');
      expect(text).toContain('Longstaff & Schwartz (2001)');
      expect(text).toContain('every figure in this report is invented');
      expect(text).toMatch(/Valuations are model-based estimates/);
      expect(text).toContain('constant volatility');
    },
    60_000,
  );

  it('says when the version has no finished cross-check', async () => {
    const text = pdfText(await renderValidationReport(data('A4', false)));
    expect(text).toContain('No cross-check of version 3 has finished');
  }, 60_000);

  it('carries the same figures in its workbook, as numbers', async () => {
    const book = new ExcelJS.Workbook();
    await book.xlsx.load((await validationWorkbook(data('A4'))) as never);
    expect(book.worksheets.map((s) => s.name)).toEqual([
      'Summary',
      'Inputs',
      'Convergence',
      'Premium split',
      'Sensitivities',
      'Cross-check',
      'Published checks',
    ]);
    const summary = book.getWorksheet('Summary')!;
    const row = (sheet: ExcelJS.Worksheet, label: string) => sheet.getRows(1, sheet.rowCount)!.find((r) => r.getCell(1).value === label)!;
    expect(row(summary, 'Expanded NPV').getCell(2).value).toBe(result.expandedNpv);
    const cross = book.getWorksheet('Cross-check')!;
    expect(row(cross, 'Monte Carlo, fresh paths (biased down)').getCell(2).value).toBe(crossCheck.monteCarlo.lowBiased.expandedNpv);
    const published = book.getWorksheet('Published checks')!;
    expect(published.rowCount).toBe(checks.length + 1);
    expect(published.getRow(2).getCell(4).value).toBe(checks[0]!.engine);
  }, 60_000);
});
