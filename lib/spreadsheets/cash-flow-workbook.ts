/**
 * Leeway's cash-flow workbook: the template people fill in, and the reader that brings it back.
 *
 * Layout (Leeway's own): sheet "Cash flows", row 1 the labels, then one row a year — column A
 * the year (0 is today), B revenue, C operating cost, D tax, E working-capital increase, F capex;
 * the WACC in cell I2 (as a percentage or a fraction). A sheet "How to fill this in" explains it.
 * Every problem is reported with its sheet and cell, and all of them at once; a cell holding a
 * formula is refused (values only), so nothing that would compute differently elsewhere gets in.
 */
import ExcelJS from 'exceljs';
import { readNumberText } from '../number-text';
import { cashFlowScheduleSchema, type CashFlowYear } from '../cash-flows';

export const CASH_FLOW_SHEET = 'Cash flows';
const INSTRUCTIONS_SHEET = 'How to fill this in';

export const cashFlowColumns: { key: Exclude<keyof CashFlowYear, 'year'>; label: string; column: string }[] = [
  { key: 'revenue', label: 'Revenue', column: 'B' },
  { key: 'operatingCost', label: 'Operating cost', column: 'C' },
  { key: 'tax', label: 'Tax', column: 'D' },
  { key: 'workingCapital', label: 'Working capital increase', column: 'E' },
  { key: 'capex', label: 'Capex', column: 'F' },
];
const WACC_CELL = 'I2';

export interface CashFlowSheetInput {
  rows: CashFlowYear[];
  wacc: number;
}

/** Adds the "Cash flows" sheet (and its instructions) to a workbook, filled with `input`. */
export function addCashFlowSheets(book: ExcelJS.Workbook, input: CashFlowSheetInput) {
  const sheet = book.addWorksheet(CASH_FLOW_SHEET);
  sheet.columns = [{ width: 8 }, ...cashFlowColumns.map(() => ({ width: 22 })), { width: 4 }, { width: 10 }, { width: 12 }];
  sheet.getRow(1).values = ['Year', ...cashFlowColumns.map((c) => c.label)];
  sheet.getRow(1).font = { bold: true };
  sheet.getCell('H2').value = 'WACC';
  sheet.getCell('H2').font = { bold: true };
  sheet.getCell(WACC_CELL).value = input.wacc;
  sheet.getCell(WACC_CELL).numFmt = '0.00%';
  input.rows.forEach((r, k) => {
    sheet.getCell(`A${k + 2}`).value = r.year;
    for (const c of cashFlowColumns) sheet.getCell(`${c.column}${k + 2}`).value = r[c.key];
  });
  const help = book.addWorksheet(INSTRUCTIONS_SHEET);
  help.getColumn(1).width = 110;
  [
    'Leeway cash-flow workbook',
    '',
    'Fill in the sheet "Cash flows": one row a year, years in order from 0 (today) without gaps.',
    'Columns: A year, B revenue, C operating cost, D tax, E increase in working capital (negative when released), F capex.',
    'Costs, tax and capex are positive numbers; Leeway subtracts them. Free cash flow = B − C − D − E − F.',
    'Cell I2 holds the WACC (8.5 % or 0.085). Amounts are in the project currency, as in the app.',
    'Type values, not formulas: a cell with a formula is refused on import so the figures cannot change on the way.',
    'Import the workbook from the case (Cash flows → Import from workbook): you see what was read before anything is saved.',
  ].forEach((line, k) => {
    help.getCell(`A${k + 1}`).value = line;
  });
  help.getCell('A1').font = { bold: true, size: 14 };
}

export async function cashFlowTemplate(wacc: number): Promise<Buffer> {
  const book = new ExcelJS.Workbook();
  book.creator = 'Leeway';
  addCashFlowSheets(book, {
    wacc,
    rows: Array.from({ length: 6 }, (_, year) => ({ year, revenue: 0, operatingCost: 0, tax: 0, workingCapital: 0, capex: 0 })),
  });
  return Buffer.from(await book.xlsx.writeBuffer());
}

