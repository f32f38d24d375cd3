// POST /api/v1/cases/{caseId}/validation-report/attachments – keep the validation report (A4 PDF) with the case's documents
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { attachValidationReport } from '@/lib/validation-report/produce';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth<{ caseId: string }>(
  async ({ member, params, request }) =>
    NextResponse.json({ attachment: await attachValidationReport(member, params.caseId, request.signal) }, { status: 201 }),
  operations.attachValidationReport,
);
