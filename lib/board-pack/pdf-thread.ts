/**
 * Renders a PDF in a worker thread (an entry bundled into .data/ by
 * scripts/build-engine-worker.sh), so rendering never blocks a request's event loop. The entry
 * answers `{ ok: true, pdf }` or `{ ok: false, error }`.
 */
import path from 'node:path';
import { Worker } from 'node:worker_threads';

export function renderPdfInThread(file: string, data: unknown): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(path.join(/*turbopackIgnore: true*/ process.cwd(), '.data', file), { workerData: data });
    worker.once('message', (answer: { ok: true; pdf: Uint8Array } | { ok: false; error: string }) => {
      void worker.terminate();
      if (answer.ok) resolve(Buffer.from(answer.pdf));
      else reject(new Error(`${file}: rendering failed: ${answer.error}`));
    });
    worker.once('error', reject);
  });
}
