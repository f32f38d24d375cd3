/**
 * Errors keep their meaning across Next.js's bundles (lib/bundle-brand.ts). vi.resetModules
 * gives a second copy of a module, as a page bundle and a route bundle hold in one process.
 * Without the brand, a running server answered 500 for a refused model and for a full queue
 * once a page (the portfolio's watch list) had made the engine pool.
 */
import { describe, expect, it, vi } from 'vitest';

async function twoCopies<T>(load: () => Promise<T>): Promise<[T, T]> {
  const first = await load();
  vi.resetModules();
  return [first, await load()];
}

describe('errors from another bundle', () => {
  it('an AppError from another copy keeps its status', async () => {
    const [pageCopy, routeCopy] = await twoCopies(() => import('@/lib/errors'));
    expect(routeCopy.AppError).not.toBe(pageCopy.AppError);
    const busy = new pageCopy.AppError('rate_limited', 'You already have 4 valuations running or waiting.', undefined, 2);
    expect(busy instanceof routeCopy.AppError).toBe(true);
    expect(routeCopy.toErrorBody(busy)).toMatchObject({ status: 429, retryAfter: 2, body: { error: { code: 'rate_limited' } } });
  });

  it('an engine refusal from another copy is still a refusal', async () => {
    const [pageCopy, routeCopy] = await twoCopies(() => import('@/lib/engine/pool'));
    expect(routeCopy.EngineRefusal).not.toBe(pageCopy.EngineRefusal);
    const refusal = new pageCopy.EngineRefusal([{ field: 'underlying.value', message: 'must be positive' }]);
    expect(refusal instanceof routeCopy.EngineRefusal).toBe(true);
  });

  it('other errors and look-alikes are not taken for them', async () => {
    const { AppError, toErrorBody } = await import('@/lib/errors');
    const { EngineRefusal } = await import('@/lib/engine/pool');
    const lookAlike = Object.assign(new Error('busy'), { name: 'AppError', code: 'rate_limited' });
    for (const value of [new Error('x'), lookAlike, null, undefined, 'AppError', { code: 'rate_limited' }]) {
      expect(value instanceof AppError).toBe(false);
      expect(value instanceof EngineRefusal).toBe(false);
    }
    expect(toErrorBody(lookAlike).status).toBe(500);
    expect(new AppError('bad_request', 'x') instanceof EngineRefusal).toBe(false);
  });
});
