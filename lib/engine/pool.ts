/**
 * Runs valuations in worker threads, never on a request's event loop, and cannot be wedged by
 * one request:
 * - one worker per core (at most eight), each taking one job at a time;
 * - a bounded queue in front: when it is full, or when one person already has their share of
 *   jobs waiting or running, a new job is refused at once (429 with Retry-After);
 * - every job has a deadline from the moment it is queued: one still waiting is dropped, one
 *   running has its worker replaced, and the caller gets a clear 503;
 * - a caller that goes away (its AbortSignal fires) cancels its job the same way;
 * - a slot is freed on every path: an answer, a failed post, a worker error or exit, a deadline,
 *   an abort.
 * The worker is the bundled engine (.data/engine-worker.mjs, built by
 * scripts/build-engine-worker.sh with the app); the engine itself refuses a model whose work is
 * over its budget before doing any (docs/engine.md §8).
 */
import os from 'node:os';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { ModelIssue, ValuationResult, ValueOptions } from '@/lattice';
import { hasBrand } from '../bundle-brand';
import { AppError, requestCancelled } from '../errors';

const refusalBrand: unique symbol = Symbol.for('leeway.EngineRefusal');

export class EngineRefusal extends Error {
  readonly [refusalBrand] = true;

  /** True for a refusal made by any bundle's copy of this module (lib/bundle-brand.ts). */
  static [Symbol.hasInstance](value: unknown): value is EngineRefusal {
    return hasBrand(value, refusalBrand);
  }

  constructor(readonly issues: ModelIssue[]) {
    super(issues.map((i) => i.message).join('; '));
  }
}

/** How long a valuation may take, queue included, before its caller gets a 503. */
const DEADLINE_MS = Number(process.env.ENGINE_DEADLINE_MS ?? 30_000);
/** Most jobs waiting for a worker; more are refused with 429. */
const QUEUE_LIMIT = Number(process.env.ENGINE_QUEUE_LIMIT ?? 32);
/** Most jobs one person may have waiting or running at once. */
const PER_OWNER_LIMIT = Number(process.env.ENGINE_PER_USER_LIMIT ?? 4);

export interface RunOptions {
  /** Who asked (a user id): their jobs are counted against PER_OWNER_LIMIT. */
  owner?: string;
  /** Fires when the caller has gone away: the job is dropped or its worker replaced. */
  signal?: AbortSignal;
  deadlineMs?: number;
  /** Filled in when the job is answered: time waiting for a worker and time inside the engine (Server-Timing). */
  timing?: { queueMs?: number; engineMs?: number };
}

interface Job {
  id: number;
  input: unknown;
  options?: ValueOptions;
  owner: string | undefined;
  queuedAt: number;
  timing?: RunOptions['timing'];
  settled: boolean;
  timer: NodeJS.Timeout;
  /** Answer the result as JSON text, serialised in the worker (for a route that only sends it on). */
  asJson: boolean;
  resolve: (result: ValuationResult | string) => void;
  reject: (error: Error) => void;
  detach: () => void;
}

interface Slot {
  worker: Worker;
  job: Job | null;
}

type Answer = { id: number; ok: true; result: ValuationResult | string; engineMs: number } | { id: number; ok: false; issues?: ModelIssue[]; crash?: string };

const workerFile = () => path.join(/*turbopackIgnore: true*/ process.cwd(), '.data', 'engine-worker.mjs');

export interface PoolStats {
  workers: number;
  busy: number;
  queued: number;
  queueLimit: number;
}

export class EnginePool {
  private readonly slots: Slot[] = [];
  private readonly queue: Job[] = [];
  private nextId = 1;
  readonly size = Math.max(1, Math.min(8, os.availableParallelism()));

  constructor(private readonly file = workerFile()) {}

  stats(): PoolStats {
    return { workers: this.slots.length, busy: this.slots.filter((s) => s.job).length, queued: this.queue.length, queueLimit: QUEUE_LIMIT };
  }

  run(input: unknown, options?: ValueOptions, run: RunOptions = {}): Promise<ValuationResult> {
    return this.enqueue(input, options, run, false) as Promise<ValuationResult>;
  }

  /**
   * The same, answered as JSON text serialised in the worker: a route that only sends the result
   * on spares its own thread the copy of a large object and its serialisation.
   */
  runAsJson(input: unknown, options?: ValueOptions, run: RunOptions = {}): Promise<string> {
    return this.enqueue(input, options, run, true) as Promise<string>;
  }

