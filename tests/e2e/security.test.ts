/**
 * Safe by default: each attack of the security review, reproduced against the built app, and now
 * refused. The e2e server stands in behind a reverse proxy on loopback (TRUSTED_PROXIES), so a
 * context with an X-Forwarded-For header is a visitor from another machine, and one without it is
 * a person at this machine.
 */
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, newContext, openBrowser, signedInPage, visitorAddress } from './support/browser';
import { demoCase } from './support/demo';
import { BASE_URL, DEMO_PASSWORD, E2E_MAIL_DIR } from './support/env';
import { firstLink, waitForMail } from './support/mail';

const contexts: BrowserContext[] = [];
afterAll(async () => {
  for (const c of contexts) await c.close();
  await closeBrowser();
  await db.destroy();
});

async function as(email: string) {
  const signed = await signedInPage(email);
  contexts.push(signed.context);
  return signed;
}

/** A context at this machine: no forwarded header, so the app sees a loopback client. */
async function localContext() {
  const context = await (await openBrowser()).newContext({ baseURL: BASE_URL, extraHTTPHeaders: { origin: BASE_URL } });
  contexts.push(context);
  return context;
}

const caseBody = {
  name: 'Four-eyes case',
  cashFlows: {
    wacc: 0.085,
    rows: [
      { year: 0, revenue: 0, operatingCost: 0, capex: 100, tax: 0, workingCapital: 0 },
      { year: 1, revenue: 80, operatingCost: 30, capex: 0, tax: 5, workingCapital: 0 },
      { year: 2, revenue: 85, operatingCost: 32, capex: 0, tax: 5, workingCapital: 0 },
    ],
  },
  settings: { volatility: 0.3, riskFreeRate: 0.03, steps: 40 },
  options: [{ kind: 'abandon', salvage: 60, window: { kind: 'american', from: 0, to: 2 } }],
};

