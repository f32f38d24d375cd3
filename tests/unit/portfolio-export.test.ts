/**
 * The portfolio export (issue 14): one row per project, the approved version's figures as
 * numbers, blanks where nothing was approved, text that a spreadsheet would run as a formula
 * neutralised (OWASP, "CSV Injection"), and the same rows in CSV and XLSX.
 */
import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import type { ProjectSummary } from '@/db/queries/summaries';
import { PORTFOLIO_COLUMNS, portfolioCsv, portfolioWorkbook } from '@/lib/spreadsheets/portfolio-export';

// Invented projects and figures.
const base = { description: '', currency: 'EUR', ownerName: null, caseCount: 1, updatedAt: new Date('2026-11-01T00:00:00Z'), latest: null, inReview: 0 };
const projects: ProjectSummary[] = [
  {
    ...base,
    id: 'p1',
    name: '=HYPERLINK("http://x.example","click")',
    status: 'active',
    inReview: 1,
    approved: {
      snapshotId: 's1',
      caseId: 'c1',
      caseName: '@Base case',
      caseVersion: 3,
      staticNpv: -12.345678,
      optionPremium: 20.5,
      betterPlan: 4.25,
      flexibility: 16.25,
      expandedNpv: 8.154322,
      decidedAt: new Date('2026-10-15T09:30:00Z'),
    },
  },
  { ...base, id: 'p2', name: 'Quiet project', status: 'archived', approved: null },
];

describe('portfolio export', () => {
  it('writes one CSV row per project with the approved figures as numbers and neutralised text', () => {
    const parsed = Papa.parse<Record<string, string>>(portfolioCsv(projects), { header: true, skipEmptyLines: true });
    expect(parsed.meta.fields).toEqual([...PORTFOLIO_COLUMNS]);
    expect(parsed.data).toHaveLength(2);
    const [approved, none] = parsed.data;
    expect(approved).toMatchObject({
      Project: `'=HYPERLINK("http://x.example","click")`,
      Approval: 'approved',
      'Approved case': "'@Base case",
      'Approved version': '3',
      'Approved on': '2026-10-15',
      'Static NPV': '-12.3457',
      'Option premium': '20.5',
      'Premium: better plan': '4.25',
      'Premium: flexibility': '16.25',
      'Expanded NPV': '8.1543',
      'Cases in review': '1',
    });
    // The parts add up to the premium, and static + premium to expanded, as exported.
    expect(Number(approved!['Premium: better plan']) + Number(approved!['Premium: flexibility'])).toBeCloseTo(Number(approved!['Option premium']), 4);
    expect(Number(approved!['Static NPV']) + Number(approved!['Option premium'])).toBeCloseTo(Number(approved!['Expanded NPV']), 3);
    expect(none).toMatchObject({ Project: 'Quiet project', 'Project status': 'archived', Approval: 'not approved', 'Static NPV': '', 'Expanded NPV': '' });
  });

  it('writes the same rows to a workbook, numbers as numbers, with a cautions sheet', async () => {
    const book = new ExcelJS.Workbook();
    await book.xlsx.load((await portfolioWorkbook(projects, 'Invented Org', 'A caution.')) as unknown as ArrayBuffer);
    const sheet = book.getWorksheet('Portfolio')!;
    expect((sheet.getRow(1).values as unknown[]).slice(1)).toEqual([...PORTFOLIO_COLUMNS]);
    const row = (sheet.getRow(2).values as unknown[]).slice(1);
    expect(row[0]).toBe(`'=HYPERLINK("http://x.example","click")`);
    expect(row[PORTFOLIO_COLUMNS.indexOf('Static NPV')]).toBe(-12.3457);
    expect(typeof row[PORTFOLIO_COLUMNS.indexOf('Expanded NPV')]).toBe('number');
    expect(sheet.rowCount).toBe(3);
    expect(book.getWorksheet('Cautions')!.getCell('A1').value).toBe('A caution.');
  });
});
