// POST /api/v1/cases/{id}/approve – approve the snapshot in review; renders and stores its board pack
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { decide } from '@/lib/review/decide';
import { presentSnapshot } from '@/lib/review/present';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth<{ caseId: string }>(
  async ({ member, params }) => NextResponse.json({ snapshot: presentSnapshot(await decide(member, params.caseId, 'approve')) }),
  operations.approveCase,
);
