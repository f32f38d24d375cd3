// GET /api/v1/templates/cash-flows.xlsx – Leeway's cash-flow workbook to fill in, with instructions
import { db } from '@/db';
import { findSettings } from '@/db/queries/settings';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { cashFlowTemplate } from '@/lib/spreadsheets/cash-flow-workbook';
import { xlsxResponse } from '@/lib/spreadsheets/xlsx-response';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withAuth(
  async ({ member }) => xlsxResponse(await cashFlowTemplate((await findSettings(db, { orgId: member.orgId })).wacc), 'Leeway cash-flow template.xlsx'),
  operations.cashFlowTemplate,
);
