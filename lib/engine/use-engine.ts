'use client';

/**
 * Runs the engine in a Web Worker for the page, latest request wins: while one computation
 * runs, newer requests replace any waiting one, so a burst of keystrokes costs one or two
 * valuations, never a queue. The worker is started once per page and ended with it.
 */
import { useEffect, useRef, useState } from 'react';
import type { ModelIssue, NodeExplanation, NodeRef, ValuationResult, ValueOptions } from '@/lattice';
import type { EngineRequest } from './browser-worker';

type Answer = { id: number; ok: true; result: unknown } | { id: number; ok: false; issues: ModelIssue[] };
type Pending = { request: EngineRequest; resolve: (answer: Answer) => void };
type DistributiveOmitId<T> = T extends unknown ? Omit<T, 'id'> : never;

class EngineClient {
  private worker: Worker | null = null;
  private busy: Pending | null = null;
  private waiting: Pending | null = null;
  private nextId = 1;

  private start(): Worker {
    if (this.worker) return this.worker;
    const worker = new Worker(new URL('./browser-worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (event: MessageEvent<Answer>) => {
      const done = this.busy;
      this.busy = null;
      done?.resolve(event.data);
      this.pump();
    };
    this.worker = worker;
    return worker;
  }

  private pump() {
    if (this.busy || !this.waiting) return;
    this.busy = this.waiting;
    this.waiting = null;
    this.start().postMessage(this.busy.request);
  }

  /** Resolves with the answer, or with null when a newer request of the same lane replaced it before it ran. */
  send(request: DistributiveOmitId<EngineRequest>): Promise<Answer | null> {
    return new Promise((resolve) => {
      this.waiting?.resolve(null as never);
      this.waiting = { request: { ...request, id: this.nextId++ } as EngineRequest, resolve: resolve as (a: Answer) => void };
      this.pump();
    });
  }

  stop() {
    this.worker?.terminate();
    this.worker = null;
  }
}

export interface EngineState<T> {
  result: T | null;
  issues: ModelIssue[] | null;
  computing: boolean;
}

type Job = { kind: 'value'; model: unknown; options?: ValueOptions } | { kind: 'explain'; model: unknown; ref: NodeRef };

/**
 * Runs `job` in the page's own engine worker whenever its JSON changes (after `delay` ms of
 * quiet); `null` clears the answer. The last good answer stays on screen while the next is
 * computed.
 */
function useEngineJob<T>(job: Job | null, delay: number): EngineState<T> {
  const client = useRef<EngineClient | null>(null);
  const [answered, setAnswered] = useState<{ key: string | null; result: T | null; issues: ModelIssue[] | null }>({ key: null, result: null, issues: null });
  const key = job === null ? null : JSON.stringify(job);
  useEffect(() => {
    const own = new EngineClient();
    client.current = own;
    return () => own.stop();
  }, []);
  useEffect(() => {
    if (key === null) return;
    let live = true;
    const timer = setTimeout(async () => {
      const answer = await client.current!.send(JSON.parse(key) as Job);
      if (!live || answer === null) return;
      setAnswered(answer.ok ? { key, result: answer.result as T, issues: null } : { key, result: null, issues: answer.issues });
    }, delay);
    return () => {
      live = false;
      clearTimeout(timer);
    };
  }, [key, delay]);
  if (key === null) return { result: null, issues: null, computing: false };
  return { result: answered.result, issues: answered.issues, computing: answered.key !== key };
}

/** Values `model` with the engine (debounced while the user types); `null` clears the result. */
export function useValuation(model: unknown | null, options: ValueOptions, delay = 200): EngineState<ValuationResult> {
  return useEngineJob<ValuationResult>(model === null ? null : { kind: 'value', model, options }, delay);
}

/** Explains one node with the engine's explainNode, in a worker of its own so a valuation does not hold it up. */
export function useNodeExplanation(model: unknown | null, ref: NodeRef | null): EngineState<NodeExplanation> {
  return useEngineJob<NodeExplanation>(model === null || ref === null ? null : { kind: 'explain', model, ref }, 0);
}
