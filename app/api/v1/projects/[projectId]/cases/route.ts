// GET /api/v1/projects/{id}/cases – a project's cases, each with its latest valuation; POST – create a case
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentCase, presentProjectCases } from '@/lib/case-response';
import { createCase, listProjectCases } from '@/lib/cases/service';

export const dynamic = 'force-dynamic';

type Params = { projectId: string };

export const GET = withAuth<Params>(
  async ({ member, params }) => NextResponse.json(presentProjectCases(await listProjectCases(member, params.projectId))),
  operations.listProjectCases,
);

export const POST = withAuth<Params, typeof operations.createCase.body>(
  async ({ member, params, body }) => NextResponse.json({ case: presentCase(await createCase(member, params.projectId, body)) }, { status: 201 }),
  operations.createCase,
);
