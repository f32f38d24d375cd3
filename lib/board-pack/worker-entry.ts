/**
 * The board pack renderer inside a Node worker thread, so rendering never blocks a request's
 * event loop. Bundled by scripts/build-engine-worker.sh into .data/board-pack-worker.mjs.
 * Receives the pack's data, answers `{ ok: true, pdf }` or `{ ok: false, error }`.
 */
import { parentPort, workerData } from 'node:worker_threads';
import type { BoardPackData } from './data';
import { renderBoardPack } from './render';

renderBoardPack(workerData as BoardPackData).then(
  (pdf) => parentPort!.postMessage({ ok: true, pdf }),
  (error: unknown) => parentPort!.postMessage({ ok: false, error: String((error as Error)?.stack ?? error) }),
);
