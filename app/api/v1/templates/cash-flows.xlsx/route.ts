// GET /api/v1/templates/cash-flows.xlsx – Leeway's cash-flow workbook to fill in, with instructions
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { readSettings } from '@/lib/settings/service';
import { cashFlowTemplate } from '@/lib/spreadsheets/cash-flow-workbook';
import { xlsxResponse } from '@/lib/spreadsheets/xlsx-response';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withAuth(
  async ({ member }) => xlsxResponse(await cashFlowTemplate((await readSettings(member.orgId)).wacc), 'Leeway cash-flow template.xlsx'),
  operations.cashFlowTemplate,
);
