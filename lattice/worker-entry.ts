/**
 * The engine inside a Node worker thread: receives `{ id, input, options }`, answers
 * `{ id, ok: true, result, engineMs }` (the time spent valuing, for Server-Timing) or
 * `{ id, ok: false, issues }` for a refused model. Bundled by
 * scripts/build-engine-worker.sh into one file the app's worker pool loads, so valuations never
 * run on a request's event loop.
 */
import { parentPort } from 'node:worker_threads';
import { ModelError, valueProject, type ValueOptions } from './index';

parentPort?.on('message', (message: { id: number; input: unknown; options?: ValueOptions }) => {
  try {
    const started = performance.now();
    const result = valueProject(message.input, message.options);
    parentPort!.postMessage({ id: message.id, ok: true, result, engineMs: performance.now() - started });
  } catch (error) {
    if (error instanceof ModelError) parentPort!.postMessage({ id: message.id, ok: false, issues: error.issues });
    else parentPort!.postMessage({ id: message.id, ok: false, crash: String((error as Error)?.message ?? error) });
  }
});
