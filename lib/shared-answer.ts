/**
 * One run at a time, its answer shared by every caller for `ms` after it started: callers
 * meanwhile get the same promise instead of a run each. For checks anyone may ask for often,
 * such as the health check, which needs no sign-in and costs two queries and a valuation.
 */
export function sharedFor<T>(ms: number, run: () => Promise<T>, now: () => number = Date.now): () => Promise<T> {
  let latest: { startedAt: number; answer: Promise<T> } | undefined;
  return () => {
    if (!latest || now() - latest.startedAt >= ms) latest = { startedAt: now(), answer: run() };
    return latest.answer;
  };
}
