/** A header row in bold and rows of cells, text neutralised against formulas (lib/spreadsheet-safe.ts). */
import type ExcelJS from 'exceljs';
import { safeCell } from '../spreadsheet-safe';

export function table(sheet: ExcelJS.Worksheet, header: string[], rows: (string | number | null)[][]) {
  sheet.addRow(header).font = { bold: true };
  for (const r of rows) sheet.addRow(r.map(safeCell));
  sheet.columns.forEach((c) => (c.width = 22));
}
