/**
 * Board packs are rendered once per approved snapshot and page size, stored in PostgreSQL and
 * served from there: the same snapshot always gives the same bytes. Rendering runs in a worker
 * thread (.data/board-pack-worker.mjs), never on the request's event loop.
 */
import 'server-only';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { BoardPackData, PageSize } from './data';
import { boardPackData, findBoardPack, saveBoardPack } from './records';

const workerFile = () => path.join(/*turbopackIgnore: true*/ process.cwd(), '.data', 'board-pack-worker.mjs');

function renderInWorker(data: BoardPackData): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(workerFile(), { workerData: data });
    worker.once('message', (answer: { ok: true; pdf: Uint8Array } | { ok: false; error: string }) => {
      void worker.terminate();
      if (answer.ok) resolve(Buffer.from(answer.pdf));
      else reject(new Error(`board pack rendering failed: ${answer.error}`));
    });
    worker.once('error', reject);
  });
}

/** The stored pack for the snapshot and page size, rendering and storing it the first time. */
export async function ensureBoardPack(orgId: string, snapshotId: string, pageSize: PageSize): Promise<{ pdf: Buffer; sha256: string }> {
  const stored = await findBoardPack(orgId, snapshotId, pageSize);
  if (stored) return stored;
  const pdf = await renderInWorker(await boardPackData(orgId, snapshotId, pageSize));
  return saveBoardPack(orgId, snapshotId, pageSize, pdf);
}
