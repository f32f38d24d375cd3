/**
 * A worker's side of following decisions: checks one followed case and announces what changed
 * (lib/watch/alerts.ts), and once a day puts a check of every followed case on the queue, so the
 * passage of time alone (a window opening or about to close, the boundary moving) is noticed.
 */
import { db } from '@/db';
import { listAllFollowedCases } from '@/db/queries/observations';
import { checkFollowedCase } from '../watch/alerts';
import { enqueue } from './enqueue';
import { QUEUES, type WatchCheckJob } from './queues';

export async function checkWatch({ orgId, caseId }: WatchCheckJob): Promise<void> {
  await checkFollowedCase(orgId, caseId);
}

export async function checkEveryWatch(): Promise<void> {
  for (const { orgId, caseId } of await listAllFollowedCases(db)) await enqueue(QUEUES.watchCheck, { orgId, caseId });
}
