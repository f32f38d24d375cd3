/**
 * One database pool per process, however many times the module is loaded (db/index.ts). Next.js
 * loads it once for pages and once for route handlers: with a pool per copy, a running server
 * held 20 connections where its pool allows 10. vi.resetModules gives a second copy, and the
 * production setting is the one that used to make a pool per copy. No connection is opened.
 */
import { afterEach, expect, it, vi } from 'vitest';

afterEach(() => vi.unstubAllEnvs());

it('a second copy of db/index in production shares the first copy’s pool', async () => {
  vi.stubEnv('NODE_ENV', 'production');
  const first = await import('@/db');
  vi.resetModules();
  const second = await import('@/db');
  expect(second.db).not.toBe(first.db);
  expect(second.pool).toBe(first.pool);
  expect(first.pool.options.max).toBe(10);
});
