/**
 * Uploaded workbooks and series are read in a worker thread (.data/upload-worker.mjs, from
 * lib/uploads/worker-entry.ts), never on the server's event loop: a workbook of 200,000 rows,
 * inside the upload limits and sendable by any member, took 7.6 s to read and needs more than
 * 512 MB of heap, and while it was read on that loop a small valuation waited 5.8 s. The thread
 * has its own heap limit and a deadline; at most two files are read at once, and a third upload
 * is told to try again.
 */
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { WorkbookRead } from '../spreadsheets/cash-flow-workbook';
import type { PlacedPoint } from '../volatility/read-series';
import { AppError } from '../errors';
import { HistoryError } from '../volatility/history';

export type UploadReader = 'cash-flows' | 'series-csv' | 'series-xlsx';
type Answer = { ok: true; value: unknown } | { ok: false; refusal: string } | { ok: false; error: string };

/** How reading runs; tests give a stand-in worker file, a short deadline and a small heap. */
export interface ReadLimits {
  file: string;
  atOnce: number;
  deadlineMs: number;
  heapMb: number;
}

const defaults = (): ReadLimits => ({
  file: path.join(/*turbopackIgnore: true*/ process.cwd(), '.data', 'upload-worker.mjs'),
  atOnce: 2,
  deadlineMs: 20_000,
  // Enough for the most values a history may hold (100,000 rows, even with five more columns:
  // 4.6 s here; 256 MB was not).
  heapMb: 512,
});

declare global {
  // One count per process: Next.js may load this module more than once (lib/bundle-brand.ts).
  var leewayUploadsReading: number | undefined;
}

const unreadable = (message: string, field: string) => new AppError('unprocessable', message, { file: [field] });

function inThread(reader: UploadReader, bytes: Uint8Array, limits: ReadLimits): Promise<unknown> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(limits.file, { workerData: { reader, bytes }, resourceLimits: { maxOldGenerationSizeMb: limits.heapMb } });
    const finish = (settle: () => void) => {
      clearTimeout(deadline);
      worker.removeAllListeners();
      // An 'error' with no listener would throw in this process: keep one while the thread stops.
      worker.on('error', () => undefined);
      void worker.terminate();
      settle();
    };
    const deadline = setTimeout(
      () => finish(() => reject(unreadable('The file took too long to read; send a smaller one.', 'Took too long to read.'))),
      limits.deadlineMs,
    );
    worker.once('message', (answer: Answer) =>
      finish(() => {
        if (answer.ok) resolve(answer.value);
        else if ('refusal' in answer) reject(new HistoryError(answer.refusal));
        else reject(new Error(`upload reader: ${answer.error}`));
      }),
    );
    worker.once('error', (error: Error & { code?: string }) =>
      finish(() =>
        reject(
          error.code === 'ERR_WORKER_OUT_OF_MEMORY'
            ? unreadable('The file is too large to read; send only the rows and columns Leeway needs.', 'Too large to read.')
            : error,
        ),
      ),
    );
    worker.once('exit', () => finish(() => reject(new Error('upload reader stopped before answering'))));
  });
}

/** Reads an upload in a thread; refused with 429 while `atOnce` others are being read. */
export async function readInThread(reader: UploadReader, bytes: Uint8Array, limits: ReadLimits = defaults()): Promise<unknown> {
  const reading = globalThis.leewayUploadsReading ?? 0;
  if (reading >= limits.atOnce) throw new AppError('rate_limited', 'Other files are being read right now; try again in a few seconds.', undefined, 3);
  globalThis.leewayUploadsReading = reading + 1;
  try {
    return await inThread(reader, bytes, limits);
  } finally {
    globalThis.leewayUploadsReading = (globalThis.leewayUploadsReading ?? 1) - 1;
  }
}

export const readCashFlowUpload = (bytes: Uint8Array) => readInThread('cash-flows', bytes) as Promise<WorkbookRead>;

/** Dated values from a CSV or XLSX; a file the reader turns down rejects with a HistoryError. */
export const readSeriesUpload = (kind: 'csv' | 'xlsx', bytes: Uint8Array) =>
  readInThread(kind === 'csv' ? 'series-csv' : 'series-xlsx', bytes) as Promise<PlacedPoint[]>;
