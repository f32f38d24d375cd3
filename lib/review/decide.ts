/**
 * Approve or return, the reviewer's two decisions: the status changes in a transaction that
 * locks the case (two reviewers at once: one wins, the other gets 409), the audit log records
 * who and when, an approval renders and stores the board pack, and the analyst is e-mailed.
 */
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { decideCase } from '@/db/queries/reviews';
import { ensureBoardPack } from '../board-pack/store';
import type { Member } from '../dal';
import { AppError } from '../errors';
import { loadCaseRef, refOf } from './case-ref';
import { notifyDecided } from './notify';

export async function decide(member: Member, caseId: string, action: 'approve' | 'return', reason?: string) {
  const ref = await loadCaseRef(member.orgId, caseId);
  const outcome = await db
    .transaction()
    .execute((trx) => decideCase(trx, { orgId: member.orgId, caseId: ref.id, role: member.role, userId: member.userId, action, reason }));
  if (!outcome.ok) throw new AppError(outcome.code, outcome.message);
  const snapshot = outcome.value;
  const expandedNpv = (snapshot.result as { expandedNpv: number }).expandedNpv;
  await recordAudit(db, {
    orgId: member.orgId,
    actorId: member.userId,
    action: action === 'approve' ? 'case.approve' : 'case.return',
    subjectType: 'case',
    subjectId: ref.id,
    detail: { name: ref.name, snapshot: snapshot.id, ...(reason ? { reason } : {}) },
  });
  const pdf = action === 'approve' ? (await ensureBoardPack(member.orgId, snapshot.id, 'A4')).pdf : undefined;
  const submitter = snapshot.submitted_by ? await db.selectFrom('user').select('email').where('id', '=', snapshot.submitted_by).executeTakeFirst() : undefined;
  await notifyDecided(refOf(ref, expandedNpv), {
    to: submitter?.email ?? null,
    decision: action === 'approve' ? 'approved' : 'returned',
    by: member.name,
    reason,
    pdf,
  });
  return snapshot;
}
