/**
 * pg-boss's own tables read for the health check (pg-boss 10's schema `pgboss`): how many of
 * the named queues' jobs wait, run and failed in the last hour, and when a worker last ran
 * maintenance.
 */
import { sql } from 'kysely';
import type { Database } from '../index';

export async function countQueueJobs(db: Database, { queues }: { queues: string[] }) {
  const counts = await sql<{ waiting: number; running: number; failed: number }>`
    select count(*) filter (where state in ('created', 'retry'))::int as waiting,
           count(*) filter (where state = 'active')::int as running,
           count(*) filter (where state = 'failed' and completed_on > now() - interval '1 hour')::int as failed
    from pgboss.job where name in (${sql.join(queues)})`.execute(db);
  return counts.rows[0]!;
}

/** Seconds since any worker last ran pg-boss's maintenance; null when none ever has. */
export async function secondsSinceMaintenance(db: Database): Promise<number | null> {
  const seen = await sql<{ ago: number | null }>`select extract(epoch from now() - maintained_on)::float8 as ago from pgboss.version`.execute(db);
  return seen.rows[0]?.ago ?? null;
}
