// GET /api/v1/compare.xlsx?cases=a,b[,c,d] – the comparison as a workbook, with the cautions
import ExcelJS from 'exceljs';
import { VALUATION_CAUTION } from '@/lib/caution';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { compareCases } from '@/lib/comparison';
import { safeCell } from '@/lib/spreadsheet-safe';
import { compareQuerySchema } from '@/lib/validations/compare';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withAuth(async ({ member, request }) => {
  const comparison = await compareCases(member.orgId, compareQuerySchema.parse(request.nextUrl.searchParams.get('cases') ?? undefined));
  const book = new ExcelJS.Workbook();
  book.creator = 'Leeway';
  const sheet = book.addWorksheet('Comparison');
  sheet.columns = [{ width: 36 }, ...comparison.cases.map(() => ({ width: 30 }))];
  sheet.addRow(['', ...comparison.cases.map((c) => safeCell(c.projectName))]).font = { bold: true };
  sheet.addRow(['', ...comparison.cases.map((c) => safeCell(c.caseName))]).font = { bold: true };
  let group = '';
  for (const row of comparison.rows) {
    if (row.group !== group) {
      group = row.group;
      sheet.addRow([group]).font = { bold: true, color: { argb: 'FF23727A' } };
    }
    // Numbers go in as numbers (the reader can compute with them); text is neutralised.
    const cells = row.values.map((v, k) => (row.numbers && row.numbers[k] !== null && row.numbers[k] !== undefined ? row.numbers[k] : safeCell(v)));
    const added = sheet.addRow([safeCell(row.label), ...cells]);
    if (row.differs) added.getCell(1).note = 'Differs between the cases';
  }
  const notes = book.addWorksheet('Cautions');
  notes.getColumn(1).width = 120;
  notes.addRow([VALUATION_CAUTION]).alignment = { wrapText: true };
  notes.addRow(['Figures come from each case’s latest stored valuation run; money is in each project’s currency.']);
  const buffer = Buffer.from(await book.xlsx.writeBuffer());
  return new Response(new Uint8Array(buffer), {
    headers: {
      'content-type': 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
      'content-disposition': 'attachment; filename="Leeway comparison.xlsx"',
    },
  });
}, operations.exportComparison);
