// GET /api/v1/cases/{id}/export.xlsx – the case as a workbook: inputs, cash flows, settings, options, results, lattice, cautions
import { withAuth } from '@/lib/api';
import { caseToModel } from '@/lib/case-model';
import { EngineRefusal, valueInWorker } from '@/lib/engine/pool';
import { AppError } from '@/lib/errors';
import { loadCaseRef } from '@/lib/review/case-ref';
import { caseWorkbook } from '@/lib/spreadsheets/case-export';
import { xlsxResponse } from '@/lib/spreadsheets/xlsx-response';
import type { CaseInput } from '@/lib/validations/case';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withAuth<{ caseId: string }>(
  async ({ member, params }) => {
    const c = await loadCaseRef(member.orgId, params.caseId);
    const inputs = { name: c.name, cashFlows: c.cash_flows, settings: c.settings, options: c.options } as CaseInput;
    const { model } = caseToModel(inputs);
    let result;
    try {
      // Valued now, from the saved case, with the first steps of the lattice for the sheet.
      result = await valueInWorker(model, { grid: { steps: 6 } });
    } catch (error) {
      if (error instanceof EngineRefusal) throw new AppError('unprocessable', `The case cannot be valued: ${error.issues[0]?.message}`);
      throw error;
    }
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
  },
  { permission: { case: ['read'] } },
);
