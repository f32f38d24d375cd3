// POST /api/v1/cases/{id}/revisions – start a revision of an approved case: a draft at the next version; the approved snapshot and pack stay
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { startRevision } from '@/db/queries/cases';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentCase } from '@/lib/case-response';
import { AppError } from '@/lib/errors';
import { statusLabels } from '@/lib/review/transitions';
import { requireCase } from '@/lib/cases/require-case';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth<{ caseId: string }>(async ({ member, params }) => {
  // The change and its audit entry commit together or not at all.
  const revised = await db.transaction().execute(async (trx) => {
    const revised = await startRevision(trx, { orgId: member.orgId, caseId: params.caseId });
    if (!revised) {
      const found = await requireCase(trx, member.orgId, params.caseId);
      throw new AppError('conflict', `Only an approved case is revised; this one is ${statusLabels[found.status].toLowerCase()} and can be edited as it is.`);
    }
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.revise',
      subjectType: 'case',
      subjectId: revised.id,
      detail: { name: revised.name, version: revised.version },
    });
    return revised;
  });
  return NextResponse.json({ case: presentCase(revised) }, { status: 201 });
}, operations.reviseCase);
