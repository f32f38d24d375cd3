// GET /api/v1/reviews – the review queue: cases waiting for a decision (?status=approved,returned for decided ones)
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { readReviewQueue } from '@/lib/review/queue';
import { reviewStatusesSchema } from '@/lib/validations/review';

export const dynamic = 'force-dynamic';

export const GET = withAuth(async ({ member, request }) => {
  const statuses = reviewStatusesSchema.parse(request.nextUrl.searchParams.get('status') || 'in_review');
  const queue = await readReviewQueue(member, statuses);
  return NextResponse.json({ cases: queue });
}, operations.listReviews);
