// GET /api/v1/cases/{id}/export.xlsx – the case as a workbook: inputs, cash flows, settings, options, results, lattice, cautions
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { loadCaseRef } from '@/lib/review/case-ref';
import { caseWorkbook } from '@/lib/spreadsheets/case-export';
import { xlsxResponse } from '@/lib/spreadsheets/xlsx-response';
import { valueStoredCase } from '@/lib/value-case';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withAuth<{ caseId: string }>(async ({ member, params, request }) => {
  const c = await loadCaseRef(member.orgId, params.caseId);
  // Valued now, from the saved case, with the first steps of the lattice for the sheet.
  const { inputs, result } = await valueStoredCase(c, { grid: { steps: 6 } }, { owner: member.userId, signal: request.signal });
  const bytes = await caseWorkbook({
    projectName: c.project_name,
    currency: c.currency,
    caseName: c.name,
    version: c.version,
    status: c.status,
    inputs,
    result,
    valuedAt: new Date().toISOString(),
  });
  return xlsxResponse(bytes, `${c.project_name} - ${c.name}.xlsx`);
}, operations.exportCase);
