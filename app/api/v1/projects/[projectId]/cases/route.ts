// GET /api/v1/projects/{id}/cases – a project's cases, each with its latest valuation; POST – create a case
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { createCase, listCases } from '@/db/queries/cases';
import { findProject } from '@/db/queries/projects';
import { latestRunByCase } from '@/db/queries/summaries';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentCase } from '@/lib/case-response';
import { AppError } from '@/lib/errors';

export const dynamic = 'force-dynamic';

type Params = { projectId: string };

export const GET = withAuth<Params>(async ({ member, params }) => {
  if (!(await findProject(db, { orgId: member.orgId, projectId: params.projectId }))) throw new AppError('not_found', 'No such project in your organisation.');
  const scope = { orgId: member.orgId, projectId: params.projectId };
  const [cases, latest] = await Promise.all([listCases(db, scope), latestRunByCase(db, scope)]);
  return NextResponse.json({ cases: cases.map((c) => ({ ...presentCase(c), latest: latest.get(c.id) ?? null })) });
}, operations.listProjectCases);

export const POST = withAuth<Params, typeof operations.createCase.body>(async ({ member, params, body }) => {
  // The change and its audit entry commit together or not at all.
  const made = await db.transaction().execute(async (trx) => {
    const made = await createCase(trx, { orgId: member.orgId, projectId: params.projectId, createdBy: member.userId, content: body });
    if (!made) throw new AppError('not_found', 'No such project in your organisation.');
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.create',
      subjectType: 'case',
      subjectId: made.id,
      detail: { name: body.name, projectId: params.projectId },
    });
    return made;
  });
  return NextResponse.json({ case: presentCase(made) }, { status: 201 });
}, operations.createCase);
