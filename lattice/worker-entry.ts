/**
 * The engine inside a Node worker thread: receives `{ id, input, options }`, answers
 * `{ id, ok: true, result, engineMs }` (the result as JSON text when `asJson` is set; the time
 * spent valuing, for Server-Timing) or
 * `{ id, ok: false, issues }` for a refused model. Bundled by
 * scripts/build-engine-worker.sh into one file the app's worker pool loads, so valuations never
 * run on a request's event loop.
 */
import { parentPort } from 'node:worker_threads';
import { ModelError, valueProject, type ValueOptions } from './index';

parentPort?.on('message', (message: { id: number; input: unknown; options?: ValueOptions; asJson?: boolean }) => {
  try {
    const started = performance.now();
    const result = valueProject(message.input, message.options);
    const engineMs = performance.now() - started;
    // As JSON text when asked: copying one string is cheaper for the app's thread than a large object.
    parentPort!.postMessage({ id: message.id, ok: true, result: message.asJson ? JSON.stringify(result) : result, engineMs });
  } catch (error) {
    if (error instanceof ModelError) parentPort!.postMessage({ id: message.id, ok: false, issues: error.issues });
    else parentPort!.postMessage({ id: message.id, ok: false, crash: String((error as Error)?.message ?? error) });
  }
});
