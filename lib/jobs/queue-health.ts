/**
 * What the job queue looks like from the health check: jobs waiting, running and given up in the
 * last hour, and how long ago a worker last ran pg-boss's maintenance (every worker does, every
 * JOB_MAINTENANCE_SECONDS) — the sign that at least one worker is alive.
 */
import { sql } from 'kysely';
import { db } from '@/db';
import { QUEUES } from './queues';

export interface QueueHealth {
  waiting: number;
  running: number;
  failedLastHour: number;
  /** Seconds since a worker last ran maintenance; null when none ever has. */
  workerSeenSecondsAgo: number | null;
}

const names = Object.values(QUEUES);

export async function queueHealth(): Promise<QueueHealth> {
  const counts = await sql<{ waiting: number; running: number; failed: number }>`
    select count(*) filter (where state in ('created', 'retry'))::int as waiting,
           count(*) filter (where state = 'active')::int as running,
           count(*) filter (where state = 'failed' and completed_on > now() - interval '1 hour')::int as failed
    from pgboss.job where name in (${sql.join(names)})`.execute(db);
  const seen = await sql<{ ago: number | null }>`select extract(epoch from now() - maintained_on)::float8 as ago from pgboss.version`.execute(db);
  const row = counts.rows[0]!;
  const ago = seen.rows[0]?.ago;
  return { waiting: row.waiting, running: row.running, failedLastHour: row.failed, workerSeenSecondsAgo: ago == null ? null : Math.round(ago) };
}
