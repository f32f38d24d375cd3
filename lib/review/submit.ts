/**
 * Submitting a case for review: the saved case is valued (in the worker pool), then in one
 * transaction its snapshot is frozen with the analyst's recommendation, the figures are stored as
 * the case's latest run (so every list shows them beside its status), the audit entry is written
 * and the reviewers' e-mails are queued. The status is checked before the valuation and again
 * under the case's lock.
 */
import 'server-only';
import { db } from '@/db';
import { AppError } from '../errors';
import { loadCaseRef, refOf } from './case-ref';
import { notifySubmitted } from './notify';
import { recordSubmission } from './record';
import { checkTransition } from './transitions';
import { valueStoredCase } from '../value-case';
import type { Member } from '../dal';

export async function submitForReview(member: Member, caseId: string, recommendation: string, signal?: AbortSignal) {
  const stored = await loadCaseRef(member.orgId, caseId);
  // Refuse early (before the valuation) when the status does not allow it; the transaction checks again.
  const early = checkTransition(member.role, 'submit', stored.status);
  if (!early.ok) throw new AppError(early.code, early.message);
  const valuation = await valueStoredCase(stored, undefined, { owner: member.userId, signal });
  return db.transaction().execute(async (trx) => {
    const snapshot = await recordSubmission(trx, { actor: member, stored, valuation, recommendation });
    await notifySubmitted(trx, refOf(stored, valuation.result.expandedNpv), member.name);
    return snapshot;
  });
}
