// GET /api/v1/cases – every case of the organisation with its project (for pickers such as the compare page)
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';

export const dynamic = 'force-dynamic';

export const GET = withAuth(async ({ member }) => {
  const cases = await db
    .selectFrom('case')
    .innerJoin('project', 'project.id', 'case.project_id')
    .select(['case.id', 'case.name', 'case.status', 'project.id as projectId', 'project.name as projectName'])
    .where('case.organization_id', '=', member.orgId)
    .orderBy('project.name')
    .orderBy('case.created_at')
    .execute();
  return NextResponse.json({ cases });
}, operations.listCases);
