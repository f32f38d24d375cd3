// POST /api/v1/cases/{id}/duplicate – copy a case into a new, independent case of the same project
import { NextResponse } from 'next/server';
import { z } from 'zod';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { duplicateCase } from '@/db/queries/cases';
import { withAuth } from '@/lib/api';
import { presentCase } from '@/lib/case-response';
import { AppError } from '@/lib/errors';

export const dynamic = 'force-dynamic';

const duplicateSchema = z.object({ name: z.string().trim().min(1, 'Give the copy a name.').max(120) });

export const POST = withAuth<{ caseId: string }, typeof duplicateSchema>(
  async ({ member, params, body }) => {
    // The change and its audit entry commit together or not at all.
    const copy = await db.transaction().execute(async (trx) => {
      const copy = await duplicateCase(trx, { orgId: member.orgId, caseId: params.caseId, name: body.name, createdBy: member.userId });
      if (!copy) throw new AppError('not_found', 'No such case in your organisation.');
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
  },
  { permission: { case: ['create'] }, body: duplicateSchema },
);
