// GET /api/v1/cases/{id}/attachments – the case's supporting documents; POST – attach one (PDF, XLSX, CSV, PNG; 10 MB)
import { createHash } from 'node:crypto';
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { addAttachment, listAttachments } from '@/db/queries/attachments';
import { recordAudit } from '@/db/queries/audit';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { readUploadForm } from '@/lib/uploads/read-form';
import { inspectUpload } from '@/lib/uploads/inspect';
import { requireCase } from '@/lib/cases/require-case';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

type Params = { caseId: string };

export const GET = withAuth<Params>(async ({ member, params }) => {
  await requireCase(db, member.orgId, params.caseId);
  const rows = await listAttachments(db, { orgId: member.orgId, caseId: params.caseId });
  return NextResponse.json({
    attachments: rows.map((r) => ({ id: r.id, filename: r.filename, kind: r.kind, size: r.size, uploadedBy: r.uploaded_by_name, uploadedAt: r.created_at })),
  });
}, operations.listAttachments);

export const POST = withAuth<Params>(async ({ member, params, request }) => {
  const found = await requireCase(db, member.orgId, params.caseId);
  const { file, bytes } = await readUploadForm(request, { what: 'the document', choose: 'Choose a file.' });
  const data = Buffer.from(bytes);
  const kind = inspectUpload(file.name, data, ['pdf', 'xlsx', 'csv', 'png']);
  const filename = file.name.replace(/[\\/\u0000-\u001f]/g, '_').slice(0, 200);
  // The change and its audit entry commit together or not at all.
  const made = await db.transaction().execute(async (trx) => {
    const made = await addAttachment(trx, {
      orgId: member.orgId,
      caseId: found.id,
      filename,
      kind,
      data,
      sha256: createHash('sha256').update(data).digest('hex'),
      uploadedBy: member.userId,
    });
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.attach',
      subjectType: 'case',
      subjectId: found.id,
      detail: { name: found.name, file: filename, size: data.length },
    });
    return made;
  });
  return NextResponse.json(
    { attachment: { id: made.id, filename: made.filename, kind: made.kind, size: made.size, uploadedBy: member.name, uploadedAt: made.created_at } },
    { status: 201 },
  );
}, operations.addAttachment);
