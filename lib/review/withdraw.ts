/**
 * The submitter takes back a submission before a decision: the case is a draft again. The
 * withdrawal, its audit entry and the reviewers' e-mail commit together or not at all.
 */
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { withdrawSubmission } from '@/db/queries/reviews';
import type { Member } from '../dal';
import { AppError } from '../errors';
import { loadCaseRef, refOf } from './case-ref';
import { notifyWithdrawn } from './notify';
import { checkTransition } from './transitions';

export async function withdrawFromReview(member: Member, caseId: string) {
  const ref = await loadCaseRef(member.orgId, caseId);
  return db.transaction().execute(async (trx) => {
    const outcome = await withdrawSubmission(trx, {
      orgId: member.orgId,
      caseId: ref.id,
      allowed: (status) => checkTransition(member.role, 'withdraw', status),
      userId: member.userId,
    });
    if (!outcome.ok) throw new AppError(outcome.code, outcome.message);
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.withdraw',
      subjectType: 'case',
      subjectId: outcome.value.case_id,
      detail: { name: outcome.value.case_name, snapshot: outcome.value.id },
    });
    await notifyWithdrawn(trx, refOf(ref, (outcome.value.result as { expandedNpv: number }).expandedNpv), member.name);
    return outcome.value;
  });
}
