/**
 * Organisations are isolated (another organisation's record is a 404), and bad input gets a
 * clear 4xx, never a 500: malformed JSON, invalid fields, no session, the wrong role, and
 * form field errors from the same zod schemas the server uses.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, newContext, signedInPage } from './support/browser';

let kestrelId = '';
let harrowId = '';

beforeAll(async () => {
  kestrelId = (await db.selectFrom('organization').select('id').where('slug', '=', 'kestrel-bay-materials').executeTakeFirstOrThrow()).id;
  harrowId = (await db.selectFrom('organization').select('id').where('slug', '=', 'harrow-fen-logistics').executeTakeFirstOrThrow()).id;
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('isolation between organisations', () => {
  it("a user of Harrow Fen gets 404 for Kestrel Bay's settings and 200 for their own", async () => {
    const { context, page } = await signedInPage('owner@harrowfen.example');
    const other = await page.request.get(`/api/v1/organisations/${kestrelId}/settings`);
    expect(other.status()).toBe(404);
    expect((await other.json()).error.code).toBe('not_found');
    const own = await page.request.get(`/api/v1/organisations/${harrowId}/settings`);
    expect(own.status()).toBe(200);
    expect((await own.json()).settings.currency).toBe('GBP');
    await page.goto('/settings');
    expect(await page.getByLabel('Currency').inputValue()).toBe('GBP');
    await context.close();
  });
});

describe('bad input', () => {
  it('answers 401 without a session, 403 for the wrong role', async () => {
    const anonymous = await newContext();
    expect((await anonymous.request.get('/api/v1/settings')).status()).toBe(401);
    await anonymous.close();
    const { context, page } = await signedInPage('executive@kestrelbay.example');
    const res = await page.request.patch('/api/v1/settings', { data: { currency: 'USD', riskFreeRate: 0.03, wacc: 0.08, fiscalYearStartMonth: 1 } });
    expect(res.status()).toBe(403);
    await context.close();
  });

  it('answers malformed JSON with 400 and invalid fields with 422 naming them', async () => {
    const { context, page } = await signedInPage('admin@kestrelbay.example');
    const malformed = await page.request.patch('/api/v1/settings', {
      headers: { 'content-type': 'application/json' },
      data: Buffer.from('{"currency": "EUR",'),
    });
    expect(malformed.status()).toBe(400);
    expect((await malformed.json()).error.message).toBe('The request body is not valid JSON.');
    const invalid = await page.request.patch('/api/v1/settings', { data: { currency: 'EURO', riskFreeRate: 3, wacc: 0.08, fiscalYearStartMonth: 1 } });
    expect(invalid.status()).toBe(422);
    expect(Object.keys((await invalid.json()).error.fields).sort()).toEqual(['currency', 'riskFreeRate']);
    const valid = await page.request.patch('/api/v1/settings', { data: { currency: 'EUR', riskFreeRate: 0.031, wacc: 0.085, fiscalYearStartMonth: 1 } });
    expect(valid.status()).toBe(200);
    const authGarbage = await page.request.post('/api/auth/sign-in/email', {
      headers: { 'content-type': 'application/json', origin: page.url().split('/').slice(0, 3).join('/') },
      data: Buffer.from('{not json'),
    });
    expect(authGarbage.status()).toBeGreaterThanOrEqual(400);
    expect(authGarbage.status()).toBeLessThan(500);
    await context.close();
  });

  it('the sign-up form shows field errors from the shared schema', async () => {
    const context = await newContext();
    const page = await context.newPage();
    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('A');
    await page.getByLabel('E-mail').fill('not-an-address');
    await page.getByLabel('Password').fill('short');
    await page.getByRole('button', { name: 'Create account' }).click();
    await expect.poll(() => page.getByText('Enter a valid e-mail address.').isVisible()).toBe(true);
    expect(await page.getByText('Use at least 10 characters.').isVisible()).toBe(true);
    expect(await page.getByText('Enter your name.').isVisible()).toBe(true);
    await context.close();
  });

  it('the invitation form shows field errors, and the settings form refuses an out-of-range rate', async () => {
    const { context, page } = await signedInPage('admin@kestrelbay.example');
    await page.goto('/settings/members');
    const form = page.getByRole('form', { name: 'Invite a member' });
    await form.getByLabel('E-mail').fill('nobody');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => form.getByText('Enter a valid e-mail address.').isVisible()).toBe(true);
    await page.goto('/settings');
    await page.getByLabel('WACC (% a year)').fill('75');
    await page.getByRole('button', { name: 'Save defaults' }).click();
    await expect.poll(() => page.getByText('Must be at most 50 %.').isVisible()).toBe(true);
    await context.close();
  });
});
