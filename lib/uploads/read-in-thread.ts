/**
 * Uploaded workbooks and series are read in a worker thread (.data/upload-worker.mjs, from
 * lib/uploads/worker-entry.ts), never on the server's event loop: a workbook of 200,000 rows,
 * inside the upload limits and sendable by any member, took 7.6 s to read and needs more than
 * 512 MB of heap, and while it was read on that loop a small valuation waited 5.8 s. The thread
 * has its own heap limit and a deadline; at most two files are read at once, four more wait up to
 * 10 s, and past that an upload is told to try again (lib/threads/bounded.ts).
 */
import path from 'node:path';
import type { WorkbookRead } from '../spreadsheets/cash-flow-workbook';
import type { PlacedPoint } from '../volatility/read-series';
import { AppError } from '../errors';
import { inBoundedThread, type ThreadLimits } from '../threads/bounded';
import { HistoryError } from '../volatility/history';

export type UploadReader = 'cash-flows' | 'series-csv' | 'series-xlsx';
type Answer = { ok: true; value: unknown } | { ok: false; refusal: string } | { ok: false; error: string };

const defaults = (): ThreadLimits => ({
  file: path.join(/*turbopackIgnore: true*/ process.cwd(), '.data', 'upload-worker.mjs'),
  atOnce: 2,
  waiting: 4,
  waitMs: 10_000,
  deadlineMs: 20_000,
  // Enough for the most values a history may hold (100,000 rows, even with five more columns:
  // 4.6 s here; 256 MB was not).
  heapMb: 512,
});

const unreadable = (message: string, field: string) => new AppError('unprocessable', message, { file: [field] });
const refusals = {
  busy: 'Other files are being read right now; try again in a few seconds.',
  tooLong: () => unreadable('The file took too long to read; send a smaller one.', 'Took too long to read.'),
  tooLarge: () => unreadable('The file is too large to read; send only the rows and columns Leeway needs.', 'Too large to read.'),
};

/**
 * Reads an upload in a thread; a file the reader turns down rejects with a HistoryError. The
 * request's `signal` stops the read when the sender goes away.
 */
export async function readInThread(
  reader: UploadReader,
  bytes: Uint8Array,
  { limits = defaults(), signal }: { limits?: ThreadLimits; signal?: AbortSignal } = {},
): Promise<unknown> {
  const answer = (await inBoundedThread('upload', { reader, bytes }, limits, refusals, signal)) as Answer;
  if (answer.ok) return answer.value;
  if ('refusal' in answer) throw new HistoryError(answer.refusal);
  throw new Error(`upload reader: ${answer.error}`);
}

export const readCashFlowUpload = (bytes: Uint8Array, signal?: AbortSignal) => readInThread('cash-flows', bytes, { signal }) as Promise<WorkbookRead>;

/** Dated values from a CSV or XLSX; a file the reader turns down rejects with a HistoryError. */
export const readSeriesUpload = (kind: 'csv' | 'xlsx', bytes: Uint8Array, signal?: AbortSignal) =>
  readInThread(kind === 'csv' ? 'series-csv' : 'series-xlsx', bytes, { signal }) as Promise<PlacedPoint[]>;
