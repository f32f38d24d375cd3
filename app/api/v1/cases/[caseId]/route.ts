// GET /api/v1/cases/{id} – one case; PATCH – save it (names the version it was based on: 409 if stale); DELETE – remove it
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentCase } from '@/lib/case-response';
import { deleteCase, readCase, saveCase } from '@/lib/cases/service';

export const dynamic = 'force-dynamic';

type Params = { caseId: string };

export const GET = withAuth<Params>(
  async ({ member, params }) => NextResponse.json({ case: presentCase(await readCase(member, params.caseId)) }),
  operations.getCase,
);

export const PATCH = withAuth<Params, typeof operations.updateCase.body>(async ({ member, params, body }) => {
  const { version, ...content } = body;
  const saved = await saveCase(member, params.caseId, { expectedVersion: version, content, action: 'case.update', detail: {}, undone: 'Nothing was changed.' });
  return NextResponse.json({ case: presentCase(saved) });
}, operations.updateCase);

export const DELETE = withAuth<Params>(async ({ member, params }) => {
  await deleteCase(member, params.caseId);
  return new NextResponse(null, { status: 204 });
}, operations.deleteCase);
