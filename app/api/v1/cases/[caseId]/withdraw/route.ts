// POST /api/v1/cases/{id}/withdraw – the submitter takes back their submission before a decision; the case is a draft again and the reviewers are told
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentSnapshot } from '@/lib/review/present';
import { withdrawFromReview } from '@/lib/review/withdraw';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth<{ caseId: string }>(
  async ({ member, params }) => NextResponse.json({ snapshot: presentSnapshot(await withdrawFromReview(member, params.caseId)) }),
  operations.withdrawCase,
);
