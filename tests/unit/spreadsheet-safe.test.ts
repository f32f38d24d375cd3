/** Formula injection on export (OWASP, "CSV Injection"): text that a spreadsheet would evaluate is neutralised. */
import { describe, expect, it } from 'vitest';
import { safeCell } from '@/lib/spreadsheet-safe';

describe('spreadsheet-safe cells', () => {
  it('prefixes text that starts like a formula, and leaves other text and numbers alone', () => {
    expect(['=HYPERLINK("x")', '+1', '-2+3', '@SUM(A1)', '\t=1', '\r=1'].map(safeCell)).toEqual([
      '\'=HYPERLINK("x")',
      "'+1",
      "'-2+3",
      "'@SUM(A1)",
      "'\t=1",
      "'\r=1",
    ]);
    expect(safeCell('Phase 2 = expansion')).toBe('Phase 2 = expansion');
    expect(safeCell(-31)).toBe(-31);
    expect(safeCell(null)).toBeNull();
  });
});
