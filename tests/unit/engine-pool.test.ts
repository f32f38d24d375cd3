/**
 * The engine pool frees its slot on every failure path and cannot be wedged by one job
 * (lib/engine/pool.ts). A stand-in worker written here answers, hangs, exits or fails on
 * demand, so each path is exercised without the engine: after every failure a plain job still
 * answers. The review's wedge: a job whose post threw kept its slot forever.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { EnginePool } from '@/lib/engine/pool';
import { AppError } from '@/lib/errors';

const file = path.join(mkdtempSync(path.join(tmpdir(), 'leeway-pool-')), 'worker.mjs');
writeFileSync(
  file,
  `import { parentPort } from 'node:worker_threads';
parentPort.on('message', ({ id, input, asJson }) => {
  if (input === 'hang') for (;;) {}
  if (input === 'exit') process.exit(3);
  if (input === 'crash') throw new Error('boom');
  const result = { echo: input };
  parentPort.postMessage({ id, ok: true, result: asJson ? JSON.stringify(result) : result, engineMs: 12.5 });
});
`,
);

// Workers are unref'd; the hanging ones are stopped by the tests themselves.
const newPool = () => new EnginePool(file);

const answers = async (pool: EnginePool) => expect(await pool.run('ping')).toEqual({ echo: 'ping' });

describe('the engine pool', () => {
  it('answers a plain job, and passes on the time the worker says it spent (Server-Timing)', async () => {
    await answers(newPool());
    const timing: { queueMs?: number; engineMs?: number } = {};
    await newPool().run('ping', undefined, { timing });
    expect(timing.engineMs).toBe(12.5);
    expect(timing.queueMs).toBeGreaterThanOrEqual(0);
  });

  it('answers JSON text when asked, for a route that only sends the result on', async () => {
    expect(JSON.parse(await newPool().runAsJson('ping'))).toEqual({ echo: 'ping' });
  });

  it('frees the slot when the input cannot be posted, and says why (422)', async () => {
    const pool = newPool();
    const failure = await pool.run({ f: () => 1 }).catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(AppError);
    expect((failure as AppError).code).toBe('unprocessable');
    for (let k = 0; k < pool.size + 1; k++) await answers(pool);
    expect(pool.stats().busy).toBe(0);
  });

  it('replaces a worker that exits or crashes mid-job, failing only that job', async () => {
    const pool = newPool();
    await expect(pool.run('exit')).rejects.toThrow(/stopped \(exit 3\)/);
    await expect(pool.run('crash')).rejects.toThrow(/boom/);
    await answers(pool);
  });

  it('stops a job at its deadline with a 503, replacing its worker, and keeps serving', async () => {
    const pool = newPool();
    const started = Date.now();
    const failure = (await pool.run('hang', undefined, { deadlineMs: 300 }).catch((e: unknown) => e)) as AppError;
    expect([failure.code, failure.retryAfter]).toEqual(['unavailable', 5]);
    expect(Date.now() - started).toBeLessThan(5_000);
    await answers(pool);
    expect(pool.stats().busy).toBe(0);
  });

  it('cancels a running and a waiting job when their callers go away', async () => {
    const pool = newPool();
    const controllers = Array.from({ length: pool.size + 1 }, () => new AbortController());
    const jobs = controllers.map((c) => pool.run('hang', undefined, { signal: c.signal, deadlineMs: 60_000 }).catch((e: unknown) => e));
    await new Promise((r) => setTimeout(r, 100));
    expect(pool.stats().queued).toBe(1);
    for (const c of controllers) c.abort();
    for (const failure of await Promise.all(jobs)) expect((failure as AppError).message).toBe('The request was cancelled.');
    expect(pool.stats().queued).toBe(0);
    await answers(pool);
  });

  it('refuses with 429 and Retry-After when one person already has four jobs, and serves others', async () => {
    const pool = newPool();
    const controller = new AbortController();
    const held = Array.from({ length: 4 }, () => pool.run('hang', undefined, { owner: 'a', signal: controller.signal, deadlineMs: 60_000 }).catch(() => null));
    const refused = (await pool.run('ping', undefined, { owner: 'a' }).catch((e: unknown) => e)) as AppError;
    expect([refused.code, refused.retryAfter]).toEqual(['rate_limited', 2]);
    controller.abort();
    await Promise.all(held);
    expect(await pool.run('ping', undefined, { owner: 'b' })).toEqual({ echo: 'ping' });
  });

  it('refuses with 429 when the queue is full', async () => {
    const pool = newPool();
    const controller = new AbortController();
    const limit = pool.stats().queueLimit;
    const held = Array.from({ length: pool.size + limit }, () =>
      pool.run('hang', undefined, { signal: controller.signal, deadlineMs: 60_000 }).catch(() => null),
    );
    const refused = (await pool.run('ping').catch((e: unknown) => e)) as AppError;
    expect([refused.code, refused.retryAfter]).toEqual(['rate_limited', 5]);
    controller.abort();
    await Promise.all(held);
    await answers(pool);
  });
});
