// POST /api/v1/cases/{caseId}/observations – record the project's value on a date after approval ({ date, value, note?, source? })
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { recordObservation } from '@/lib/watch/follow';

export const dynamic = 'force-dynamic';

export const POST = withAuth<{ caseId: string }, typeof operations.addObservation.body>(
  async ({ member, params, body }) => NextResponse.json({ observation: await recordObservation(member, params.caseId, body) }, { status: 201 }),
  operations.addObservation,
);
