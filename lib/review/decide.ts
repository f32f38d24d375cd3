/**
 * Approve or return, the reviewer's two decisions: the status changes in a transaction that
 * locks the case (two reviewers at once: one wins, the other gets 409), the audit log records
 * who and when, and the analyst's e-mail is queued with them (an approval's after its board pack
 * is rendered and stored, on the job queue).
 */
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { decideCase } from '@/db/queries/reviews';
import type { Member } from '../dal';
import { AppError } from '../errors';
import { loadCaseRef, refOf } from './case-ref';
import { notifyDecided } from './notify';
import { checkTransition } from './transitions';

export async function decide(member: Member, caseId: string, action: 'approve' | 'return', reason?: string) {
  const ref = await loadCaseRef(member.orgId, caseId);
  // The decision, its audit entry and its e-mail commit together or not at all.
  const snapshot = await db.transaction().execute(async (trx) => {
    const outcome = await decideCase(trx, {
      orgId: member.orgId,
      caseId: ref.id,
      allowed: (status) => checkTransition(member.role, action, status),
      userId: member.userId,
      reason,
    });
    if (!outcome.ok) throw new AppError(outcome.code, outcome.message);
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: action === 'approve' ? 'case.approve' : 'case.return',
      subjectType: 'case',
      subjectId: ref.id,
      detail: { name: ref.name, snapshot: outcome.value.id, ...(reason ? { reason } : {}) },
    });
    const snapshot = outcome.value;
    const submitter = snapshot.submitted_by
      ? await trx.selectFrom('user').select('email').where('id', '=', snapshot.submitted_by).executeTakeFirst()
      : undefined;
    await notifyDecided(trx, refOf(ref, (snapshot.result as { expandedNpv: number }).expandedNpv), {
      to: submitter?.email ?? null,
      decision: action === 'approve' ? 'approved' : 'returned',
      by: member.name,
      reason,
      snapshotId: snapshot.id,
    });
    return snapshot;
  });
  return snapshot;
}
