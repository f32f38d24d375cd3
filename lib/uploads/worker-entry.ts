/**
 * Reads an uploaded file inside a Node worker thread (lib/uploads/read-in-thread.ts), so parsing
 * never holds a request's event loop. Bundled by scripts/build-engine-worker.sh into
 * .data/upload-worker.mjs. Answers `{ ok: true, value }`, `{ ok: false, refusal }` for a file the
 * reader turns down with a message for the person, or `{ ok: false, error }`.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { readCashFlowWorkbook } from '../spreadsheets/cash-flow-workbook';
import { HistoryError } from '../volatility/history';
import { readCsvSeries, readXlsxSeries } from '../volatility/read-series';
import type { UploadReader } from './read-in-thread';

const { reader, bytes } = workerData as { reader: UploadReader; bytes: Uint8Array };

async function read(): Promise<unknown> {
  if (reader === 'cash-flows') return readCashFlowWorkbook(bytes);
  if (reader === 'series-csv') return readCsvSeries(new TextDecoder().decode(bytes));
  return readXlsxSeries(bytes);
}

read().then(
  (value) => parentPort!.postMessage({ ok: true, value }),
  (error: unknown) =>
    parentPort!.postMessage(
      error instanceof HistoryError ? { ok: false, refusal: error.message } : { ok: false, error: String((error as Error)?.stack ?? error) },
    ),
);
