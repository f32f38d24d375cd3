/** The review discussion of a case: read by every member, written with its audit entry in one transaction. */
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { addComment, listComments } from '@/db/queries/reviews';
import { missingCase, requireCase } from '../cases/require-case';
import type { Member } from '../dal';

export async function readComments(member: Member, caseId: string) {
  await requireCase(db, member.orgId, caseId);
  return listComments(db, { orgId: member.orgId, caseId });
}

export async function commentOnCase(member: Member, caseId: string, comment: { section: string; body: string }) {
  return db.transaction().execute(async (trx) => {
    const made = await addComment(trx, { orgId: member.orgId, caseId, authorId: member.userId, section: comment.section, body: comment.body });
    if (!made) throw missingCase();
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.comment',
      subjectType: 'case',
      subjectId: caseId,
      detail: { section: comment.section },
    });
    return made;
  });
}
