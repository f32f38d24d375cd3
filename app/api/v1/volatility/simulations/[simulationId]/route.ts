// GET /api/v1/volatility/simulations/{id} – progress and, when done, both estimates; DELETE – cancel it
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { AppError } from '@/lib/errors';
import { cancelSimulation, findSimulation } from '@/lib/volatility/simulation-jobs';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

type Params = { simulationId: string };
const missing = () => new AppError('not_found', 'No such simulation in your organisation.');

export const GET = withAuth<Params>(async ({ member, params }) => {
  const row = await findSimulation(member.orgId, params.simulationId);
  if (!row) throw missing();
  return NextResponse.json({
    id: row.id,
    caseId: row.case_id,
    status: row.status,
    progress: row.progress,
    spec: row.spec,
    result: row.result,
    error: row.error,
    createdAt: row.created_at,
    finishedAt: row.finished_at,
  });
}, operations.getSimulation);

export const DELETE = withAuth<Params>(async ({ member, params }) => {
  const row = await findSimulation(member.orgId, params.simulationId);
  if (!row) throw missing();
  if (!(await cancelSimulation(member.orgId, row.id))) throw new AppError('conflict', `The simulation has already ended (${row.status}).`);
  return NextResponse.json({ id: row.id, status: 'cancelled' });
}, operations.cancelSimulation);
