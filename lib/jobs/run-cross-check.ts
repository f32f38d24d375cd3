/**
 * A worker's side of a cross-check: the lattice and the least-squares Monte Carlo run in a thread
 * (.data/cross-check-worker.mjs, ./thread-job.ts) on the model stored with the row. A refused
 * model or a result is final; a thread that crashed or a worker that stopped throws, so the queue
 * runs it again (seeded: the same answer).
 */
import { readStoredModel } from '@/lattice';
import { db } from '@/db';
import { findCrossCheckForJob } from '@/db/queries/cross-checks';
import { finishJob, setJobProgress } from '@/db/queries/job-rows';
import type { CrossCheckResult } from '../cross-check/run';
import { CROSS_CHECK_DEADLINE_SECONDS, type CrossCheckJob } from './queues';
import { runInThread } from './thread-job';

export async function markCrossCheckGaveUp(job: CrossCheckJob) {
  await finishJob(db, 'cross_check', {
    id: job.crossCheckId,
    status: 'failed',
    error: 'The worker running this cross-check stopped more than once; start it again, perhaps with fewer paths.',
  });
}

export async function runCrossCheckJob(job: CrossCheckJob): Promise<void> {
  const id = job.crossCheckId;
  const row = await findCrossCheckForJob(db, { id });
  // Cancelled while it waited, or gone with its case.
  if (!row || row.status !== 'running' || !(await setJobProgress(db, 'cross_check', { id, progress: 0 }))) return;
  const outcome = await runInThread<CrossCheckResult>({
    file: 'cross-check-worker.mjs',
    data: { model: readStoredModel(row.model), spec: { paths: row.paths, seed: row.seed } },
    deadlineSeconds: CROSS_CHECK_DEADLINE_SECONDS,
    onProgress: (progress) => setJobProgress(db, 'cross_check', { id, progress }),
  });
  if (outcome.kind === 'done') await finishJob(db, 'cross_check', { id, status: 'done', result: outcome.result });
  else if (outcome.kind === 'failed') await finishJob(db, 'cross_check', { id, status: 'failed', error: outcome.error });
  else if (outcome.kind === 'deadline')
    await finishJob(db, 'cross_check', {
      id,
      status: 'failed',
      error: `The cross-check ran longer than ${CROSS_CHECK_DEADLINE_SECONDS} s and was stopped; try fewer paths.`,
    });
}
