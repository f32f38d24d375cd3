// GET /api/v1/projects – the organisation's projects with their latest valuation; POST – create one (analysts, admins)
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentProject } from '@/lib/case-response';
import { createProject, listProjects } from '@/lib/projects/service';

export const dynamic = 'force-dynamic';

export const GET = withAuth(async ({ member }) => NextResponse.json({ projects: await listProjects(member) }), operations.listProjects);

export const POST = withAuth(
  async ({ member, body }) => NextResponse.json({ project: presentProject(await createProject(member, body)) }, { status: 201 }),
  operations.createProject,
);
