/**
 * Uploads are judged by content as well as name, within a size limit, and an XLSX is refused
 * when its zip directory declares more than the unpack limit (the archive-bomb guard); series
 * files report every problem with its line or cell (common practice, no source).
 */
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { declaredUnpackedSize, inspectUpload, MAX_UNPACKED_BYTES, MAX_UPLOAD_BYTES } from '@/lib/uploads/inspect';
import { readCsvSeries, readXlsxSeries } from '@/lib/volatility/read-series';

async function workbook(rows: unknown[][], sheetName = 'Prices'): Promise<Uint8Array> {
  const book = new ExcelJS.Workbook();
  const sheet = book.addWorksheet(sheetName);
  for (const r of rows) sheet.addRow(r);
  return new Uint8Array(await book.xlsx.writeBuffer());
}

const refusal = (f: () => unknown) => {
  try {
    f();
    return 'accepted';
  } catch (error) {
    return (error as Error).message;
  }
};
const text = (s: string) => new TextEncoder().encode(s);

describe('upload inspection', () => {
  it('accepts what the content and the name agree on', async () => {
    expect(inspectUpload('prices.csv', text('date,value\n2024-01-02,10\n'), ['csv', 'xlsx'])).toBe('csv');
    expect(inspectUpload('prices.xlsx', await workbook([['date', 'value']]), ['csv', 'xlsx'])).toBe('xlsx');
  });

  it('refuses a mismatched, unlisted, empty or oversized file', async () => {
    const xlsx = await workbook([['a']]);
    expect(refusal(() => inspectUpload('prices.csv', xlsx, ['csv', 'xlsx']))).toBe('“prices.csv” is named CSV but its content is XLSX.');
    expect(refusal(() => inspectUpload('photo.png', text('hello'), ['csv', 'xlsx']))).toBe('“photo.png” is not one of the accepted types (CSV, XLSX).');
    expect(refusal(() => inspectUpload('prices.csv', new Uint8Array(), ['csv']))).toBe('The file is empty.');
    expect(refusal(() => inspectUpload('prices.csv', new Uint8Array(MAX_UPLOAD_BYTES + 1).fill(65), ['csv']))).toBe('The file is over the 10 MB limit.');
  });

  it('reads the unpacked size from the zip directory and refuses a workbook declaring too much', async () => {
    const bytes = await workbook([['date', 'value'], ...Array.from({ length: 50 }, (_, k) => [`2024-01-${String((k % 28) + 1).padStart(2, '0')}`, k])]);
    expect(declaredUnpackedSize(bytes)).toBeGreaterThan(bytes.length);
    // Patch the first central-directory entry to declare 2 GB uncompressed.
    const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    let at = bytes.length - 22;
    while (view.getUint32(at, true) !== 0x06054b50) at--;
    view.setUint32(view.getUint32(at + 16, true) + 24, 2 ** 31, true);
    expect(declaredUnpackedSize(bytes)).toBeGreaterThan(MAX_UNPACKED_BYTES);
    expect(refusal(() => inspectUpload('bomb.xlsx', bytes, ['xlsx']))).toBe('The workbook would unpack to more than 100 MB; Leeway does not open it.');
  });
});

describe('reading a series', () => {
  it('reads CSV with or without a header, with commas in numbers', () => {
    expect(readCsvSeries('date,value\n2024-01-02,"1,010.5"\n2024-01-03,1012\n')).toEqual([
      { date: '2024-01-02', value: 1010.5, place: 'Line 2' },
      { date: '2024-01-03', value: 1012, place: 'Line 3' },
    ]);
    expect(readCsvSeries('2024-01-02;10\n2024-01-03;11\n')).toHaveLength(2);
  });

  it('names the line of a CSV problem', () => {
    expect(refusal(() => readCsvSeries('date,value\n2024-01-02,10\n2024-01-03,n/a\n'))).toBe('Line 3: expected a number, got “n/a”.');
    expect(refusal(() => readCsvSeries('date,value\n02/01/2024,10\n'))).toBe('Line 2: expected a date written YYYY-MM-DD, got “02/01/2024”.');
  });

  it('reads real dates from a workbook and names the cell of a problem', async () => {
    const good = await workbook([
      ['Date', 'Price'],
      [new Date(Date.UTC(2024, 0, 2)), 10],
      [new Date(Date.UTC(2024, 0, 3)), 11],
    ]);
    expect(await readXlsxSeries(good)).toEqual([
      { date: '2024-01-02', value: 10, place: 'Prices!B2' },
      { date: '2024-01-03', value: 11, place: 'Prices!B3' },
    ]);
    const bad = await workbook([
      ['Date', 'Price'],
      [new Date(Date.UTC(2024, 0, 2)), 'n/a'],
    ]);
    await expect(readXlsxSeries(bad)).rejects.toThrow('Prices!B2: expected a number, got “n/a”.');
  });
});
