/**
 * Values a stored case and keeps the run, with its audit entry in the same transaction: what
 * "Value case" does, and what a portfolio re-valuation does for each case it takes.
 */
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { recordValuationRun } from '@/db/queries/valuation-runs';
import type { Case } from '@/db/types';
import type { RunOptions } from './engine/pool';
import type { CaseInput } from './validations/case';
import { valueStoredCase } from './value-case';

export async function valueAndStore(stored: Case, actor: { orgId: string; userId: string }, run: RunOptions = {}) {
  const valuation = await valueStoredCase(stored, undefined, run);
  const { model, result, inputHash, resultHash } = valuation;
  const saved = await db.transaction().execute(async (trx) => {
    const saved = await recordValuationRun(trx, {
      orgId: actor.orgId,
      caseId: stored.id,
      caseVersion: stored.version,
      input: model,
      inputHash,
      result,
      resultHash,
      engineVersion: result.engineVersion,
      createdBy: actor.userId,
      volatilitySource: (stored.settings as CaseInput['settings']).volatilitySource ?? null,
    });
    await recordAudit(trx, {
      orgId: actor.orgId,
      actorId: actor.userId,
      action: 'case.value',
      subjectType: 'case',
      subjectId: stored.id,
      detail: {
        run: saved.id,
        name: stored.name,
        value: result.value,
        staticNpv: result.staticNpv,
        expandedNpv: result.expandedNpv,
        optionPremium: result.optionPremium,
      },
    });
    return saved;
  });
  return { ...valuation, run: saved };
}
