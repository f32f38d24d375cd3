// POST /api/v1/portfolio/revaluations – re-value every case whose stored figures come from an older engine, as a job (answers its id at once)
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { startRevaluation } from '@/lib/portfolio-revaluation';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth(async ({ member }) => {
  const id = await startRevaluation(member);
  return NextResponse.json({ id, status: 'running' }, { status: 202 });
}, operations.startRevaluation);
