/** Workbook downloads keep their name as written (RFC 6266 filename*), with an ASCII fallback. */
import { describe, expect, it } from 'vitest';
import { xlsxResponse } from '@/lib/spreadsheets/xlsx-response';

describe('a workbook download', () => {
  it('names the file with its en dash, and falls back to ASCII for old clients', () => {
    const disposition = xlsxResponse(Buffer.from('x'), 'Phased plant – Base case.xlsx').headers.get('content-disposition')!;
    expect(disposition).toBe(`attachment; filename="Phased plant _ Base case.xlsx"; filename*=UTF-8''Phased%20plant%20%E2%80%93%20Base%20case.xlsx`);
    expect(decodeURIComponent(disposition.split("''")[1]!)).toBe('Phased plant – Base case.xlsx');
  });
});
