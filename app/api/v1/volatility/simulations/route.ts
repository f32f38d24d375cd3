// POST /api/v1/volatility/simulations – start a Monte Carlo volatility estimate for a case (answers its id at once)
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import type { CashFlowSchedule } from '@/lib/cash-flows';
import { AppError } from '@/lib/errors';
import { startSimulation } from '@/lib/volatility/simulation-jobs';
import { readCase } from '@/lib/cases/service';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth(async ({ member, body }) => {
  const found = await readCase(member, body.caseId);
  const schedule = found.cash_flows as CashFlowSchedule;
  if (schedule.rows.length < 3)
    throw new AppError('unprocessable', 'The cash flows need year 0 and at least two more years for a Monte Carlo estimate.', {
      caseId: ['Add years to the cash flows.'],
    });
  const id = await startSimulation({
    orgId: member.orgId,
    caseId: found.id,
    userId: member.userId,
    schedule,
    spec: body.spec,
    audit: (simulation) => ({
      orgId: member.orgId,
      actorId: member.userId,
      action: 'volatility.simulate',
      subjectType: 'case',
      subjectId: found.id,
      detail: { name: found.name, simulation, paths: body.spec.paths, seed: body.spec.seed },
    }),
  });
  return NextResponse.json({ id, status: 'running' }, { status: 202 });
}, operations.startSimulation);
