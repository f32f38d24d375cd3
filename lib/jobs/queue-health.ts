/**
 * What the job queue looks like from the health check: jobs waiting, running and given up in the
 * last hour, and how long ago a worker last ran pg-boss's maintenance (every worker does, every
 * JOB_MAINTENANCE_SECONDS) — the sign that at least one worker is alive.
 */
import { db } from '@/db';
import { countQueueJobs, secondsSinceMaintenance } from '@/db/queries/job-queue';
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
  const [row, ago] = await Promise.all([countQueueJobs(db, { queues: names }), secondsSinceMaintenance(db)]);
  return { waiting: row.waiting, running: row.running, failedLastHour: row.failed, workerSeenSecondsAgo: ago == null ? null : Math.round(ago) };
}
