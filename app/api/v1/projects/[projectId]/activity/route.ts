// GET /api/v1/projects/{id}/activity – the audit trail of a project and its cases, newest first
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { findProject } from '@/db/queries/projects';
import { listProjectActivity } from '@/db/queries/summaries';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { AppError } from '@/lib/errors';

export const dynamic = 'force-dynamic';

export const GET = withAuth<{ projectId: string }>(async ({ member, params }) => {
  if (!(await findProject(db, { orgId: member.orgId, projectId: params.projectId }))) throw new AppError('not_found', 'No such project in your organisation.');
  const entries = await listProjectActivity(db, { orgId: member.orgId, projectId: params.projectId });
  return NextResponse.json({
    activity: entries.map((e) => ({
      id: e.id,
      action: e.action,
      subjectType: e.subject_type,
      subjectId: e.subject_id,
      detail: e.detail,
      actor: e.actorName,
      at: e.created_at,
    })),
  });
}, operations.listProjectActivity);
