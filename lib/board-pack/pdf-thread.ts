/**
 * Renders a PDF in a worker thread (an entry bundled into .data/ by
 * scripts/build-engine-worker.sh), so rendering never blocks a request's event loop: at most two
 * renders at once in a process, sixteen more waiting up to 30 s (so a burst of downloads mostly
 * waits rather than being told to try again), each with a heap limit and a deadline
 * (lib/threads/bounded.ts). The entry answers `{ ok: true, pdf }` or `{ ok: false, error }`.
 */
import path from 'node:path';
import { AppError } from '../errors';
import { inBoundedThread } from '../threads/bounded';

const refusals = {
  busy: 'Other documents are being rendered right now; try again in a few seconds.',
  tooLong: () => new AppError('unavailable', 'Rendering the document took too long; try again in a moment.', undefined, 10),
  tooLarge: () => new AppError('unavailable', 'The document needed more memory than a render may use.'),
};

/** The rendered PDF; a `signal` that fires (the download was closed) stops the render or its wait. */
export async function renderPdfInThread(file: string, data: unknown, signal?: AbortSignal): Promise<Buffer> {
  const limits = {
    file: path.join(/*turbopackIgnore: true*/ process.cwd(), '.data', file),
    atOnce: 2,
    waiting: 16,
    waitMs: 30_000,
    deadlineMs: 60_000,
    heapMb: 512,
  };
  const answer = (await inBoundedThread('pdf', data, limits, refusals, signal)) as { ok: true; pdf: Uint8Array } | { ok: false; error: string };
  if (answer.ok) return Buffer.from(answer.pdf);
  throw new Error(`${file}: rendering failed: ${answer.error}`);
}
