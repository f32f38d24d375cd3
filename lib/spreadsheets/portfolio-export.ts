/**
 * The portfolio as data for BI tools and reports: one row per project with the figures of the
 * version its committee last approved (blank when none was). The same rows go to CSV and XLSX;
 * text is neutralised against formula injection, figures stay numbers.
 */
import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import type { ProjectSummary } from '@/db/queries/summaries';
import { safeCell } from '../spreadsheet-safe';

export const PORTFOLIO_COLUMNS = [
  'Project',
  'Project status',
  'Currency',
  'Approval',
  'Approved case',
  'Approved version',
  'Approved on',
  'Static NPV',
  'Option premium',
  'Premium: better plan',
  'Premium: flexibility',
  'Expanded NPV',
  'Cases in review',
] as const;

type Cell = string | number | null;

/** Figures to 4 decimals: the engine's last digits are float noise, not information. */
const figure = (value: number | null | undefined): number | null => (value === null || value === undefined ? null : Math.round(value * 1e4) / 1e4);

export function portfolioRows(projects: ProjectSummary[]): Cell[][] {
  return projects.map((p) => {
    const a = p.approved;
    return [
      safeCell(p.name),
      p.status,
      p.currency,
      a ? 'approved' : 'not approved',
      a ? safeCell(a.caseName) : null,
      a?.caseVersion ?? null,
      a ? a.decidedAt.toISOString().slice(0, 10) : null,
      figure(a?.staticNpv),
      figure(a?.optionPremium),
      figure(a?.betterPlan),
      figure(a?.flexibility),
      figure(a?.expandedNpv),
      p.inReview,
    ];
  });
}

export function portfolioCsv(projects: ProjectSummary[]): string {
  return Papa.unparse({ fields: [...PORTFOLIO_COLUMNS], data: portfolioRows(projects).map((row) => row.map((c) => c ?? '')) }, { newline: '\r\n' });
}

export async function portfolioWorkbook(projects: ProjectSummary[], orgName: string, caution: string): Promise<Buffer> {
  const book = new ExcelJS.Workbook();
  book.creator = 'Leeway';
  const sheet = book.addWorksheet('Portfolio');
  sheet.columns = PORTFOLIO_COLUMNS.map((header) => ({ header, width: header === 'Project' || header === 'Approved case' ? 32 : 16 }));
  sheet.getRow(1).font = { bold: true };
  for (const row of portfolioRows(projects)) sheet.addRow(row);
  for (const column of ['Static NPV', 'Option premium', 'Premium: better plan', 'Premium: flexibility', 'Expanded NPV'])
    sheet.getColumn(PORTFOLIO_COLUMNS.indexOf(column as (typeof PORTFOLIO_COLUMNS)[number]) + 1).numFmt = '#,##0.0;-#,##0.0';
  const notes = book.addWorksheet('Cautions');
  notes.getColumn(1).width = 120;
  notes.addRow([caution]).alignment = { wrapText: true };
  notes.addRow([safeCell(`Figures are those of each project's last approved version at ${orgName}, in the project's currency.`)]);
  return Buffer.from(await book.xlsx.writeBuffer());
}
