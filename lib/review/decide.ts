/**
 * Approve or return, the reviewer's two decisions: the status changes in a transaction that
 * locks the case (two reviewers at once: one wins, the other gets 409), the audit log records
 * who and when, an approval renders and stores the board pack, and the analyst is e-mailed.
 */
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { decideCase } from '@/db/queries/reviews';
import { pageSizes } from '../board-pack/data';
import { ensureBoardPack } from '../board-pack/store';
import type { Member } from '../dal';
import { AppError } from '../errors';
import { loadCaseRef, refOf } from './case-ref';
import { notifyDecided } from './notify';

export async function decide(member: Member, caseId: string, action: 'approve' | 'return', reason?: string) {
  const ref = await loadCaseRef(member.orgId, caseId);
  // The decision and its audit entry commit together or not at all.
  const snapshot = await db.transaction().execute(async (trx) => {
    const outcome = await decideCase(trx, { orgId: member.orgId, caseId: ref.id, role: member.role, userId: member.userId, action, reason });
    if (!outcome.ok) throw new AppError(outcome.code, outcome.message);
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: action === 'approve' ? 'case.approve' : 'case.return',
      subjectType: 'case',
      subjectId: ref.id,
      detail: { name: ref.name, snapshot: outcome.value.id, ...(reason ? { reason } : {}) },
    });
    return outcome.value;
  });
  const expandedNpv = (snapshot.result as { expandedNpv: number }).expandedNpv;
  // Every page size is rendered now, from the snapshot alone, so the approval record never changes later.
  const packs = action === 'approve' ? await Promise.all(pageSizes.map((size) => ensureBoardPack(member.orgId, snapshot.id, size))) : undefined;
  const pdf = packs?.[0]?.pdf;
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
