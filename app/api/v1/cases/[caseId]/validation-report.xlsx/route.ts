// GET /api/v1/cases/{caseId}/validation-report.xlsx – the validation report of the case as saved, as a workbook
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { xlsxResponse } from '@/lib/spreadsheets/xlsx-response';
import { validationReportWorkbook } from '@/lib/validation-report/produce';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withAuth<{ caseId: string }>(async ({ member, params, request }) => {
  const { bytes, filename } = await validationReportWorkbook(member, params.caseId, request.signal);
  return xlsxResponse(bytes, filename);
}, operations.validationWorkbook);
