/**
 * The validation report's renderer inside a Node worker thread (bundled by
 * scripts/build-engine-worker.sh into .data/validation-report-worker.mjs); answers
 * `{ ok: true, pdf }` or `{ ok: false, error }` (../board-pack/pdf-thread.ts).
 */
import { parentPort, workerData } from 'node:worker_threads';
import type { ValidationReportData } from './data';
import { renderValidationReport } from './render';

renderValidationReport(workerData as ValidationReportData).then(
  (pdf) => parentPort!.postMessage({ ok: true, pdf }),
  (error: unknown) => parentPort!.postMessage({ ok: false, error: String((error as Error)?.stack ?? error) }),
);
