// GET /api/v1/projects – the organisation's projects with their latest valuation; POST – create one (analysts, admins)
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { createProject } from '@/db/queries/projects';
import { findSettings } from '@/db/queries/settings';
import { listProjectSummaries } from '@/db/queries/summaries';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentProject } from '@/lib/case-response';

export const dynamic = 'force-dynamic';

export const GET = withAuth(
  async ({ member }) => NextResponse.json({ projects: await listProjectSummaries(db, { orgId: member.orgId }) }),
  operations.listProjects,
);

export const POST = withAuth(async ({ member, body }) => {
  const currency = body.currency ?? (await findSettings(db, { orgId: member.orgId })).currency;
  // The change and its audit entry commit together or not at all.
  const project = await db.transaction().execute(async (trx) => {
    const project = await createProject(trx, { orgId: member.orgId, ownerId: member.userId, name: body.name, description: body.description, currency });
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'project.create',
      subjectType: 'project',
      subjectId: project.id,
      detail: { name: body.name },
    });
    return project;
  });
  return NextResponse.json({ project: presentProject(project) }, { status: 201 });
}, operations.createProject);
