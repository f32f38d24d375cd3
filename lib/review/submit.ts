/**
 * Submitting a case for review: the saved case is valued (in the worker pool), then in one
 * transaction its snapshot is frozen with the analyst's recommendation, the figures are stored as
 * the case's latest run (so every list shows them beside its status), the audit entry is written
 * and the reviewers' e-mails are queued. The status is checked before the valuation and again
 * under the case's lock.
 */
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { submitCase } from '@/db/queries/reviews';
import { recordValuationRun } from '@/db/queries/valuation-runs';
import { AppError } from '../errors';
import { loadCaseRef, refOf } from './case-ref';
import { notifySubmitted } from './notify';
import { checkTransition } from './transitions';
import { valueStoredCase } from '../value-case';

import type { Member } from '../dal';

export async function submitForReview(member: Member, caseId: string, recommendation: string, signal?: AbortSignal) {
  const stored = await loadCaseRef(member.orgId, caseId);
  // Refuse early (before the valuation) when the status does not allow it; the transaction checks again.
  const early = checkTransition(member.role, 'submit', stored.status);
  if (!early.ok) throw new AppError(early.code, early.message);
  const valuation = await valueStoredCase(stored, undefined, { owner: member.userId, signal: signal });
  const snapshot = await db.transaction().execute(async (trx) => {
    const outcome = await submitCase(trx, {
      orgId: member.orgId,
      caseId: stored.id,
      allowed: (status) => checkTransition(member.role, 'submit', status),
      userId: member.userId,
      caseVersion: stored.version,
      frozen: {
        inputs: valuation.inputs,
        model: valuation.model,
        result: valuation.result,
        engineVersion: valuation.result.engineVersion,
        inputHash: valuation.inputHash,
      },
      recommendation,
    });
    if (!outcome.ok) throw new AppError(outcome.code, outcome.message);
    // The submitted figures are also the case's latest run, so every list shows them beside
    // its status, not an older version's.
    await recordValuationRun(trx, {
      orgId: member.orgId,
      caseId: stored.id,
      caseVersion: stored.version,
      input: valuation.model,
      inputHash: valuation.inputHash,
      result: valuation.result,
      resultHash: valuation.resultHash,
      engineVersion: valuation.result.engineVersion,
      createdBy: member.userId,
      volatilitySource: valuation.inputs.settings.volatilitySource ?? null,
    });
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.submit',
      subjectType: 'case',
      subjectId: stored.id,
      detail: { name: stored.name, snapshot: outcome.value.id, expandedNpv: valuation.result.expandedNpv },
    });
    await notifySubmitted(trx, refOf(stored, valuation.result.expandedNpv), member.name);
    return outcome.value;
  });
  return snapshot;
}
