// POST /api/v1/cases/{caseId}/cross-checks – queue an independent Monte Carlo cross-check of the case; GET – its latest ones
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { readCrossChecks, startCrossCheck } from '@/lib/cross-check/jobs';
import { operations } from '@/lib/openapi/operations';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

type Params = { caseId: string };

export const POST = withAuth<Params, typeof operations.startCrossCheck.body>(async ({ member, params, body }) => {
  const id = await startCrossCheck(member, params.caseId, body);
  return NextResponse.json({ id, status: 'running' }, { status: 202 });
}, operations.startCrossCheck);

export const GET = withAuth<Params>(
  async ({ member, params }) => NextResponse.json({ crossChecks: await readCrossChecks(member, params.caseId) }),
  operations.listCrossChecks,
);
