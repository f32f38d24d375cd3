// GET /api/v1/reviews – the review queue: cases waiting for a decision (?status=approved,returned for decided ones)
import { NextResponse } from 'next/server';
import { z } from 'zod';
import { db } from '@/db';
import { listReviewQueue } from '@/db/queries/reviews';
import { withAuth } from '@/lib/api';

export const dynamic = 'force-dynamic';

const statusList = z.array(z.enum(['in_review', 'approved', 'returned'])).min(1);

export const GET = withAuth(
  async ({ member, request }) => {
    const asked = request.nextUrl.searchParams.get('status');
    const statuses = statusList.parse(asked ? asked.split(',') : ['in_review']);
    const queue = await listReviewQueue(db, { orgId: member.orgId, statuses });
    return NextResponse.json({ cases: queue });
  },
  { permission: { review: ['read'] } },
);
