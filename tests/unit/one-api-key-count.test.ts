/**
 * One count of each API key's requests per process, however many times the module is loaded
 * (lib/api-keys/authenticate.ts). Next.js loads a module once for pages and once for route
 * handlers (lib/bundle-brand.ts): with a limiter per copy, a key would get its share of
 * requests a minute in each. vi.resetModules gives a second copy. No connection is opened.
 */
import { expect, it, vi } from 'vitest';

vi.mock('server-only', () => ({}));

it('a second copy of the API-key check counts against the first copy’s limiter', async () => {
  const first = await import('@/lib/api-keys/authenticate');
  vi.resetModules();
  const second = await import('@/lib/api-keys/authenticate');
  expect(second.authenticateApiKey).not.toBe(first.authenticateApiKey);
  expect(second.limiter).toBe(first.limiter);
  await first.limiter.consume('key-1', 3);
  expect((await second.limiter.get('key-1'))?.consumedPoints).toBe(3);
});
