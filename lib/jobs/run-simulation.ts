/**
 * A worker's side of a Monte Carlo volatility estimate: the run happens in a thread
 * (.data/simulation-worker.mjs, ./thread-job.ts); progress goes to the simulation's row about
 * fifty times a run. The outcome of the model itself (a result, or an error in the inputs) is
 * final; a thread that crashed, or a worker told to stop, throws so the queue runs it again.
 */
import { db } from '@/db';
import { finishJob, setJobProgress } from '@/db/queries/job-rows';
import type { SimulationResult } from '../volatility/monte-carlo';
import { SIMULATION_DEADLINE_SECONDS, type SimulationJob } from './queues';
import { runInThread } from './thread-job';

/** Marks the run failed when the queue gave up on it (its dead-letter queue). */
export async function markSimulationGaveUp(job: SimulationJob) {
  await finishJob(db, 'volatility_simulation', {
    id: job.simulationId,
    status: 'failed',
    error: 'The worker running this estimate stopped more than once; start it again, perhaps with fewer paths.',
  });
}

export async function runSimulation(job: SimulationJob): Promise<void> {
  const { simulationId: id } = job;
  // A new attempt starts from nothing; a row that is no longer running was cancelled while it waited.
  if (!(await setJobProgress(db, 'volatility_simulation', { id, progress: 0 }))) return;
  const outcome = await runInThread<SimulationResult>({
    file: 'simulation-worker.mjs',
    data: { schedule: job.schedule, spec: job.spec },
    deadlineSeconds: SIMULATION_DEADLINE_SECONDS,
    onProgress: (progress) => setJobProgress(db, 'volatility_simulation', { id, progress }),
  });
  if (outcome.kind === 'done') await finishJob(db, 'volatility_simulation', { id, status: 'done', result: outcome.result });
  else if (outcome.kind === 'failed') await finishJob(db, 'volatility_simulation', { id, status: 'failed', error: outcome.error });
  else if (outcome.kind === 'deadline')
    await finishJob(db, 'volatility_simulation', {
      id,
      status: 'failed',
      error: `The estimate ran longer than ${SIMULATION_DEADLINE_SECONDS} s and was stopped; try fewer paths.`,
    });
}
