/** Cross-check rows (migrations/0015): what a job was asked to compare, its progress and result. */
import type { Database } from '../index';

export async function insertCrossCheck(
  db: Database,
  args: { orgId: string; caseId: string; caseVersion: number; engineVersion: string; model: unknown; paths: number; seed: number; userId: string },
): Promise<string> {
  const row = await db
    .insertInto('cross_check')
    .values({
      organization_id: args.orgId,
      case_id: args.caseId,
      case_version: args.caseVersion,
      engine_version: args.engineVersion,
      model: JSON.stringify(args.model),
      paths: args.paths,
      seed: args.seed,
      created_by: args.userId,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function findCrossCheck(db: Database, { orgId, caseId, id }: { orgId: string; caseId: string; id: string }) {
  return db.selectFrom('cross_check').selectAll().where('organization_id', '=', orgId).where('case_id', '=', caseId).where('id', '=', id).executeTakeFirst();
}

/** The job's own reading of its row (no organisation: the job was queued by the app). */
export async function findCrossCheckForJob(db: Database, { id }: { id: string }) {
  return db.selectFrom('cross_check').select(['id', 'model', 'paths', 'seed', 'status']).where('id', '=', id).executeTakeFirst();
}

/** A case's latest cross-checks, newest first. */
export async function listCrossChecks(db: Database, { orgId, caseId, limit }: { orgId: string; caseId: string; limit: number }) {
  return db
    .selectFrom('cross_check')
    .selectAll()
    .where('organization_id', '=', orgId)
    .where('case_id', '=', caseId)
    .orderBy('created_at', 'desc')
    .orderBy('id', 'desc')
    .limit(limit)
    .execute();
}
