/**
 * A CPU-heavy job (a Monte Carlo volatility estimate, a cross-check) runs in a worker thread so
 * the worker process keeps answering the queue. The thread posts `{ progress }`, then `{ done }`
 * or `{ failed }`; `onProgress` writes the progress to the job's row and answers false when the
 * row is no longer running (cancelled from any server), which stops the thread. A thread that
 * crashed, or a worker told to stop, throws so the queue runs the job again (the jobs are
 * seeded, so a second attempt gives the same answer).
 */
import path from 'node:path';
import { Worker } from 'node:worker_threads';

export type ThreadOutcome<R> = { kind: 'done'; result: R } | { kind: 'failed'; error: string } | { kind: 'cancelled' } | { kind: 'deadline' };

const running = new Set<Worker>();

export async function runInThread<R>(args: {
  /** The bundled entry in .data/ (scripts/build-engine-worker.sh). */
  file: string;
  data: unknown;
  deadlineSeconds: number;
  onProgress: (progress: number) => Promise<boolean>;
}): Promise<ThreadOutcome<R>> {
  const thread = new Worker(path.join(process.cwd(), '.data', args.file), { workerData: args.data });
  running.add(thread);
  try {
    return await new Promise<ThreadOutcome<R>>((resolve, reject) => {
      const deadline = setTimeout(() => resolve({ kind: 'deadline' }), args.deadlineSeconds * 1000);
      const settle = (value: ThreadOutcome<R>) => {
        clearTimeout(deadline);
        resolve(value);
      };
      thread.on('message', (message: { progress?: number; done?: R; failed?: string }) => {
        if (message.done) return settle({ kind: 'done', result: message.done });
        if (message.failed) return settle({ kind: 'failed', error: message.failed });
        if (message.progress === undefined) return;
        args
          .onProgress(message.progress)
          .then((stillRunning) => stillRunning || settle({ kind: 'cancelled' }))
          .catch((error) => console.error('[leeway worker] progress not written', args.file, error.message));
      });
      thread.once('error', (error) => {
        clearTimeout(deadline);
        reject(error);
      });
      // Terminated from outside (the worker is stopping) or crashed without a message.
      thread.once('exit', () => {
        clearTimeout(deadline);
        reject(new Error('the thread stopped before it finished'));
      });
    });
  } finally {
    running.delete(thread);
    thread.removeAllListeners('exit');
    await thread.terminate();
  }
}

/** Stops every thread of this process (the worker is shutting down); their jobs go back on the queue. */
export async function stopAllThreads() {
  await Promise.all([...running].map((thread) => thread.terminate()));
}
