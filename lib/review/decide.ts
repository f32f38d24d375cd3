/**
 * Approve or return, the reviewer's two decisions: the status changes in a transaction that
 * locks the case (two reviewers at once: one wins, the other gets 409), the audit log records
 * who and when, and the analyst's e-mail is queued with them (an approval's after its board pack
 * is rendered and stored, on the job queue).
 */
import 'server-only';
import { db } from '@/db';
import { findUserEmail } from '@/db/queries/members';
import type { Member } from '../dal';
import { loadCaseRef, refOf } from './case-ref';
import { notifyDecided } from './notify';
import { recordDecision } from './record';

export async function decide(member: Member, caseId: string, action: 'approve' | 'return', reason?: string) {
  const ref = await loadCaseRef(member.orgId, caseId);
  // The decision, its audit entry and its e-mail commit together or not at all.
  return db.transaction().execute(async (trx) => {
    const snapshot = await recordDecision(trx, { actor: member, stored: ref, action, reason });
    const submitterEmail = snapshot.submitted_by ? await findUserEmail(trx, { userId: snapshot.submitted_by }) : null;
    await notifyDecided(trx, refOf(ref, (snapshot.result as { expandedNpv: number }).expandedNpv), {
      to: submitterEmail,
      decision: action === 'approve' ? 'approved' : 'returned',
      by: member.name,
      reason,
      snapshotId: snapshot.id,
    });
    return snapshot;
  });
}
