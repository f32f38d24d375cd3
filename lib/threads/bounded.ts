/**
 * Runs one task in a fresh worker thread with its own heap limit and a deadline, and at most
 * `atOnce` tasks of a kind in this process: one more waits for a place (up to `waitMs`, at most
 * `waiting` of them), and past that is refused (429 with Retry-After), so a download link
 * rarely meets a refusal and a burst never runs side by side.
 * Request-time threads use it: reading uploads (lib/uploads/read-in-thread.ts) and rendering
 * PDFs (lib/board-pack/pdf-thread.ts). Unbounded, 24 validation reports asked for at once by one
 * read-only member rendered side by side: the server grew from 0.3 to 1.7 GB and a small
 * valuation waited 1.6 s.
 */
import { Worker } from 'node:worker_threads';
import { AppError, requestCancelled } from '../errors';

export interface ThreadLimits {
  /** The bundled entry (an absolute path). */
  file: string;
  atOnce: number;
  /** How many may wait for a place, and for how long. */
  waiting: number;
  waitMs: number;
  deadlineMs: number;
  heapMb: number;
}

/** What the person is told when the bound, the deadline or the heap limit stops the task. */
export interface ThreadRefusals {
  busy: string;
  tooLong: () => AppError;
  tooLarge: () => AppError;
}

interface Places {
  running: number;
  /** Waiting tasks, first come first served; each is handed a place as one is given back. */
  queue: (() => void)[];
}

declare global {
  // One count per kind per process: Next.js may load this module more than once (lib/bundle-brand.ts).
  var leewayThreadPlaces: Map<string, Places> | undefined;
}

function placesOf(kind: string): Places {
  const all = (globalThis.leewayThreadPlaces ??= new Map());
  if (!all.has(kind)) all.set(kind, { running: 0, queue: [] });
  return all.get(kind)!;
}

async function takePlace(places: Places, limits: ThreadLimits, busy: () => AppError, signal?: AbortSignal): Promise<void> {
  if (signal?.aborted) throw requestCancelled();
  if (places.running < limits.atOnce) {
    places.running++;
    return;
  }
  if (places.queue.length >= limits.waiting) throw busy();
  await new Promise<void>((resolve, reject) => {
    const leave = (error: AppError) => {
      clearTimeout(timer);
      signal?.removeEventListener('abort', onAbort);
      places.queue.splice(places.queue.indexOf(handOver), 1);
      reject(error);
    };
    const handOver = () => {
      clearTimeout(timer);
      signal?.removeEventListener('abort', onAbort);
      resolve();
    };
    const onAbort = () => leave(requestCancelled());
    const timer = setTimeout(() => leave(busy()), limits.waitMs);
    signal?.addEventListener('abort', onAbort, { once: true });
    places.queue.push(handOver);
  });
}

/** Gives the place to the first waiting task, or back. */
function givePlace(places: Places) {
  const next = places.queue.shift();
  if (next) next();
  else places.running--;
}

function inThread(workerData: unknown, limits: ThreadLimits, refusals: ThreadRefusals, signal?: AbortSignal): Promise<unknown> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(limits.file, { workerData, resourceLimits: { maxOldGenerationSizeMb: limits.heapMb } });
    const onAbort = () => finish(() => reject(requestCancelled()));
    const finish = (settle: () => void) => {
      clearTimeout(deadline);
      signal?.removeEventListener('abort', onAbort);
      worker.removeAllListeners();
      // An 'error' with no listener would throw in this process: keep one while the thread stops.
      worker.on('error', () => undefined);
      void worker.terminate();
      settle();
    };
    const deadline = setTimeout(() => finish(() => reject(refusals.tooLong())), limits.deadlineMs);
    worker.once('message', (answer: unknown) => finish(() => resolve(answer)));
    worker.once('error', (error: Error & { code?: string }) => finish(() => reject(error.code === 'ERR_WORKER_OUT_OF_MEMORY' ? refusals.tooLarge() : error)));
    worker.once('exit', () => finish(() => reject(new Error(`${limits.file} stopped before answering`))));
    // A caller that goes away (a closed download) stops its thread and frees the place.
    signal?.addEventListener('abort', onAbort, { once: true });
    if (signal?.aborted) onAbort();
  });
}

/**
 * The thread's first message, once a place is free (see above). A caller whose `signal` fires
 * leaves the wait, or has its thread stopped, and is answered "cancelled".
 */
export async function inBoundedThread(
  kind: string,
  workerData: unknown,
  limits: ThreadLimits,
  refusals: ThreadRefusals,
  signal?: AbortSignal,
): Promise<unknown> {
  const places = placesOf(kind);
  await takePlace(places, limits, () => new AppError('rate_limited', refusals.busy, undefined, 3), signal);
  try {
    return await inThread(workerData, limits, refusals, signal);
  } finally {
    givePlace(places);
  }
}

/** Tasks of a kind running and waiting in this process (the tests read it). */
export function threadPlaces(kind: string): { running: number; waiting: number } {
  const places = placesOf(kind);
  return { running: places.running, waiting: places.queue.length };
}
