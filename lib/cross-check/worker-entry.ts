/**
 * A cross-check inside a Node worker thread (bundled by scripts/build-engine-worker.sh into
 * .data/cross-check-worker.mjs): posts `{ progress }` about every 2 % of the work, then
 * `{ done: result }` or `{ failed: message }`. Cancelling is terminating the thread.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { ModelError } from '@/lattice';
import type { CrossCheckSpec } from './least-squares';
import { runCrossCheck } from './run';

const { model, spec } = workerData as { model: unknown; spec: CrossCheckSpec };
try {
  const result = runCrossCheck(model, spec, (progress) => parentPort!.postMessage({ progress }));
  parentPort!.postMessage({ done: result });
} catch (error) {
  const message =
    error instanceof ModelError ? `The model cannot be valued: ${error.issues[0]?.message}` : error instanceof Error ? error.message : String(error);
  parentPort!.postMessage({ failed: message });
}
