// GET /api/v1/projects/{id}/activity – the audit trail of a project and its cases, newest first
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { presentActivity } from '@/lib/case-response';
import { operations } from '@/lib/openapi/operations';
import { readProjectActivity } from '@/lib/projects/service';

export const dynamic = 'force-dynamic';

export const GET = withAuth<{ projectId: string }>(
  async ({ member, params }) => NextResponse.json(presentActivity(await readProjectActivity(member, params.projectId))),
  operations.listProjectActivity,
);
