/**
 * `npm run worker`: one worker process for the job queues (lib/jobs/worker.ts). `npm start` runs
 * one beside the web server; more can run on other machines with the same DATABASE_URL.
 * SIGTERM or Ctrl-C: running simulations go back on the queue, other jobs get 7 s to finish, and
 * the process ends within 10 s.
 *
 * Bundled to .data/worker.mjs by scripts/build-engine-worker.sh; run as
 *   node .data/worker.mjs
 */
import { startWorker } from '@/lib/jobs/worker';

const worker = await startWorker();
console.log('› Leeway worker is taking jobs');

function stop() {
  setTimeout(() => process.exit(1), 10_000).unref();
  worker.stop(7_000).then(
    () => process.exit(0),
    (error) => {
      console.error('[leeway worker] stopping:', error);
      process.exit(1);
    },
  );
}
process.once('SIGTERM', stop);
process.once('SIGINT', stop);
