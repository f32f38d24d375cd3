/**
 * The rows that track a job the queue runs (a Monte Carlo volatility estimate, a cross-check):
 * the same columns and the same life (running → done, failed or cancelled), so one set of
 * queries serves both tables. The worker writes progress and the outcome only while the row is
 * still running, so a cancellation is never overwritten.
 */
import type { Database } from '../index';
import type { DB } from '../types';

export type JobRowTable = 'volatility_simulation' | 'cross_check';

type JobColumns = 'id' | 'organization_id' | 'status' | 'progress' | 'result' | 'error' | 'finished_at';
// The queries below are written against one table's types; both tables must keep these columns
// exactly alike (this line stops compiling when one drifts).
const alike: [Pick<DB['cross_check'], JobColumns>, Pick<DB['volatility_simulation'], JobColumns>] extends [
  Pick<DB['volatility_simulation'], JobColumns>,
  Pick<DB['cross_check'], JobColumns>,
]
  ? true
  : never = true;
void alike;

/** Either table, typed as one of them (their job columns are alike, checked above). */
const as = (table: JobRowTable) => table as 'cross_check';

export async function countRunningJobs(db: Database, table: JobRowTable, { orgId }: { orgId: string }): Promise<number> {
  const { running } = await db
    .selectFrom(as(table))
    .select((eb) => eb.fn.countAll<number>().as('running'))
    .where('organization_id', '=', orgId)
    .where('status', '=', 'running')
    .executeTakeFirstOrThrow();
  return Number(running);
}

/** Writes progress; false when the row is no longer running (it was cancelled). */
export async function setJobProgress(db: Database, table: JobRowTable, { id, progress }: { id: string; progress: number }): Promise<boolean> {
  const row = await db.updateTable(as(table)).set({ progress }).where('id', '=', id).where('status', '=', 'running').returning('id').executeTakeFirst();
  return !!row;
}

export async function finishJob(
  db: Database,
  table: JobRowTable,
  { id, status, result, error }: { id: string; status: 'done' | 'failed'; result?: unknown; error?: string },
): Promise<void> {
  await db
    .updateTable(as(table))
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

/** Marks a running job cancelled; false when it had already ended (or is another organisation's). */
export async function markJobCancelled(db: Database, table: JobRowTable, { orgId, id }: { orgId: string; id: string }): Promise<boolean> {
  const row = await db
    .updateTable(as(table))
    .set({ status: 'cancelled', finished_at: new Date() })
    .where('organization_id', '=', orgId)
    .where('id', '=', id)
    .where('status', '=', 'running')
    .returning('id')
    .executeTakeFirst();
  return !!row;
}
