// GET /api/v1/attachments/{id} – download a supporting document; DELETE – remove it (analysts, admins)
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { readAttachment, removeAttachment } from '@/lib/attachments';
import { operations } from '@/lib/openapi/operations';
import { attachmentDisposition } from '@/lib/content-disposition';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

type Params = { attachmentId: string };
const contentTypes = {
  pdf: 'application/pdf',
  xlsx: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
  csv: 'text/csv; charset=utf-8',
  png: 'image/png',
} as const;

export const GET = withAuth<Params>(async ({ member, params }) => {
  const found = await readAttachment(member, params.attachmentId);
  return new Response(new Uint8Array(found.data), {
    headers: {
      'content-type': contentTypes[found.kind],
      // Always a download, never rendered in the app's origin; the browser must not guess another type.
      'content-disposition': attachmentDisposition(found.filename),
      'x-content-type-options': 'nosniff',
      'cache-control': 'no-store',
    },
  });
}, operations.getAttachment);

export const DELETE = withAuth<Params>(async ({ member, params }) => {
  await removeAttachment(member, params.attachmentId);
  return new NextResponse(null, { status: 204 });
}, operations.deleteAttachment);
