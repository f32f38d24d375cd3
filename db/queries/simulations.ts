/** Monte Carlo volatility estimates (migrations/0005): the specification, progress, status and result. */
import type { Database } from '../index';

export async function countRunningSimulations(db: Database, { orgId }: { orgId: string }): Promise<number> {
  const { running } = await db
    .selectFrom('volatility_simulation')
    .select((eb) => eb.fn.countAll<number>().as('running'))
    .where('organization_id', '=', orgId)
    .where('status', '=', 'running')
    .executeTakeFirstOrThrow();
  return Number(running);
}

export async function insertSimulation(
  db: Database,
  { orgId, caseId, spec, userId }: { orgId: string; caseId: string; spec: unknown; userId: string },
): Promise<string> {
  const row = await db
    .insertInto('volatility_simulation')
    .values({ organization_id: orgId, case_id: caseId, spec: JSON.stringify(spec), created_by: userId })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** Marks a running simulation cancelled; false when it had already ended. */
export async function markSimulationCancelled(db: Database, { orgId, id }: { orgId: string; id: string }): Promise<boolean> {
  const row = await db
    .updateTable('volatility_simulation')
    .set({ status: 'cancelled', finished_at: new Date() })
    .where('organization_id', '=', orgId)
    .where('id', '=', id)
    .where('status', '=', 'running')
    .returning('id')
    .executeTakeFirst();
  return !!row;
}

export async function findSimulation(db: Database, { orgId, id }: { orgId: string; id: string }) {
  return db.selectFrom('volatility_simulation').selectAll().where('organization_id', '=', orgId).where('id', '=', id).executeTakeFirst();
}

/** Writes progress; false when the row is no longer running (it was cancelled). */
export async function setSimulationProgress(db: Database, { id, progress }: { id: string; progress: number }): Promise<boolean> {
  const row = await db
    .updateTable('volatility_simulation')
    .set({ progress })
    .where('id', '=', id)
    .where('status', '=', 'running')
    .returning('id')
    .executeTakeFirst();
  return !!row;
}

export async function finishSimulation(
  db: Database,
  { id, status, result, error }: { id: string; status: 'done' | 'failed'; result?: unknown; error?: string },
) {
  await db
    .updateTable('volatility_simulation')
    .set({
      status,
      progress: status === 'done' ? 1 : undefined,
      result: result === undefined ? null : JSON.stringify(result),
      error: error ?? null,
      finished_at: new Date(),
    })
    .where('id', '=', id)
    .where('status', '=', 'running')
    .execute();
}
