/**
 * A database outage is answered, not crashed through: with PostgreSQL stopped, health says
 * "degraded" (503) and an API call answers 503 with Retry-After within the pool's connection
 * timeout; started again, the same server serves the same session with no restart. The
 * project-local cluster is stopped and started with scripts/db.sh, as an operator would.
 */
import { execFileSync } from 'node:child_process';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeBrowser, signedInPage } from './support/browser';

let context: BrowserContext;
let page: Page;

const cluster = (command: 'start' | 'stop') => execFileSync('bash', ['scripts/db.sh', command], { stdio: 'pipe', timeout: 120_000 });

beforeAll(async () => {
  ({ context, page } = await signedInPage('analyst@kestrelbay.example'));
});

afterAll(async () => {
  cluster('start');
  await context.close();
  await closeBrowser();
});

describe('a database outage', () => {
  it('answers 503 while PostgreSQL is down and serves again when it is back, without a restart', async () => {
    expect((await page.request.get('/api/v1/projects')).status()).toBe(200);
    cluster('stop');
    try {
      const health = await page.request.get('/api/health', { timeout: 30_000 });
      expect(health.status()).toBe(503);
      expect((await health.json()).database).toBe('unreachable');
      const started = Date.now();
      const projects = await page.request.get('/api/v1/projects', { timeout: 30_000 });
      expect(projects.status()).toBe(503);
      expect(Number(projects.headers()['retry-after'])).toBeGreaterThan(0);
      expect((await projects.json()).error.code).toBe('unavailable');
      expect(Date.now() - started).toBeLessThan(15_000);
    } finally {
      cluster('start');
    }
    await expect.poll(async () => (await page.request.get('/api/v1/projects')).status(), { timeout: 30_000, interval: 500 }).toBe(200);
    expect((await page.request.get('/api/health')).status()).toBe(200);
  }, 120_000);
});
