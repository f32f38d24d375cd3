/**
 * One request never stops the engine for others (issue 11's review findings, over HTTP):
 * health reports the database, a canary valuation and the queue; a model over the engine's
 * work budget is refused at once and a body nested 100,000 deep is refused before parsing,
 * while a small valuation still answers within 2 s; one person's burst gets 429 with
 * Retry-After beyond their share, and another person is still served.
 */
import type { APIRequestContext, BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deeplyNestedBody, smallModel, twelveRightsModel } from './support/abuse';
import { closeBrowser, newContext, signedInPage } from './support/browser';

const contexts: BrowserContext[] = [];
let analyst: APIRequestContext;
let viewer: APIRequestContext;

beforeAll(async () => {
  const a = await signedInPage('analyst@kestrelbay.example');
  const v = await signedInPage('executive@kestrelbay.example');
  contexts.push(a.context, v.context);
  analyst = a.page.request;
  viewer = v.page.request;
});

afterAll(async () => {
  for (const c of contexts) await c.close();
  await closeBrowser();
});

async function smallAnswersQuickly(who: APIRequestContext) {
  const started = Date.now();
  const answer = await who.post('/api/v1/valuations?extras=false', { data: smallModel });
  expect(answer.status()).toBe(200);
  expect(Date.now() - started).toBeLessThan(2_000);
}

describe('the engine under abuse', () => {
  it('health reports the database, the engine and the queue', async () => {
    const anonymous = await newContext();
    contexts.push(anonymous);
    const health = await anonymous.request.get('/api/health');
    expect(health.status()).toBe(200);
    const body = await health.json();
    expect([body.status, body.database, body.engine]).toEqual(['ok', 'ok', 'ok']);
    expect(body.queue.workers).toBeGreaterThanOrEqual(1);
    expect(health.headers()['cache-control']).toBe('no-store');
  });

  it('refuses twelve rights at 10,000 steps at once, and a small valuation still answers', async () => {
    const started = Date.now();
    const refused = await viewer.post('/api/v1/valuations', { data: twelveRightsModel });
    expect(refused.status()).toBe(422);
    expect((await refused.json()).error.message).toMatch(/over the budget/);
    expect(Date.now() - started).toBeLessThan(5_000);
    await smallAnswersQuickly(viewer);
  });

  it('refuses a body nested 100,000 deep before parsing it, and a small valuation still answers', async () => {
    const deep = await viewer.post('/api/v1/valuations', {
      headers: { 'content-type': 'application/json' },
      data: Buffer.from(deeplyNestedBody),
    });
    expect(deep.status()).toBe(400);
    await smallAnswersQuickly(viewer);
  });

  it("gives one person's burst 429 with Retry-After beyond their share, and serves another person", async () => {
    // About half a second each on this machine: all six arrive while the first four run or wait.
    const heavy = {
      ...smallModel,
      steps: 1500,
      options: [
        { kind: 'expand', factor: 0.5, cost: 40, window: { kind: 'american', from: 0, to: 3 } },
        { kind: 'contract', fraction: 0.3, savings: 25, window: { kind: 'american', from: 0, to: 3 } },
        { kind: 'abandon', salvage: 50, window: { kind: 'american', from: 0, to: 3 } },
      ],
    };
    const burst = await Promise.all(Array.from({ length: 6 }, () => analyst.post('/api/v1/valuations', { data: heavy, timeout: 120_000 })));
    const statuses = burst.map((r) => r.status()).sort();
    expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(2);
    expect(statuses.filter((s) => s !== 429).every((s) => s === 200)).toBe(true);
    const limited = burst.find((r) => r.status() === 429)!;
    expect(Number(limited.headers()['retry-after'])).toBeGreaterThan(0);
    await smallAnswersQuickly(viewer);
  });
});
