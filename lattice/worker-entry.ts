/**
 * The engine inside a Node worker thread: receives `{ id, input, options }`, answers
 * `{ id, ok: true, result }` or `{ id, ok: false, issues }` for a refused model. Bundled by
 * scripts/build-engine-worker.sh into one file the app's worker pool loads, so valuations never
 * run on a request's event loop.
 */
import { parentPort } from 'node:worker_threads';
import { ModelError, valueProject, type ValueOptions } from './index';

parentPort?.on('message', (message: { id: number; input: unknown; options?: ValueOptions }) => {
  try {
    parentPort!.postMessage({ id: message.id, ok: true, result: valueProject(message.input, message.options) });
  } catch (error) {
    if (error instanceof ModelError) parentPort!.postMessage({ id: message.id, ok: false, issues: error.issues });
    else parentPort!.postMessage({ id: message.id, ok: false, crash: String((error as Error)?.message ?? error) });
  }
});