export type WorkbookRead = { ok: true; input: CashFlowSheetInput } | { ok: false; problems: string[] };

function cellNumber(cell: ExcelJS.Cell, where: string, problems: string[], blankIsZero: boolean): number | null {
  const v = cell.value;
  if (v && typeof v === 'object' && ('formula' in v || 'sharedFormula' in v)) {
    problems.push(`${where}: holds a formula; type the value instead.`);
    return null;
  }
  if (v === null || v === undefined || (typeof v === 'string' && v.trim() === '')) {
    if (blankIsZero) return 0;
    problems.push(`${where}: is empty; expected a number.`);
    return null;
  }
  if (typeof v === 'number' && Number.isFinite(v)) return v;
  if (typeof v === 'string') {
    // Text in a cell is read as a person's typing is, and an ambiguous comma is flagged, never guessed.
    const read = readNumberText(v);
    if (read.ok) return read.value;
    problems.push(`${where}: ${read.message}`);
    return null;
  }
  problems.push(`${where}: expected a number, got ${typeof v === 'object' ? 'a date or rich text' : String(v)}.`);
  return null;
}

/** Reads a filled-in workbook; every problem named by sheet and cell, and nothing returned unless all is well. */
export async function readCashFlowWorkbook(bytes: Uint8Array): Promise<WorkbookRead> {
  const book = new ExcelJS.Workbook();
  try {
    await book.xlsx.load(bytes as never);
  } catch {
    return { ok: false, problems: ['The workbook could not be read; save it again as .xlsx.'] };
  }
  const sheet = book.getWorksheet(CASH_FLOW_SHEET);
  if (!sheet) return { ok: false, problems: [`The workbook has no sheet named "${CASH_FLOW_SHEET}"; start from Leeway's template.`] };
  const problems: string[] = [];
  const where = (cell: string) => `${CASH_FLOW_SHEET}!${cell}`;
  const waccRaw = cellNumber(sheet.getCell(WACC_CELL), where(WACC_CELL), problems, false);
  // 8.5 means 8.5 %; 0.085 is already a fraction.
  const wacc = waccRaw === null ? 0 : Math.abs(waccRaw) >= 1 ? waccRaw / 100 : waccRaw;
  const rows: CashFlowYear[] = [];
  for (let r = 2; r <= Math.max(sheet.rowCount, 2); r++) {
    const yearCell = sheet.getCell(`A${r}`);
    const empty = [yearCell, ...cashFlowColumns.map((c) => sheet.getCell(`${c.column}${r}`))].every(
      (c) => c.value === null || c.value === undefined || c.value === '',
    );
    if (empty) continue;
    const year = cellNumber(yearCell, where(`A${r}`), problems, false);
    if (year !== null && (!Number.isInteger(year) || year < 0)) problems.push(`${where(`A${r}`)}: the year must be a whole number from 0, got ${year}.`);
    const row = { year: year ?? 0 } as CashFlowYear;
    for (const c of cashFlowColumns) row[c.key] = cellNumber(sheet.getCell(`${c.column}${r}`), where(`${c.column}${r}`), problems, true) ?? 0;
    rows.push(row);
  }
  if (rows.length === 0) problems.push(`${where('A2')}: no years found; fill in at least year 0.`);
  if (problems.length > 0) return { ok: false, problems };
  const parsed = cashFlowScheduleSchema.safeParse({ rows, wacc });
  if (!parsed.success)
    return {
      ok: false,
      problems: parsed.error.issues.map((i) => {
        const [first, index] = i.path;
        if (first === 'rows' && typeof index === 'number') return `${where(`A${index + 2}`)}: ${i.message}`;
        if (first === 'wacc') return `${where(WACC_CELL)}: ${i.message}`;
        return i.message;
      }),
    };
  return { ok: true, input: { rows: parsed.data.rows, wacc: parsed.data.wacc } };
}