describe('the auth secret', () => {
  it('is generated for a default install, private to its owner, and no published value', () => {
    const file = '.data/auth-secret';
    expect(statSync(file).mode & 0o077).toBe(0);
    expect(readFileSync(file, 'utf8').trim()).not.toMatch(/not-for-production/);
  });

  it('refuses to start with a published value on an address other machines can reach', async () => {
    const child = spawn(process.execPath, ['.data/serve.mjs'], {
      env: { ...process.env, HOST: '0.0.0.0', PORT: '3199', BETTER_AUTH_SECRET: 'leeway-local-development-secret-not-for-production' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    child.stdout.on('data', (d) => (output += d));
    child.stderr.on('data', (d) => (output += d));
    const code = await new Promise<number | null>((resolve) => {
      const timer = setTimeout(() => {
        child.kill('SIGKILL');
        resolve(null);
      }, 60_000);
      child.on('exit', (c) => {
        clearTimeout(timer);
        resolve(c);
      });
    });
    expect(output).toMatch(/refusing to start: BETTER_AUTH_SECRET is a published value/);
    expect(code).toBe(1);
  });
});

describe("the demo's published password", () => {
  it('opens no account on a server other machines can reach, and no one may choose it', async () => {
    const port = 3198;
    const url = `http://127.0.0.1:${port}`;
    const child = spawn(process.execPath, ['.data/serve.mjs'], {
      env: {
        ...process.env,
        HOST: '0.0.0.0',
        PORT: String(port),
        APP_URL: url,
        TRUSTED_PROXIES: '127.0.0.1',
        BETTER_AUTH_SECRET: randomBytes(32).toString('base64url'),
      },
      stdio: 'ignore',
    });
    try {
      await expect.poll(async () => (await fetch(`${url}/sign-in`).catch(() => null))?.status, { timeout: 60_000, interval: 500 }).toBe(200);
      const refused = await fetch(`${url}/api/auth/sign-in/email`, {
        method: 'POST',
        // Its own address for the per-address sign-in limit, as the browser contexts have.
        headers: { 'content-type': 'application/json', origin: url, 'x-forwarded-for': visitorAddress() },
        body: JSON.stringify({ email: 'analyst@kestrelbay.example', password: DEMO_PASSWORD }),
      });
      expect(refused.status).toBe(403);
      expect((await refused.json()).code).toBe('PUBLISHED_PASSWORD');
    } finally {
      child.kill('SIGKILL');
    }
    // The e2e server listens on loopback only: there every test signs in with it. Choosing it is refused.
    const visitor = await newContext();
    contexts.push(visitor);
    const chosen = await visitor.request.post('/api/auth/sign-up/email', {
      data: { name: 'Dana Demo', email: `published-${Date.now()}@example.test`, password: DEMO_PASSWORD },
    });
    expect(chosen.status()).toBe(400);
    expect((await chosen.json()).code).toBe('PUBLISHED_PASSWORD');
  }, 120_000);
});

describe('the local inbox', () => {
  it('answers 404 to a visitor from another machine, and shows mail to a person at this one', async () => {
    const remote = await newContext();
    contexts.push(remote);
    for (const path of ['/inbox', '/inbox/anything']) expect((await remote.request.get(path)).status()).toBe(404);
    const local = await localContext();
    const page = await local.newPage();
    const answer = await page.goto('/inbox');
    expect(answer?.status()).toBe(200);
    expect(await page.getByRole('heading', { name: 'Local inbox' }).isVisible()).toBe(true);
  });

  it('keeps each message, whose links sign people in, readable by this account only', async () => {
    // They were world-readable (0644 in a 0755 folder): any account on the machine could take a reset link.
    const address = `private-mail-${Date.now()}@example.test`;
    const visitor = await newContext();
    contexts.push(visitor);
    const signUp = await visitor.request.post('/api/auth/sign-up/email', {
      data: { name: 'Pat Private', email: address, password: 'quiet-harbour-lantern-71' },
    });
    expect(signUp.status()).toBe(200);
    await waitForMail(address, /Confirm your e-mail/);
    expect(statSync(E2E_MAIL_DIR).mode & 0o077).toBe(0);
    const names = readdirSync(E2E_MAIL_DIR);
    expect(names.length).toBeGreaterThan(0);
    for (const name of names) expect(statSync(path.join(E2E_MAIL_DIR, name)).mode & 0o077).toBe(0);
  });
});

describe('cross-site requests', () => {
  it('refuses a foreign or missing Origin with 403, and a body that is not JSON with 415', async () => {
    const { context, page } = await as('analyst@kestrelbay.example');
    const before = await db.selectFrom('project').select(db.fn.countAll<number>().as('n')).executeTakeFirstOrThrow();
    const foreign = await page.request.post('/api/v1/projects', { headers: { origin: 'http://127.0.0.1:9999' }, data: { name: 'Forged', description: '' } });
    expect(foreign.status()).toBe(403);
    const cookie = (await context.cookies()).map((c) => `${c.name}=${c.value}`).join('; ');
    const noOrigin = await fetch(`${BASE_URL}/api/v1/projects`, {
      method: 'POST',
      headers: { cookie, 'content-type': 'application/json' },
      body: JSON.stringify({ name: 'Forged', description: '' }),
    });
    expect(noOrigin.status).toBe(403);
    const plain = await page.request.post('/api/v1/projects', { headers: { 'content-type': 'text/plain' }, data: '{"name":"Forged","description":""}' });
    expect(plain.status()).toBe(415);
    const comment = await page.request.post(`/api/v1/cases/${(await demoCase('Cold-storage hub', 'Base case')).caseId}/comments`, {
      headers: { origin: 'http://localhost:9999' },
      data: { section: 'general', body: 'forged' },
    });
    expect(comment.status()).toBe(403);
    const after = await db.selectFrom('project').select(db.fn.countAll<number>().as('n')).executeTakeFirstOrThrow();
    expect(Number(after.n)).toBe(Number(before.n));
    // A server action from a foreign page: 403, not a 500.
    const action = await page.request.post('/settings', {
      headers: { origin: 'http://127.0.0.1:9999', 'next-action': 'abc', 'content-type': 'text/plain' },
      data: '[]',
    });
    expect(action.status()).toBe(403);
  });
});

describe('headers', () => {
  it('give pages a nonce-based CSP that their own scripts carry, and API answers no-store', async () => {
    const context = await newContext();
    contexts.push(context);
    const page = await context.newPage();
    const errors: string[] = [];
    page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
    const answer = await page.goto('/sign-in');
    const csp = answer!.headers()['content-security-policy'] ?? '';
    const nonce = /'nonce-([^']+)'/.exec(csp)?.[1];
    expect(nonce).toBeTruthy();
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).not.toContain("'unsafe-inline' 'nonce");
    const html = await answer!.text();
    const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts.length).toBeGreaterThan(0);
    for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`);
    expect(answer!.headers()['permissions-policy']).toContain('camera=()');
    expect(answer!.headers()['referrer-policy']).toBe('same-origin');
    // The page still works under the policy: the form hydrates and no script was blocked.
    await page.getByLabel('E-mail').fill('x@example.com');
    expect(errors.filter((e) => /Content Security Policy/i.test(e))).toEqual([]);
    const api = await context.request.get('/api/v1/settings');
    expect(api.headers()['cache-control']).toBe('no-store');
  });
});

describe('approvals', () => {
  let caseId = '';
  let projectId = '';

  beforeAll(async () => {
    const { page } = await as('analyst@kestrelbay.example');
    projectId = (await (await page.request.post('/api/v1/projects', { data: { name: 'Four-eyes plant', description: 'Invented' } })).json()).project.id;
    caseId = (await (await page.request.post(`/api/v1/projects/${projectId}/cases`, { data: caseBody })).json()).case.id;
  });

  it('are never decided by the person who submitted, even after their role changed to reviewer', async () => {
    const analyst = await as('analyst@kestrelbay.example');
    expect((await analyst.page.request.post(`/api/v1/cases/${caseId}/submit`, { data: { recommendation: 'Proceed.' } })).status()).toBe(201);
    const setRole = (role: string) =>
      db
        .updateTable('member')
        .set({ role })
        .where('userId', '=', db.selectFrom('user').select('id').where('email', '=', 'analyst@kestrelbay.example'))
        .execute();
    // As in the review: the submitter is made a reviewer, then tries to decide on their own work.
    await setRole('reviewer');
    try {
      const own = await analyst.page.request.post(`/api/v1/cases/${caseId}/approve`);
      expect(own.status()).toBe(403);
      expect((await own.json()).error.message).toMatch(/another reviewer must decide/);
      const ownReturn = await analyst.page.request.post(`/api/v1/cases/${caseId}/return`, { data: { reason: 'Returning my own work.' } });
      expect(ownReturn.status()).toBe(403);
    } finally {
      await setRole('analyst');
    }
    const reviewer = await as('reviewer@kestrelbay.example');
    expect((await reviewer.page.request.post(`/api/v1/cases/${caseId}/approve`)).status()).toBe(200);
    const snapshot = await db.selectFrom('case_snapshot').selectAll().where('case_id', '=', caseId).executeTakeFirstOrThrow();
    expect(snapshot.submitted_by_name).toBe('Priya Lindqvist');
    expect(snapshot.submitted_by).not.toBe(snapshot.decided_by);
    expect(snapshot.decided_by_name).toBe('Tomasz Okafor');
  });

  it('keep their board packs byte for byte when the project, the organisation and the people are renamed', async () => {
    const reviewer = await as('reviewer@kestrelbay.example');
    const pack = async (size: string) => Buffer.from(await (await reviewer.page.request.get(`/api/v1/cases/${caseId}/board-pack?size=${size}`)).body());
    // The approval queued a job that renders and stores every page size.
    const stored = async () =>
      (
        await db
          .selectFrom('board_pack')
          .innerJoin('case_snapshot', 'case_snapshot.id', 'board_pack.snapshot_id')
          .select('board_pack.page_size')
          .where('case_snapshot.case_id', '=', caseId)
          .execute()
      )
        .map((r) => r.page_size)
        .sort();
    await expect.poll(stored, { timeout: 60_000, interval: 500 }).toEqual(['A4', 'LETTER']);
    const before = [await pack('A4'), await pack('LETTER')];
    const admin = await as('admin@kestrelbay.example');
    expect((await admin.page.request.patch(`/api/v1/projects/${projectId}`, { data: { name: 'Renamed after approval' } })).status()).toBe(200);
    expect((await reviewer.page.request.post('/api/auth/update-user', { data: { name: 'Someone Else Entirely' } })).status()).toBe(200);
    const after = [await pack('A4'), await pack('LETTER')];
    expect(after[0]!.equals(before[0]!)).toBe(true);
    expect(after[1]!.equals(before[1]!)).toBe(true);
    await reviewer.page.request.post('/api/auth/update-user', { data: { name: 'Tomasz Okafor' } });
  });
});

describe('organisations', () => {
  it("answer another organisation's pages with HTTP 404", async () => {
    const plant = await demoCase('Phased bio-resin plant', 'Base case');
    const { page } = await as('owner@harrowfen.example');
    expect((await page.goto(`/projects/${plant.projectId}`))?.status()).toBe(404);
    expect((await page.goto(plant.url))?.status()).toBe(404);
  });

  it("refuse a member's second organisation through the auth library's own endpoint", async () => {
    const { page } = await as('analyst@kestrelbay.example');
    const answer = await page.request.post('/api/auth/organization/create', { data: { name: 'Side venture', slug: `side-venture-${Date.now()}` } });
    expect(answer.status()).toBeGreaterThanOrEqual(400);
    expect(answer.status()).toBeLessThan(500);
    expect(await db.selectFrom('organization').select('id').where('name', '=', 'Side venture').executeTakeFirst()).toBeUndefined();
  });
});

describe('accounts', () => {
  const email = `reset.${Date.now()}@example.com`;
  const first = 'a-first-long-passphrase';
  const second = 'a-second-long-passphrase';

  it('keep the session token out of answers scripts can read, and refuse common passwords', async () => {
    const context = await newContext();
    contexts.push(context);
    const common = await context.request.post('/api/auth/sign-up/email', {
      data: { name: 'Pat Common', email: `common.${Date.now()}@example.com`, password: 'password12' },
    });
    expect(common.status()).toBe(400);
    expect((await common.json()).message).toMatch(/most common/);
    // The sign-up form says so under the password, typed as a person would.
    const form = await context.newPage();
    await form.goto('/sign-up');
    await form.getByLabel('Your name').pressSequentially('Pat Common', { delay: 5 });
    await form.getByLabel('E-mail').pressSequentially(`common.form.${Date.now()}@example.com`, { delay: 5 });
    await form.getByLabel('Password').pressSequentially('password12', { delay: 5 });
    await form.getByRole('button', { name: 'Create account' }).click();
    const password = form.getByLabel('Password');
    await expect.poll(() => password.getAttribute('aria-invalid'), { timeout: 30_000 }).toBe('true');
    expect(await form.getByText('This password is one of the most common ones').isVisible()).toBe(true);
    await form.close();
    const signIn = await context.request.post('/api/auth/sign-in/email', { data: { email: 'analyst@kestrelbay.example', password: 'leeway-demo-2026' } });
    expect(signIn.status()).toBe(200);
    const body = await signIn.json();
    expect(body.user.email).toBe('analyst@kestrelbay.example');
    expect(JSON.stringify(body)).not.toMatch(/"token"/);
    const session = await (await context.request.get('/api/auth/get-session')).json();
    expect(session.user.email).toBe('analyst@kestrelbay.example');
    expect(JSON.stringify(session)).not.toMatch(/"token"/);
  });

  it('reset the password from the e-mailed link in the browser, ending every other session', async () => {
    const signer = await newContext();
    contexts.push(signer);
    expect((await signer.request.post('/api/auth/sign-up/email', { data: { name: 'Rae Reset', email, password: first } })).status()).toBe(200);
    const confirm = await waitForMail(email, /Confirm your e-mail/);
    const page = await signer.newPage();
    await page.goto(firstLink(confirm));
    await page.waitForURL('**/welcome', { timeout: 30_000 });
    const before = await (await signer.request.get('/api/auth/get-session')).json();
    expect(before?.user?.email).toBe(email);

    const other = await newContext();
    contexts.push(other);
    const forgot = await other.newPage();
    await forgot.goto('/forgot-password');
    await forgot.getByLabel('E-mail').pressSequentially(email, { delay: 5 });
    await forgot.getByRole('button', { name: 'Send reset link' }).click();
    const reset = await waitForMail(email, /Reset your Leeway password/, 30_000);
    await forgot.goto(firstLink(reset));
    await forgot.waitForURL('**/reset-password**');
    // A common password is the password's problem, said under it; the link still works after.
    // (Every refusal read "This reset link has expired or was already used.")
    await forgot.getByLabel('New password').pressSequentially('password123', { delay: 5 });
    await forgot.getByLabel('Repeat it').pressSequentially('password123', { delay: 5 });
    await forgot.getByRole('button', { name: 'Save new password' }).click();
    await expect.poll(() => forgot.getByText('This password is one of the most common ones').isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await forgot.getByText('This reset link has expired').count()).toBe(0);
    for (const label of ['New password', 'Repeat it']) {
      await forgot.getByLabel(label).fill('');
      await forgot.getByLabel(label).pressSequentially(second, { delay: 5 });
    }
    await forgot.getByRole('button', { name: 'Save new password' }).click();
    await expect.poll(() => forgot.url(), { timeout: 30_000 }).toMatch(/sign-in/);

    // The session opened before the reset is gone; the old password no longer works, the new one does.
    expect(await (await signer.request.get('/api/auth/get-session')).json()).toBeNull();
    const fresh = await newContext();
    contexts.push(fresh);
    expect((await fresh.request.post('/api/auth/sign-in/email', { data: { email, password: first } })).status()).toBe(401);
    expect((await fresh.request.post('/api/auth/sign-in/email', { data: { email, password: second } })).status()).toBe(200);
  });

  it("say on the sign-in form how long an account must wait after wrong passwords, in the server's words", async () => {
    // The form said "wait a minute" for every 429, and "confirm your e-mail" for every 403.
    const email = `backoff-${Date.now()}@example.test`;
    const visitor = await newContext();
    contexts.push(visitor);
    for (let k = 0; k < 5; k++) {
      const wrong = await visitor.request.post('/api/auth/sign-in/email', {
        data: { email, password: 'not the password' },
        headers: { 'x-forwarded-for': visitorAddress() },
      });
      expect(wrong.status()).toBe(401);
    }
    const page = await visitor.newPage();
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').pressSequentially(email, { delay: 5 });
    await page.getByLabel('Password').pressSequentially('still not the password', { delay: 5 });
    await page.keyboard.press('Enter');
    await expect.poll(() => page.getByText(/Too many wrong passwords for this account\. Try again in \d+ seconds/).count(), { timeout: 30_000 }).toBe(1);
  });

  it('answer a reset request as fast whether or not the account exists (the mail is sent after)', async () => {
    const context = await newContext();
    contexts.push(context);
    const time = async (address: string) => {
      const started = performance.now();
      // A fresh forwarded address each time: the per-address limit (5 a minute) is not what is measured.
      const answer = await context.request.post('/api/auth/request-password-reset', {
        headers: { 'x-forwarded-for': `198.18.${Math.floor(Math.random() * 256)}.${1 + Math.floor(Math.random() * 254)}` },
        data: { email: address, redirectTo: '/reset-password' },
      });
      expect(answer.status()).toBe(200);
      return performance.now() - started;
    };
    const median = (xs: number[]) => xs.sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
    const known: number[] = [];
    const unknown: number[] = [];
    for (let k = 0; k < 7; k++) {
      known.push(await time('executive@kestrelbay.example'));
      unknown.push(await time(`nobody.${k}@example.com`));
    }
    // Before the fix the known account waited for the SMTP hand-off: 164–748 ms against 13–159 ms.
    // 100 ms allows for a loaded two-core machine and is below that gap.
    expect(Math.abs(median(known) - median(unknown))).toBeLessThan(100);
  });
});
