// POST /api/v1/cases/{id}/duplicate – copy a case into a new, independent case of the same project
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentCase } from '@/lib/case-response';
import { duplicateCase } from '@/lib/cases/service';

export const dynamic = 'force-dynamic';

export const POST = withAuth<{ caseId: string }, typeof operations.duplicateCase.body>(
  async ({ member, params, body }) => NextResponse.json({ case: presentCase(await duplicateCase(member, params.caseId, body.name)) }, { status: 201 }),
  operations.duplicateCase,
);
