// POST /api/v1/cases/{id}/duplicate – copy a case into a new, independent case of the same project
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { duplicateCase } from '@/db/queries/cases';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentCase } from '@/lib/case-response';
import { missingCase } from '@/lib/cases/require-case';

export const dynamic = 'force-dynamic';

export const POST = withAuth<{ caseId: string }, typeof operations.duplicateCase.body>(async ({ member, params, body }) => {
  // The change and its audit entry commit together or not at all.
  const copy = await db.transaction().execute(async (trx) => {
    const copy = await duplicateCase(trx, { orgId: member.orgId, caseId: params.caseId, name: body.name, createdBy: member.userId });
    if (!copy) throw missingCase();
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.duplicate',
      subjectType: 'case',
      subjectId: copy.id,
      detail: { from: params.caseId, name: copy.name, projectId: copy.project_id },
    });
    return copy;
  });
  return NextResponse.json({ case: presentCase(copy) }, { status: 201 });
}, operations.duplicateCase);
