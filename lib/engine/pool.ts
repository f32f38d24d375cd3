/**
 * Runs valuations in worker threads, never on a request's event loop. A small pool (one worker
 * per spare core, at least one) takes jobs in order; a worker that crashes is replaced and its
 * job fails with a clear error. The worker is the bundled engine (.data/engine-worker.mjs,
 * built by scripts/build-engine-worker.sh with the app).
 */
import os from 'node:os';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { ModelIssue, ValuationResult, ValueOptions } from '@/lattice';

export class EngineRefusal extends Error {
  constructor(readonly issues: ModelIssue[]) {
    super(issues.map((i) => i.message).join('; '));
  }
}

interface Job {
  id: number;
  input: unknown;
  options?: ValueOptions;
  resolve: (result: ValuationResult) => void;
  reject: (error: Error) => void;
}

interface Slot {
  worker: Worker;
  job: Job | null;
}

type Answer = { id: number; ok: true; result: ValuationResult } | { id: number; ok: false; issues?: ModelIssue[]; crash?: string };

const workerFile = () => path.join(/*turbopackIgnore: true*/ process.cwd(), '.data', 'engine-worker.mjs');

class EnginePool {
  private readonly slots: Slot[] = [];
  private readonly queue: Job[] = [];
  private nextId = 1;
  private readonly size = Math.max(1, Math.min(4, os.availableParallelism() - 1));

  run(input: unknown, options?: ValueOptions): Promise<ValuationResult> {
    return new Promise((resolve, reject) => {
      this.queue.push({ id: this.nextId++, input, options, resolve, reject });
      this.dispatch();
    });
  }

  private dispatch() {
    while (this.queue.length > 0) {
      let slot = this.slots.find((s) => s.job === null);
      if (!slot && this.slots.length < this.size) slot = this.spawn();
      if (!slot) return;
      const job = this.queue.shift()!;
      slot.job = job;
      slot.worker.postMessage({ id: job.id, input: job.input, options: job.options });
    }
  }

  private spawn(): Slot {
    const worker = new Worker(workerFile());
    const slot: Slot = { worker, job: null };
    worker.on('message', (answer: Answer) => {
      const job = slot.job;
      slot.job = null;
      if (job && job.id === answer.id) {
        if (answer.ok) job.resolve(answer.result);
        else if (answer.issues) job.reject(new EngineRefusal(answer.issues));
        else job.reject(new Error(`the valuation failed: ${answer.crash}`));
      }
      this.dispatch();
    });
    const retire = (error: Error) => {
      const index = this.slots.indexOf(slot);
      if (index >= 0) this.slots.splice(index, 1);
      slot.job?.reject(error);
      slot.job = null;
      this.dispatch();
    };
    worker.on('error', (error) => retire(error));
    worker.on('exit', (code) => retire(new Error(`the valuation worker stopped (exit ${code})`)));
    worker.unref();
    this.slots.push(slot);
    return slot;
  }
}

declare global {
  var leewayEnginePool: EnginePool | undefined;
}

/** Values a model in a worker thread; a refused model rejects with EngineRefusal. */
export function valueInWorker(input: unknown, options?: ValueOptions): Promise<ValuationResult> {
  globalThis.leewayEnginePool ??= new EnginePool();
  return globalThis.leewayEnginePool.run(input, options);
}
