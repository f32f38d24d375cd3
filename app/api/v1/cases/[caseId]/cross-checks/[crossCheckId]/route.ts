// GET /api/v1/cases/{caseId}/cross-checks/{crossCheckId} – progress and, when done, the comparison; DELETE – cancel it
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { cancelCrossCheck, readCrossCheck } from '@/lib/cross-check/jobs';
import { operations } from '@/lib/openapi/operations';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

type Params = { caseId: string; crossCheckId: string };

export const GET = withAuth<Params>(
  async ({ member, params }) => NextResponse.json(await readCrossCheck(member, params.caseId, params.crossCheckId)),
  operations.getCrossCheck,
);

export const DELETE = withAuth<Params>(async ({ member, params }) => {
  await cancelCrossCheck(member, params.caseId, params.crossCheckId);
  return NextResponse.json({ id: params.crossCheckId, status: 'cancelled' });
}, operations.cancelCrossCheck);
