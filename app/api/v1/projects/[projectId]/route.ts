// GET /api/v1/projects/{id} – one project; PATCH – rename, describe or archive it; DELETE – remove it with its cases
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentProject } from '@/lib/case-response';
import { deleteProject, readProject, updateProject } from '@/lib/projects/service';

export const dynamic = 'force-dynamic';

type Params = { projectId: string };

export const GET = withAuth<Params>(
  async ({ member, params }) => NextResponse.json({ project: presentProject(await readProject(member, params.projectId)) }),
  operations.getProject,
);

export const PATCH = withAuth<Params, typeof operations.updateProject.body>(
  async ({ member, params, body }) => NextResponse.json({ project: presentProject(await updateProject(member, params.projectId, body)) }),
  operations.updateProject,
);

export const DELETE = withAuth<Params>(async ({ member, params }) => {
  await deleteProject(member, params.projectId);
  return new NextResponse(null, { status: 204 });
}, operations.deleteProject);
