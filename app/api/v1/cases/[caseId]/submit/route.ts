// POST /api/v1/cases/{id}/submit – value the case, freeze the snapshot with the analyst's recommendation ({ recommendation }) and send it for review
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentSnapshot } from '@/lib/review/present';
import { submitForReview } from '@/lib/review/submit';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth<{ caseId: string }, typeof operations.submitCase.body>(async ({ member, params, request, body }) => {
  const snapshot = await submitForReview(member, params.caseId, body.recommendation, request.signal);
  return NextResponse.json({ snapshot: presentSnapshot(snapshot) }, { status: 201 });
}, operations.submitCase);
