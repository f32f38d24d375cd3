// GET /api/v1/projects/{id}/activity – the audit trail of a project and its cases, newest first
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { readProjectActivity } from '@/lib/projects/service';

export const dynamic = 'force-dynamic';

export const GET = withAuth<{ projectId: string }>(async ({ member, params }) => {
  const entries = await readProjectActivity(member, params.projectId);
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
