/**
 * A worker's side of a Monte Carlo volatility estimate: the run happens in a thread
 * (.data/simulation-worker.mjs) so this process keeps answering the queue; progress goes to the
 * simulation's row about fifty times a run, and a row no longer `running` (cancelled from any
 * server) stops the thread at its next report. The outcome of the model itself (a result, or an
 * error in the inputs) is final; a thread that crashed, or a worker told to stop, throws so the
 * queue runs the job again (the seed makes the second attempt give the same answer).
 */
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import { db } from '@/db';
import type { SimulationResult } from '../volatility/monte-carlo';
import { SIMULATION_DEADLINE_SECONDS, type SimulationJob } from './queues';

const threadFile = () => path.join(process.cwd(), '.data', 'simulation-worker.mjs');
const running = new Set<Worker>();

async function finish(id: string, values: { status: 'done' | 'failed'; result?: SimulationResult; error?: string }) {
  await db
    .updateTable('volatility_simulation')
    .set({
      status: values.status,
      progress: values.status === 'done' ? 1 : undefined,
      result: values.result ? JSON.stringify(values.result) : null,
      error: values.error ?? null,
      finished_at: new Date(),
    })
    .where('id', '=', id)
    .where('status', '=', 'running')
    .execute();
}

/** Marks the run failed when the queue gave up on it (its dead-letter queue). */
export async function markSimulationGaveUp(job: SimulationJob) {
  await finish(job.simulationId, {
    status: 'failed',
    error: 'The worker running this estimate stopped more than once; start it again, perhaps with fewer paths.',
  });
}

type Outcome = { kind: 'done'; result: SimulationResult } | { kind: 'failed'; error: string } | { kind: 'cancelled' } | { kind: 'deadline' };

export async function runSimulation(job: SimulationJob): Promise<void> {
  const { simulationId: id } = job;
  // A new attempt starts from nothing; a row that is no longer running was cancelled while it waited.
  const claimed = await db
    .updateTable('volatility_simulation')
    .set({ progress: 0 })
    .where('id', '=', id)
    .where('status', '=', 'running')
    .returning('id')
    .executeTakeFirst();
  if (!claimed) return;

  const thread = new Worker(threadFile(), { workerData: { schedule: job.schedule, spec: job.spec } });
  running.add(thread);
  try {
    const outcome = await new Promise<Outcome>((resolve, reject) => {
      const deadline = setTimeout(() => resolve({ kind: 'deadline' }), SIMULATION_DEADLINE_SECONDS * 1000);
      const settle = (value: Outcome) => {
        clearTimeout(deadline);
        resolve(value);
      };
      thread.on('message', (message: { progress?: number; done?: SimulationResult; failed?: string }) => {
        if (message.done) return settle({ kind: 'done', result: message.done });
        if (message.failed) return settle({ kind: 'failed', error: message.failed });
        if (message.progress === undefined) return;
        db.updateTable('volatility_simulation')
          .set({ progress: message.progress })
          .where('id', '=', id)
          .where('status', '=', 'running')
          .returning('id')
          .executeTakeFirst()
          .then((updated) => updated || settle({ kind: 'cancelled' }))
          .catch((error) => console.error('[leeway worker] progress not written', id, error.message));
      });
      thread.once('error', (error) => {
        clearTimeout(deadline);
        reject(error);
      });
      // Terminated from outside (the worker is stopping) or crashed without a message.
      thread.once('exit', () => {
        clearTimeout(deadline);
        reject(new Error('the simulation thread stopped before it finished'));
      });
    });
    if (outcome.kind === 'done') await finish(id, { status: 'done', result: outcome.result });
    else if (outcome.kind === 'failed') await finish(id, { status: 'failed', error: outcome.error });
    else if (outcome.kind === 'deadline')
      await finish(id, { status: 'failed', error: `The estimate ran longer than ${SIMULATION_DEADLINE_SECONDS} s and was stopped; try fewer paths.` });
  } finally {
    running.delete(thread);
    thread.removeAllListeners('exit');
    await thread.terminate();
  }
}

/** Stops every run in this process (the worker is shutting down); their jobs go back on the queue. */
export async function stopAllSimulations() {
  await Promise.all([...running].map((thread) => thread.terminate()));
}
