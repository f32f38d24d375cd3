// POST /api/v1/cases/{id}/withdraw – the submitter takes back their submission before a decision; the case is a draft again
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { withdrawSubmission } from '@/db/queries/reviews';
import { withAuth } from '@/lib/api';
import { AppError } from '@/lib/errors';
import { presentSnapshot } from '@/lib/review/present';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth<{ caseId: string }>(
  async ({ member, params }) => {
    // The withdrawal and its audit entry commit together or not at all.
    const snapshot = await db.transaction().execute(async (trx) => {
      const outcome = await withdrawSubmission(trx, { orgId: member.orgId, caseId: params.caseId, role: member.role, userId: member.userId });
      if (!outcome.ok) throw new AppError(outcome.code, outcome.message);
      await recordAudit(trx, {
        orgId: member.orgId,
        actorId: member.userId,
        action: 'case.withdraw',
        subjectType: 'case',
        subjectId: outcome.value.case_id,
        detail: { name: outcome.value.case_name, snapshot: outcome.value.id },
      });
      return outcome.value;
    });
    return NextResponse.json({ snapshot: presentSnapshot(snapshot) });
  },
  { permission: { case: ['submit'] } },
);
