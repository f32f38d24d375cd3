/** Monte Carlo volatility estimates (migrations/0005): the specification, progress, status and result. */
import type { Database } from '../index';

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

export async function findSimulation(db: Database, { orgId, id }: { orgId: string; id: string }) {
  return db.selectFrom('volatility_simulation').selectAll().where('organization_id', '=', orgId).where('id', '=', id).executeTakeFirst();
}
