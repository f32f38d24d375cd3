// POST /api/v1/cases/{id}/submit – value the case, freeze the snapshot with the analyst's recommendation ({ recommendation }) and send it for review
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { submitCase } from '@/db/queries/reviews';
import { recordValuationRun } from '@/db/queries/valuation-runs';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { AppError } from '@/lib/errors';
import { loadCaseRef, refOf } from '@/lib/review/case-ref';
import { notifySubmitted } from '@/lib/review/notify';
import { presentSnapshot } from '@/lib/review/present';
import { checkTransition } from '@/lib/review/transitions';
import { valueStoredCase } from '@/lib/value-case';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth<{ caseId: string }, typeof operations.submitCase.body>(async ({ member, params, request, body }) => {
  const stored = await loadCaseRef(member.orgId, params.caseId);
  // Refuse early (before the valuation) when the status does not allow it; the transaction checks again.
  const early = checkTransition(member.role, 'submit', stored.status);
  if (!early.ok) throw new AppError(early.code, early.message);
  const valuation = await valueStoredCase(stored, undefined, { owner: member.userId, signal: request.signal });
  const snapshot = await db.transaction().execute(async (trx) => {
    const outcome = await submitCase(trx, {
      orgId: member.orgId,
      caseId: stored.id,
      allowed: (status) => checkTransition(member.role, 'submit', status),
      userId: member.userId,
      caseVersion: stored.version,
      frozen: {
        inputs: valuation.inputs,
        model: valuation.model,
        result: valuation.result,
        engineVersion: valuation.result.engineVersion,
        inputHash: valuation.inputHash,
      },
      recommendation: body.recommendation,
    });
    if (!outcome.ok) throw new AppError(outcome.code, outcome.message);
    // The submitted figures are also the case's latest run, so every list shows them beside
    // its status, not an older version's.
    await recordValuationRun(trx, {
      orgId: member.orgId,
      caseId: stored.id,
      caseVersion: stored.version,
      input: valuation.model,
      inputHash: valuation.inputHash,
      result: valuation.result,
      resultHash: valuation.resultHash,
      engineVersion: valuation.result.engineVersion,
      createdBy: member.userId,
      volatilitySource: valuation.inputs.settings.volatilitySource ?? null,
    });
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.submit',
      subjectType: 'case',
      subjectId: stored.id,
      detail: { name: stored.name, snapshot: outcome.value.id, expandedNpv: valuation.result.expandedNpv },
    });
    await notifySubmitted(trx, refOf(stored, valuation.result.expandedNpv), member.name);
    return outcome.value;
  });
  return NextResponse.json({ snapshot: presentSnapshot(snapshot) }, { status: 201 });
}, operations.submitCase);
