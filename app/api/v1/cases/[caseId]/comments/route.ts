// GET /api/v1/cases/{id}/comments – the review discussion; POST – comment on a section of the case
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { commentOnCase, readComments } from '@/lib/review/comments';

export const dynamic = 'force-dynamic';

export const GET = withAuth<{ caseId: string }>(async ({ member, params }) => {
  const comments = await readComments(member, params.caseId);
  return NextResponse.json({
    comments: comments.map((c) => ({ id: c.id, section: c.section, body: c.body, author: c.author, createdAt: c.created_at, snapshotId: c.snapshot_id })),
  });
}, operations.listComments);

export const POST = withAuth<{ caseId: string }, typeof operations.addComment.body>(async ({ member, params, body }) => {
  const made = await commentOnCase(member, params.caseId, body);
  return NextResponse.json(
    { comment: { id: made.id, section: made.section, body: made.body, author: member.name, createdAt: made.created_at } },
    { status: 201 },
  );
}, operations.addComment);
