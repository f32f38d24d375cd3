// POST /api/v1/cases/{caseId}/valuations/{runId}/rerun – value a stored run's model again with today's engine: does it reproduce?
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { rerun } from '@/lib/rerun';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth<{ caseId: string; runId: string }>(
  async ({ member, params, request }) => NextResponse.json(await rerun(member, params.caseId, params.runId, request.signal)),
  operations.rerunValuation,
);
