/**
 * A valuation kept, in the caller's transaction: the run's row (what was valued, by which engine,
 * its result and both hashes) and the `case.value` audit entry. "Value case", a portfolio
 * re-valuation and the demo seed keep runs through here; a submission keeps its figures as a
 * run too (lib/review/record.ts), under its own audit entry.
 *
 * No 'server-only' guard here: the seed runs under plain Node, where that guard throws.
 */
import { recordAudit } from '@/db/queries/audit';
import { recordValuationRun } from '@/db/queries/valuation-runs';
import type { Database } from '@/db';
import type { Member } from '../dal';
import type { CaseValuation } from '../value-case';

/** Who keeps the run: the member's organisation and user (the demo seed passes its own). */
type Actor = Pick<Member, 'orgId' | 'userId'>;

type Kept = Omit<CaseValuation, 'warnings'>;

export async function recordRun(trx: Database, actor: Actor, stored: { id: string; version: number }, valuation: Kept) {
  return recordValuationRun(trx, {
    orgId: actor.orgId,
    caseId: stored.id,
    caseVersion: stored.version,
    input: valuation.model,
    inputHash: valuation.inputHash,
    result: valuation.result,
    resultHash: valuation.resultHash,
    engineVersion: valuation.result.engineVersion,
    createdBy: actor.userId,
    volatilitySource: valuation.inputs.settings.volatilitySource ?? null,
  });
}

export async function recordValuation(
  trx: Database,
  args: { actor: Actor; stored: { id: string; name: string; version: number }; valuation: Kept; /** now unless given (the seed's history) */ at?: Date },
) {
  const { actor, stored, valuation } = args;
  const run = await recordRun(trx, actor, stored, valuation);
  const { result } = valuation;
  await recordAudit(trx, {
    orgId: actor.orgId,
    actorId: actor.userId,
    at: args.at,
    action: 'case.value',
    subjectType: 'case',
    subjectId: stored.id,
    detail: {
      run: run.id,
      name: stored.name,
      value: result.value,
      staticNpv: result.staticNpv,
      expandedNpv: result.expandedNpv,
      optionPremium: result.optionPremium,
    },
  });
  return run;
}
