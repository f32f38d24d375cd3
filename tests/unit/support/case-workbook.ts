/** A case's export workbook (lib/spreadsheets/case-export.ts) as ExcelJS reads it back. */
import ExcelJS from 'exceljs';
import type { CaseStatus } from '@/db/types';
import type { ValuationResult } from '@/lattice';
import { caseWorkbook } from '@/lib/spreadsheets/case-export';
import type { CaseInput } from '@/lib/validations/case';

export async function readCaseWorkbook(inputs: CaseInput, result: ValuationResult, status: CaseStatus): Promise<ExcelJS.Workbook> {
  const book = new ExcelJS.Workbook();
  const bytes = await caseWorkbook({
    projectName: 'Plant',
    currency: 'EUR',
    caseName: inputs.name,
    version: 1,
    status,
    inputs,
    result,
    valuedAt: new Date(0).toISOString(),
  });
  await book.xlsx.load(bytes as never);
  return book;
}
