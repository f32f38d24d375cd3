// GET /api/v1/cases/{id}/board-pack – the PDF board pack of the case's latest approved snapshot (?size=A4|LETTER)

import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { pageSizeSchema } from '@/lib/validations/review';
import { latestBoardPack } from '@/lib/board-pack/store';
import { attachmentDisposition } from '@/lib/content-disposition';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withAuth<{ caseId: string }>(async ({ member, params, request }) => {
  const size = pageSizeSchema.parse((request.nextUrl.searchParams.get('size') ?? 'A4').toUpperCase());
  const { projectName, caseName, pdf, sha256 } = await latestBoardPack(member, params.caseId, size);
  // Named by project and case, like the case's workbook: packs of several projects' base cases do not collide.
  const filename = `${projectName} - ${caseName} - board pack (${size === 'A4' ? 'A4' : 'Letter'}).pdf`;
  return new Response(new Uint8Array(pdf), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': attachmentDisposition(filename),
      etag: `"${sha256}"`,
      'cache-control': 'no-store',
    },
  });
}, operations.boardPack);
