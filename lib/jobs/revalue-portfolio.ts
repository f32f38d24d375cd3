/**
 * A worker's side of re-valuing a portfolio: every case whose latest stored figures come from an
 * older engine is valued again with today's and the run kept (lib/store-valuation.ts), counted
 * on the request's row as it goes. A case the engine now refuses is counted as failed and the
 * rest go on. A second attempt (after a worker died) takes only the cases still stale; a request
 * the queue gave up on is marked failed (its dead-letter queue).
 */
import { db } from '@/db';
import { countRevaluation, finishRevaluation, revaluationStatus } from '@/db/queries/revaluations';
import { listCasesValuedByOtherEngines } from '@/db/queries/valuation-runs';
import { ENGINE_VERSION } from '@/lattice';
import { valueAndStore } from '../store-valuation';
import type { RevaluationJob } from './queues';

export async function revaluePortfolio(job: RevaluationJob): Promise<void> {
  const id = job.revaluationId;
  if ((await revaluationStatus(db, { id })) !== 'running') return;
  const stale = await listCasesValuedByOtherEngines(db, { orgId: job.orgId, engineVersion: ENGINE_VERSION });
  await countRevaluation(db, { id, total: stale.length, done: 0, failed: 0 });
  let failed = 0;
  for (const [k, stored] of stale.entries()) {
    try {
      await valueAndStore(stored, { orgId: job.orgId, userId: job.userId }, { owner: `revaluation:${id}` });
    } catch (error) {
      failed++;
      console.error(`[leeway worker] re-valuation ${id}: case ${stored.id} not valued:`, error instanceof Error ? error.message : error);
    }
    await countRevaluation(db, { id, done: k + 1, failed });
  }
  await finishRevaluation(db, { id });
}

/** Marks the request failed when the queue gave up on it. */
export async function markRevaluationGaveUp(job: RevaluationJob): Promise<void> {
  await finishRevaluation(db, { id: job.revaluationId, error: 'The worker running it stopped more than once; start it again.' });
}
