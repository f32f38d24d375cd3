// POST /api/v1/cases/{id}/return – send the case back to the analyst with a reason
import { NextResponse } from 'next/server';
import { z } from 'zod';
import { withAuth } from '@/lib/api';
import { decide } from '@/lib/review/decide';
import { presentSnapshot } from '@/lib/review/present';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

const returnSchema = z.object({ reason: z.string().trim().min(3, 'Say why the case goes back (at least a few words).').max(2000) });

export const POST = withAuth<{ caseId: string }, typeof returnSchema>(
  async ({ member, params, body }) => NextResponse.json({ snapshot: presentSnapshot(await decide(member, params.caseId, 'return', body.reason)) }),
  { permission: { review: ['decide'] }, body: returnSchema },
);
