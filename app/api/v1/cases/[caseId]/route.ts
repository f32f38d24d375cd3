// GET /api/v1/cases/{id} – one case; PATCH – save it (names the version it was based on: 409 if stale); DELETE – remove it
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { findCase, saveCase } from '@/db/queries/cases';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentCase } from '@/lib/case-response';
import { AppError } from '@/lib/errors';
import { missingCase, requireCase } from '@/lib/cases/require-case';

export const dynamic = 'force-dynamic';

type Params = { caseId: string };

export const GET = withAuth<Params>(async ({ member, params }) => {
  const found = await requireCase(db, member.orgId, params.caseId);
  return NextResponse.json({ case: presentCase(found) });
}, operations.getCase);

export const PATCH = withAuth<Params, typeof operations.updateCase.body>(async ({ member, params, body }) => {
  const { version, ...content } = body;
  // The change and its audit entry commit together or not at all.
  const saved = await db.transaction().execute(async (trx) => {
    const saved = await saveCase(trx, { orgId: member.orgId, caseId: params.caseId, expectedVersion: version, content });
    if (!saved.ok && saved.reason === 'not_found') throw missingCase();
    if (!saved.ok && saved.reason === 'in_review')
      throw new AppError('conflict', 'This case is in review and cannot be edited until a reviewer returns it. Nothing was changed.');
    if (!saved.ok && saved.reason === 'approved')
      throw new AppError(
        'conflict',
        'This case is approved: start a revision to change it (the approved version and its board pack stay as they are). Nothing was changed.',
      );
    if (!saved.ok)
      throw new AppError(
        'conflict',
        `This case was saved by someone else meanwhile (now version ${saved.currentVersion}); reload it and apply your change again. Nothing was overwritten.`,
      );
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.update',
      subjectType: 'case',
      subjectId: saved.row.id,
      detail: { version: saved.row.version, name: saved.row.name },
    });
    return saved;
  });
  return NextResponse.json({ case: presentCase(saved.row) });
}, operations.updateCase);

export const DELETE = withAuth<Params>(async ({ member, params }) => {
  // The change and its audit entry commit together or not at all.
  await db.transaction().execute(async (trx) => {
    const gone = await trx
      .deleteFrom('case')
      .where('organization_id', '=', member.orgId)
      .where('id', '=', params.caseId)
      // A case that was ever submitted keeps its review record: it is never deleted.
      .where((eb) => eb.not(eb.exists(eb.selectFrom('case_snapshot').select('case_snapshot.id').whereRef('case_snapshot.case_id', '=', 'case.id'))))
      .returning(['name', 'project_id'])
      .executeTakeFirst();
    if (!gone) {
      if (await findCase(trx, { orgId: member.orgId, caseId: params.caseId }))
        throw new AppError(
          'conflict',
          'This case has been submitted for review, so its record is kept: it cannot be deleted. Duplicate it to start a new version.',
        );
      throw missingCase();
    }
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.delete',
      subjectType: 'case',
      subjectId: params.caseId,
      detail: { name: gone.name, projectId: gone.project_id },
    });
  });
  return new NextResponse(null, { status: 204 });
}, operations.deleteCase);
