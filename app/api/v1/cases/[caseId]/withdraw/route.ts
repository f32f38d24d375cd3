// POST /api/v1/cases/{id}/withdraw – the submitter takes back their submission before a decision; the case is a draft again and the reviewers are told
import { checkTransition } from '@/lib/review/transitions';
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { withdrawSubmission } from '@/db/queries/reviews';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { AppError } from '@/lib/errors';
import { loadCaseRef, refOf } from '@/lib/review/case-ref';
import { notifyWithdrawn } from '@/lib/review/notify';
import { presentSnapshot } from '@/lib/review/present';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth<{ caseId: string }>(async ({ member, params }) => {
  const ref = await loadCaseRef(member.orgId, params.caseId);
  // The withdrawal, its audit entry and the reviewers' e-mail commit together or not at all.
  const snapshot = await db.transaction().execute(async (trx) => {
    const outcome = await withdrawSubmission(trx, {
      orgId: member.orgId,
      caseId: ref.id,
      allowed: (status) => checkTransition(member.role, 'withdraw', status),
      userId: member.userId,
    });
    if (!outcome.ok) throw new AppError(outcome.code, outcome.message);
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.withdraw',
      subjectType: 'case',
      subjectId: outcome.value.case_id,
      detail: { name: outcome.value.case_name, snapshot: outcome.value.id },
    });
    await notifyWithdrawn(trx, refOf(ref, (outcome.value.result as { expandedNpv: number }).expandedNpv), member.name);
    return outcome.value;
  });
  return NextResponse.json({ snapshot: presentSnapshot(snapshot) });
}, operations.withdrawCase);
