// POST /api/v1/cases/{caseId}/rights/{rightId}/decisions – record that a followed right was exercised, declined or postponed ({ decision, date?, reason })
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { recordRightDecision } from '@/lib/watch/follow';

export const dynamic = 'force-dynamic';

export const POST = withAuth<{ caseId: string; rightId: string }, typeof operations.recordRightDecision.body>(
  async ({ member, params, body }) => NextResponse.json({ decision: await recordRightDecision(member, params.caseId, params.rightId, body) }, { status: 201 }),
  operations.recordRightDecision,
);
