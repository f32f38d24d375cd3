// GET /api/v1/reviews – the review queue: cases waiting for a decision (?status=approved,returned for decided ones)
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { listReviewQueue } from '@/db/queries/reviews';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { reviewStatusesSchema } from '@/lib/validations/review';

export const dynamic = 'force-dynamic';

export const GET = withAuth(async ({ member, request }) => {
  const asked = request.nextUrl.searchParams.get('status');
  const statuses = reviewStatusesSchema.parse(asked ? asked.split(',') : ['in_review']);
  const queue = await listReviewQueue(db, { orgId: member.orgId, statuses });
  return NextResponse.json({ cases: queue });
}, operations.listReviews);
