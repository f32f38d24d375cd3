// POST /api/v1/cases/{id}/return – send the case back to the analyst with a reason
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { decide } from '@/lib/review/decide';
import { presentSnapshot } from '@/lib/review/present';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth<{ caseId: string }, typeof operations.returnCase.body>(
  async ({ member, params, body }) => NextResponse.json({ snapshot: presentSnapshot(await decide(member, params.caseId, 'return', body.reason)) }),
  operations.returnCase,
);
