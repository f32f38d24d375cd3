/**
 * One run at a time, shared by every caller: callers while it runs get its promise instead of a
 * run each, and an answer `reusable` says may be kept is reused for `ms` after its run started.
 * For checks anyone may ask for often, such as the health check (no sign-in; two queries and a
 * valuation each), which keeps a healthy report for a second but reports a failed one only
 * while it is checked, so a recovery shows at once.
 */
export function sharedFor<T>(ms: number, run: () => Promise<T>, reusable: (answer: T) => boolean = () => true, now: () => number = Date.now): () => Promise<T> {
  let latest: { startedAt: number; answer: Promise<T>; settled: boolean; keep: boolean } | undefined;
  return () => {
    const current = latest && (!latest.settled || (latest.keep && now() - latest.startedAt < ms));
    if (!current) {
      const entry = { startedAt: now(), answer: run(), settled: false, keep: false };
      entry.answer.then(
        (answer) => Object.assign(entry, { settled: true, keep: reusable(answer) }),
        () => (entry.settled = true),
      );
      latest = entry;
    }
    return latest!.answer;
  };
}

declare global {
  // One map per process: Next.js may load this module more than once (lib/bundle-brand.ts).
  var leewaySharedRuns: Map<string, Promise<unknown>> | undefined;
}

/**
 * One run per key at a time in this process: a caller who comes while the key's run is going
 * gets that run's promise, its answer or its failure; nothing is kept once it settles. For work
 * that ends stored, such as rendering a board pack the first time: two downloads at once render
 * it once.
 */
export function sharedWhileRunning<T>(key: string, run: () => Promise<T>): Promise<T> {
  const runs = (globalThis.leewaySharedRuns ??= new Map());
  const going = runs.get(key) as Promise<T> | undefined;
  if (going) return going;
  const answer = run().finally(() => runs.delete(key));
  runs.set(key, answer);
  return answer;
}
