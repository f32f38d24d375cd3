// GET /api/v1/projects/{id} – one project; PATCH – rename, describe or archive it; DELETE – remove it with its cases
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { findProject } from '@/db/queries/projects';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentProject } from '@/lib/case-response';
import { AppError } from '@/lib/errors';

export const dynamic = 'force-dynamic';

type Params = { projectId: string };
const missing = () => new AppError('not_found', 'No such project in your organisation.');

export const GET = withAuth<Params>(async ({ member, params }) => {
  const project = await findProject(db, { orgId: member.orgId, projectId: params.projectId });
  if (!project) throw missing();
  return NextResponse.json({ project: presentProject(project) });
}, operations.getProject);

export const PATCH = withAuth<Params, typeof operations.updateProject.body>(async ({ member, params, body }) => {
  // The change and its audit entry commit together or not at all.
  const project = await db.transaction().execute(async (trx) => {
    const project = await trx
      .updateTable('project')
      .set({ ...body, updated_at: new Date() })
      .where('organization_id', '=', member.orgId)
      .where('id', '=', params.projectId)
      .returningAll()
      .executeTakeFirst();
    if (!project) throw missing();
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'project.update',
      subjectType: 'project',
      subjectId: project.id,
      detail: body,
    });
    return project;
  });
  return NextResponse.json({ project: presentProject(project) });
}, operations.updateProject);

export const DELETE = withAuth<Params>(async ({ member, params }) => {
  // The change and its audit entry commit together or not at all.
  await db.transaction().execute(async (trx) => {
    const gone = await trx
      .deleteFrom('project')
      .where('organization_id', '=', member.orgId)
      .where('id', '=', params.projectId)
      // Review records are kept: a project with a submitted case is archived, never deleted.
      .where((eb) =>
        eb.not(
          eb.exists(
            eb
              .selectFrom('case_snapshot')
              .innerJoin('case', 'case.id', 'case_snapshot.case_id')
              .select('case_snapshot.id')
              .whereRef('case.project_id', '=', 'project.id'),
          ),
        ),
      )
      .returning('name')
      .executeTakeFirst();
    if (!gone) {
      if (await findProject(trx, { orgId: member.orgId, projectId: params.projectId }))
        throw new AppError(
          'conflict',
          'A case of this project has been submitted for review, so the project keeps its record: archive it instead of deleting it.',
        );
      throw missing();
    }
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'project.delete',
      subjectType: 'project',
      subjectId: params.projectId,
      detail: { name: gone.name },
    });
  });
  return new NextResponse(null, { status: 204 });
}, operations.deleteProject);
