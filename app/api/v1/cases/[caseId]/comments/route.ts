// GET /api/v1/cases/{id}/comments – the review discussion; POST – comment on a section of the case
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { addComment, listComments } from '@/db/queries/reviews';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { missingCase, requireCase } from '@/lib/cases/require-case';

export const dynamic = 'force-dynamic';

export const GET = withAuth<{ caseId: string }>(async ({ member, params }) => {
  await requireCase(db, member.orgId, params.caseId);
  const comments = await listComments(db, { orgId: member.orgId, caseId: params.caseId });
  return NextResponse.json({
    comments: comments.map((c) => ({ id: c.id, section: c.section, body: c.body, author: c.author, createdAt: c.created_at, snapshotId: c.snapshot_id })),
  });
}, operations.listComments);

export const POST = withAuth<{ caseId: string }, typeof operations.addComment.body>(async ({ member, params, body }) => {
  // The change and its audit entry commit together or not at all.
  const made = await db.transaction().execute(async (trx) => {
    const made = await addComment(trx, { orgId: member.orgId, caseId: params.caseId, authorId: member.userId, section: body.section, body: body.body });
    if (!made) throw missingCase();
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.comment',
      subjectType: 'case',
      subjectId: params.caseId,
      detail: { section: body.section },
    });
    return made;
  });
  return NextResponse.json(
    { comment: { id: made.id, section: made.section, body: made.body, author: member.name, createdAt: made.created_at } },
    { status: 201 },
  );
}, operations.addComment);
