// GET /api/v1/attachments/{id} – download a supporting document; DELETE – remove it (analysts, admins)
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { findAttachment } from '@/db/queries/attachments';
import { recordAudit } from '@/db/queries/audit';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { AppError } from '@/lib/errors';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

type Params = { attachmentId: string };
const missing = () => new AppError('not_found', 'No such document in your organisation.');
const contentTypes = {
  pdf: 'application/pdf',
  xlsx: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
  csv: 'text/csv; charset=utf-8',
  png: 'image/png',
} as const;

export const GET = withAuth<Params>(async ({ member, params }) => {
  const found = await findAttachment(db, { orgId: member.orgId, attachmentId: params.attachmentId });
  if (!found) throw missing();
  return new Response(new Uint8Array(found.data), {
    headers: {
      'content-type': contentTypes[found.kind],
      // Always a download, never rendered in the app's origin; the browser must not guess another type.
      'content-disposition': `attachment; filename="${found.filename.replace(/[^\w .()-]/g, '_')}"`,
      'x-content-type-options': 'nosniff',
      'cache-control': 'no-store',
    },
  });
}, operations.getAttachment);

export const DELETE = withAuth<Params>(async ({ member, params }) => {
  // The change and its audit entry commit together or not at all.
  await db.transaction().execute(async (trx) => {
    const gone = await trx
      .deleteFrom('attachment')
      .where('organization_id', '=', member.orgId)
      .where('id', '=', params.attachmentId)
      .returning(['case_id', 'filename'])
      .executeTakeFirst();
    if (!gone) throw missing();
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.detach',
      subjectType: 'case',
      subjectId: gone.case_id,
      detail: { file: gone.filename },
    });
  });
  return new NextResponse(null, { status: 204 });
}, operations.deleteAttachment);
