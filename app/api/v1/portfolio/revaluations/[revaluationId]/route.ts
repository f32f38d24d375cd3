// GET /api/v1/portfolio/revaluations/{id} – a portfolio re-valuation's progress (cases done of the cases taken) and outcome
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { AppError } from '@/lib/errors';
import { findRevaluation } from '@/lib/portfolio-revaluation';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withAuth<{ revaluationId: string }>(async ({ member, params }) => {
  const row = await findRevaluation(member.orgId, params.revaluationId);
  if (!row) throw new AppError('not_found', 'No such re-valuation in your organisation.');
  return NextResponse.json({
    id: row.id,
    status: row.status,
    total: row.total,
    done: row.done,
    failed: row.failed,
    error: row.error,
    createdAt: row.created_at,
    finishedAt: row.finished_at,
  });
}, operations.getRevaluation);
