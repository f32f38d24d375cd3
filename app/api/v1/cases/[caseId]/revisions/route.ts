// POST /api/v1/cases/{id}/revisions – start a revision of an approved case: a draft at the next version; the approved snapshot and pack stay
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentCase } from '@/lib/case-response';
import { reviseCase } from '@/lib/cases/service';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth<{ caseId: string }>(
  async ({ member, params }) => NextResponse.json({ case: presentCase(await reviseCase(member, params.caseId)) }, { status: 201 }),
  operations.reviseCase,
);
