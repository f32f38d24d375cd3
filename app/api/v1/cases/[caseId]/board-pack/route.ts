// GET /api/v1/cases/{id}/board-pack – the PDF board pack of the case's latest approved snapshot (?size=A4|LETTER)

import { db } from '@/db';
import { latestApprovedSnapshot } from '@/db/queries/reviews';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { pageSizeSchema } from '@/lib/validations/review';
import { ensureBoardPack } from '@/lib/board-pack/store';
import { AppError } from '@/lib/errors';
import { requireCase } from '@/lib/cases/require-case';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withAuth<{ caseId: string }>(async ({ member, params, request }) => {
  const size = pageSizeSchema.parse((request.nextUrl.searchParams.get('size') ?? 'A4').toUpperCase());
  const found = await requireCase(db, member.orgId, params.caseId);
  const snapshot = await latestApprovedSnapshot(db, { orgId: member.orgId, caseId: found.id });
  if (!snapshot) throw new AppError('not_found', 'This case has no approved snapshot yet, so there is no board pack.');
  const { pdf, sha256 } = await ensureBoardPack(member.orgId, snapshot.id, size);
  const filename = `${found.name} - board pack (${size === 'A4' ? 'A4' : 'Letter'}).pdf`.replace(/[^\w .()-]/g, '_');
  return new Response(new Uint8Array(pdf), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="${filename}"`,
      etag: `"${sha256}"`,
      'cache-control': 'no-store',
    },
  });
}, operations.boardPack);
