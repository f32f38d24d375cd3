/**
 * Reads a history of dated values from an uploaded CSV or XLSX: the first column holds dates
 * (YYYY-MM-DD, or real dates in a workbook), the second the values; a first row of labels is
 * skipped. Every problem names its place (`Line 7` in a CSV, `History!B7` in a workbook).
 */
import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { numberOrNull } from '../number-text';
import { HistoryError, MAX_OBSERVATIONS, type HistoryPoint } from './history';

const isoDate = /^\d{4}-\d{2}-\d{2}$/;

/** A dated value with where it was read (`Line 7`, `History!B7`), so later checks can name it too. */
export type PlacedPoint = HistoryPoint & { place: string };

function toPoints(rows: { place: string; date: unknown; value: unknown }[]): PlacedPoint[] {
  const points: PlacedPoint[] = [];
  rows.forEach((row, k) => {
    const dateText = row.date instanceof Date ? row.date.toISOString().slice(0, 10) : String(row.date ?? '').trim();
    const value = typeof row.value === 'number' ? row.value : numberOrNull(String(row.value ?? ''));
    // A first row of labels (neither a date nor a number) is a header.
    if (k === 0 && !isoDate.test(dateText) && value === null) return;
    if (dateText === '' && (row.value === null || row.value === undefined || String(row.value).trim() === '')) return;
    if (!isoDate.test(dateText)) throw new HistoryError(`${row.place}: expected a date written YYYY-MM-DD, got “${dateText}”.`);
    if (value === null || !Number.isFinite(value)) throw new HistoryError(`${row.place}: expected a number, got “${String(row.value ?? '')}”.`);
    points.push({ date: dateText, value, place: row.place });
  });
  if (points.length > MAX_OBSERVATIONS) throw new HistoryError(`At most ${MAX_OBSERVATIONS.toLocaleString('en-GB')} values.`);
  return points;
}

export function readCsvSeries(text: string): PlacedPoint[] {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: true, delimiter: '' });
  const bad = parsed.errors.find((e) => e.type !== 'Delimiter');
  if (bad) throw new HistoryError(`Line ${(bad.row ?? 0) + 1}: ${bad.message}.`);
  return toPoints(parsed.data.map((cells, k) => ({ place: `Line ${k + 1}`, date: cells[0], value: cells[1] })));
}

export async function readXlsxSeries(bytes: Uint8Array): Promise<PlacedPoint[]> {
  const book = new ExcelJS.Workbook();
  try {
    await book.xlsx.load(bytes as never);
  } catch {
    throw new HistoryError('The workbook could not be read; save it again as .xlsx.');
  }
  const sheet = book.worksheets[0];
  if (!sheet) throw new HistoryError('The workbook has no sheet.');
  const rows: { place: string; date: unknown; value: unknown }[] = [];
  sheet.eachRow({ includeEmpty: false }, (row, number) => {
    const cell = (c: number) => {
      const v = row.getCell(c).value;
      // A formula cell holds its last computed result; use that.
      return v && typeof v === 'object' && 'result' in v ? (v as { result: unknown }).result : v;
    };
    rows.push({ place: `${sheet.name}!B${number}`, date: cell(1), value: cell(2) });
  });
  return toPoints(rows);
}
