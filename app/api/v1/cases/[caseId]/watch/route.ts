// GET /api/v1/cases/{caseId}/watch – where each approved right stands at the latest observation of the project's value
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { watchCase } from '@/lib/watch/follow';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withAuth<{ caseId: string }>(
  async ({ member, params, request }) => NextResponse.json(await watchCase(member, params.caseId, request.signal)),
  operations.watchCase,
);
