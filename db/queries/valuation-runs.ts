/** Stored valuation runs: the exact engine input, its hash, the result and who ran it. */
import type { Database } from '../index';
import type { Case, ValuationRun } from '../types';

export async function recordValuationRun(
  db: Database,
  args: {
    orgId: string;
    caseId: string;
    caseVersion: number;
    input: unknown;
    inputHash: string;
    result: unknown;
    /** lib/model-hash.ts hashResult(result). */
    resultHash: string;
    engineVersion: string;
    createdBy: string;
    /** How the case's volatility was obtained (method and the note that states its inputs). */
    volatilitySource?: { method: string; note: string } | null;
  },
): Promise<ValuationRun> {
  return db
    .insertInto('valuation_run')
    .values({
      organization_id: args.orgId,
      case_id: args.caseId,
      case_version: args.caseVersion,
      input: JSON.stringify(args.input),
      input_hash: args.inputHash,
      result: JSON.stringify(args.result),
      result_hash: args.resultHash,
      engine_version: args.engineVersion,
      created_by: args.createdBy,
      volatility_source: args.volatilitySource ? JSON.stringify(args.volatilitySource) : null,
    })
    .returningAll()
    .executeTakeFirstOrThrow();
}

export async function listValuationRuns(db: Database, { orgId, caseId }: { orgId: string; caseId: string }) {
  return db
    .selectFrom('valuation_run')
    .leftJoin('user', 'user.id', 'valuation_run.created_by')
    .select([
      'valuation_run.id',
      'valuation_run.case_version',
      'valuation_run.input_hash',
      'valuation_run.engine_version',
      'valuation_run.created_at',
      'valuation_run.result',
      'valuation_run.volatility_source',
      'valuation_run.result_hash',
      'user.name as created_by_name',
    ])
    .where('valuation_run.organization_id', '=', orgId)
    .where('valuation_run.case_id', '=', caseId)
    .orderBy('valuation_run.created_at', 'desc')
    .execute();
}

/** One stored run of a case, with the model it valued. */
export async function findValuationRun(db: Database, { orgId, caseId, runId }: { orgId: string; caseId: string; runId: string }) {
  return db
    .selectFrom('valuation_run')
    .select(['id', 'case_version', 'input', 'result', 'result_hash', 'engine_version', 'created_at'])
    .where('organization_id', '=', orgId)
    .where('case_id', '=', caseId)
    .where('id', '=', runId)
    .executeTakeFirst();
}

/** Cases of the organisation whose latest stored run was computed by an engine other than `engineVersion`. */
export async function listCasesValuedByOtherEngines(db: Database, { orgId, engineVersion }: { orgId: string; engineVersion: string }): Promise<Case[]> {
  const latest = db
    .selectFrom('valuation_run')
    .distinctOn('case_id')
    .select(['case_id', 'engine_version'])
    .where('organization_id', '=', orgId)
    .orderBy('case_id')
    .orderBy('created_at', 'desc')
    .as('latest');
  return db
    .selectFrom('case')
    .innerJoin(latest, 'latest.case_id', 'case.id')
    .selectAll('case')
    .where('case.organization_id', '=', orgId)
    .where('latest.engine_version', '<>', engineVersion)
    .orderBy('case.created_at')
    .execute();
}

/** Each listed case's newest run (any version: the row names its case version). */
export async function latestRunsOfCases(db: Database, { orgId, caseIds }: { orgId: string; caseIds: string[] }) {
  if (caseIds.length === 0) return [];
  return db
    .selectFrom('valuation_run')
    .select(['case_id', 'result', 'created_at', 'case_version', 'engine_version'])
    .distinctOn('case_id')
    .where('organization_id', '=', orgId)
    .where('case_id', 'in', caseIds)
    .orderBy('case_id')
    .orderBy('created_at', 'desc')
    .execute();
}