  private enqueue(input: unknown, options: ValueOptions | undefined, run: RunOptions, asJson: boolean): Promise<ValuationResult | string> {
    return new Promise((resolve, reject) => {
      if (run.signal?.aborted) return reject(requestCancelled());
      const waiting = this.queue.length;
      if (waiting >= QUEUE_LIMIT)
        return reject(new AppError('rate_limited', `The engine has ${waiting} valuations waiting; try again in a few seconds.`, undefined, 5));
      const mine = run.owner ? this.queue.filter((j) => j.owner === run.owner).length + this.slots.filter((s) => s.job?.owner === run.owner).length : 0;
      if (mine >= PER_OWNER_LIMIT)
        return reject(new AppError('rate_limited', `You already have ${mine} valuations running or waiting; wait for them to finish.`, undefined, 2));
      const id = this.nextId++;
      const onAbort = () => this.cancel(job, requestCancelled());
      const job: Job = {
        id,
        input,
        options,
        owner: run.owner,
        asJson,
        queuedAt: performance.now(),
        timing: run.timing,
        settled: false,
        timer: setTimeout(() => this.cancel(job, this.overDeadline(run.deadlineMs ?? DEADLINE_MS)), run.deadlineMs ?? DEADLINE_MS),
        resolve: (result) => this.settle(job, () => resolve(result)),
        reject: (error) => this.settle(job, () => reject(error)),
        detach: () => run.signal?.removeEventListener('abort', onAbort),
      };
      job.timer.unref();
      run.signal?.addEventListener('abort', onAbort, { once: true });
      this.queue.push(job);
      this.dispatch();
    });
  }

  private overDeadline(ms: number) {
    return new AppError(
      'unavailable',
      `The valuation did not finish within ${Math.round(ms / 1000)} s and was stopped; try fewer steps or fewer rights.`,
      undefined,
      5,
    );
  }

  private settle(job: Job, deliver: () => void) {
    if (job.settled) return;
    job.settled = true;
    clearTimeout(job.timer);
    job.detach();
    deliver();
  }

  /** Drops a waiting job, or stops the worker running it (a new one takes its place). */
  private cancel(job: Job, error: Error) {
    if (job.settled) return;
    const queued = this.queue.indexOf(job);
    if (queued >= 0) this.queue.splice(queued, 1);
    const slot = this.slots.find((s) => s.job === job);
    job.reject(error);
    if (slot) this.retire(slot, error);
  }

  private dispatch() {
    while (this.queue.length > 0) {
      let slot = this.slots.find((s) => s.job === null);
      if (!slot && this.slots.length < this.size) slot = this.spawn();
      if (!slot) return;
      const job = this.queue.shift()!;
      slot.job = job;
      if (job.timing) job.timing.queueMs = performance.now() - job.queuedAt;
      try {
        slot.worker.postMessage({ id: job.id, input: job.input, options: job.options, asJson: job.asJson });
      } catch (error) {
        // The input could not be sent (not cloneable, too deep): the job fails, the slot stays free.
        slot.job = null;
        job.reject(new AppError('unprocessable', `The model could not be handed to the engine: ${(error as Error).message}`));
      }
    }
  }

  private retire(slot: Slot, error: Error) {
    const index = this.slots.indexOf(slot);
    if (index < 0) return;
    this.slots.splice(index, 1);
    slot.job?.reject(error);
    slot.job = null;
    void slot.worker.terminate();
    this.dispatch();
  }

  private spawn(): Slot {
    const worker = new Worker(this.file);
    const slot: Slot = { worker, job: null };
    worker.on('message', (answer: Answer) => {
      const job = slot.job;
      slot.job = null;
      if (job && job.id === answer.id) {
        if (answer.ok) {
          if (job.timing) job.timing.engineMs = answer.engineMs;
          job.resolve(answer.result);
        } else if (answer.issues) job.reject(new EngineRefusal(answer.issues));
        else job.reject(new Error(`the valuation failed: ${answer.crash}`));
      }
      this.dispatch();
    });
    worker.on('error', (error) => this.retire(slot, error));
    worker.on('exit', (code) => this.retire(slot, new Error(`the valuation worker stopped (exit ${code})`)));
    worker.unref();
    this.slots.push(slot);
    return slot;
  }
}

declare global {
  var leewayEnginePool: EnginePool | undefined;
}

function pool(): EnginePool {
  globalThis.leewayEnginePool ??= new EnginePool();
  return globalThis.leewayEnginePool;
}

/** Values a model in a worker thread; a refused model rejects with EngineRefusal, a busy engine with a 429 or 503 AppError. */
export function valueInWorker(input: unknown, options?: ValueOptions, run?: RunOptions): Promise<ValuationResult> {
  return pool().run(input, options, run);
}

/** Values a model in a worker thread and answers the result as JSON text (see EnginePool.runAsJson). */
export function valueInWorkerAsJson(input: unknown, options?: ValueOptions, run?: RunOptions): Promise<string> {
  return pool().runAsJson(input, options, run);
}

export function enginePoolStats(): PoolStats {
  return pool().stats();
}
