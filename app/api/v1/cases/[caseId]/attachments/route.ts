// GET /api/v1/cases/{id}/attachments – the case's supporting documents; POST – attach one (PDF, XLSX, CSV, PNG; 10 MB)
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { attachDocument, listCaseAttachments } from '@/lib/attachments';
import { operations } from '@/lib/openapi/operations';
import { readUploadForm } from '@/lib/uploads/read-form';
import { inspectUpload } from '@/lib/uploads/inspect';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

type Params = { caseId: string };

export const GET = withAuth<Params>(
  async ({ member, params }) => NextResponse.json({ attachments: await listCaseAttachments(member, params.caseId) }),
  operations.listAttachments,
);

export const POST = withAuth<Params>(async ({ member, params, request }) => {
  const attachment = await attachDocument(member, params.caseId, async () => {
    const { file, bytes } = await readUploadForm(request, { what: 'the document', choose: 'Choose a file.' });
    const data = Buffer.from(bytes);
    return { filename: file.name, kind: inspectUpload(file.name, data, ['pdf', 'xlsx', 'csv', 'png']), data };
  });
  return NextResponse.json({ attachment }, { status: 201 });
}, operations.addAttachment);
