// POST /api/v1/cases/{id}/valuations – value the stored case and keep the run; GET – its runs, newest first
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { listCaseRuns, valueCase } from '@/lib/cases/valuations';
import { operations } from '@/lib/openapi/operations';
import { hashResult } from '@/lib/model-hash';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

type Params = { caseId: string };

function summary(result: { value: number; staticNpv: number; expandedNpv: number; optionPremium: number }) {
  return { value: result.value, staticNpv: result.staticNpv, expandedNpv: result.expandedNpv, optionPremium: result.optionPremium };
}

export const POST = withAuth<Params>(async ({ member, params, request }) => {
  const { model, warnings, result, inputHash, run } = await valueCase(member, params.caseId, request.signal);
  return NextResponse.json(
    {
      run: {
        id: run.id,
        caseVersion: run.case_version,
        inputHash,
        engineVersion: run.engine_version,
        createdAt: run.created_at,
        warnings,
        input: model,
        result,
      },
    },
    { status: 201 },
  );
}, operations.valueCase);

export const GET = withAuth<Params>(async ({ member, params }) => {
  const runs = await listCaseRuns(member, params.caseId);
  return NextResponse.json({
    runs: runs.map((r) => ({
      id: r.id,
      caseVersion: r.case_version,
      inputHash: r.input_hash,
      engineVersion: r.engine_version,
      createdAt: r.created_at,
      createdBy: r.created_by_name,
      volatilitySource: r.volatility_source,
      resultHash: r.result_hash ?? hashResult(r.result),
      ...summary(r.result as never),
    })),
  });
}, operations.listCaseValuations);
