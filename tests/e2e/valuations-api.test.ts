/**
 * The stateless valuation endpoint runs the engine in a worker thread and returns exactly what
 * `valueProject` returns for the same model; bad models get 422 naming the field.
 */
import { readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { valueProject } from '@/lattice';
import { closeBrowser, newContext, signedInPage } from './support/browser';

afterAll(closeBrowser);

const model = JSON.parse(readFileSync('lattice/examples/phased-plant.json', 'utf8'));

describe('POST /api/v1/valuations', () => {
  it('returns exactly what valueProject returns, with and without extras', async () => {
    const { context, page } = await signedInPage('executive@kestrelbay.example');
    const full = await page.request.post('/api/v1/valuations', { data: model });
    expect(full.status()).toBe(200);
    expect(await full.json()).toEqual(JSON.parse(JSON.stringify(valueProject(model))));
    const quick = await page.request.post('/api/v1/valuations?extras=false', { data: model });
    expect(await quick.json()).toEqual(JSON.parse(JSON.stringify(valueProject(model, { extras: false }))));
    await context.close();
  });

  it('answers a refused model with 422 naming the field, malformed JSON with 400, no session with 401', async () => {
    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    const bad = await page.request.post('/api/v1/valuations', { data: { ...model, underlying: { ...model.underlying, volatility: -0.2 } } });
    expect(bad.status()).toBe(422);
    const body = await bad.json();
    expect(body.error.message).toBe('underlying.volatility must be > 0, got -0.2');
    expect(body.error.fields['underlying.volatility']).toEqual(['underlying.volatility must be > 0, got -0.2']);
    const malformed = await page.request.post('/api/v1/valuations', { headers: { 'content-type': 'application/json' }, data: Buffer.from('{"steps": ') });
    expect(malformed.status()).toBe(400);
    await context.close();
    const anonymous = await newContext();
    expect((await anonymous.request.post('/api/v1/valuations', { data: model })).status()).toBe(401);
    await anonymous.close();
  });
});
