/** Portfolio re-valuation requests (migrations/0010): one running per organisation, counted as they go. */
import type { Database } from '../index';

export async function findRunningRevaluation(db: Database, { orgId }: { orgId: string }) {
  return db.selectFrom('portfolio_revaluation').select('id').where('organization_id', '=', orgId).where('status', '=', 'running').executeTakeFirst();
}

export async function insertRevaluation(db: Database, { orgId, userId }: { orgId: string; userId: string }): Promise<string> {
  const row = await db.insertInto('portfolio_revaluation').values({ organization_id: orgId, requested_by: userId }).returning('id').executeTakeFirstOrThrow();
  return row.id;
}

export async function findRevaluation(db: Database, { orgId, id }: { orgId: string; id: string }) {
  return db.selectFrom('portfolio_revaluation').selectAll().where('organization_id', '=', orgId).where('id', '=', id).executeTakeFirst();
}

/** The job's own reading of its request's status (no organisation: the job was queued by the app). */
export async function revaluationStatus(db: Database, { id }: { id: string }) {
  return (await db.selectFrom('portfolio_revaluation').select('status').where('id', '=', id).executeTakeFirst())?.status;
}

export async function countRevaluation(db: Database, { id, total, done, failed }: { id: string; total?: number; done: number; failed: number }) {
  await db
    .updateTable('portfolio_revaluation')
    .set({ ...(total === undefined ? {} : { total }), done, failed })
    .where('id', '=', id)
    .execute();
}

/** Ends a running request: done, or failed with the reason. */
export async function finishRevaluation(db: Database, { id, error }: { id: string; error?: string }) {
  await db
    .updateTable('portfolio_revaluation')
    .set(error ? { status: 'failed', error, finished_at: new Date() } : { status: 'done', finished_at: new Date() })
    .where('id', '=', id)
    .where('status', '=', 'running')
    .execute();
}
