/**
 * Organisation API keys (issue 14): an admin creates, lists and revokes them in Settings → API
 * keys (typed key by key in Chromium) and through the API; a key is shown once, stored as a hash
 * and listed by its first characters; it acts in its organisation with its role, with no session
 * and no Origin; its writes are attributed to "API key <name> (created by …)"; a missing, wrong,
 * malformed, revoked or expired key, or one whose creator is no longer an admin, gets 401;
 * another organisation's record 404; a key in a URL 400; past the per-key rate 429.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { createProject } from '@/db/queries/projects';
import { hashApiKey } from '@/lib/api-keys/secret';
import { API_KEY_REQUESTS_PER_MINUTE } from '@/lib/api-keys/limits';
import { closeBrowser, signedInPage } from './support/browser';
import { BASE_URL } from './support/env';

type Request = Awaited<ReturnType<typeof signedInPage>>['page']['request'];
let admin: Request;
let adminName = '';

/** A request as a script sends it: the key in the header, no cookie, no Origin. */
function withKey(key: string, path: string, init: RequestInit = {}) {
  return fetch(BASE_URL + path, {
    ...init,
    headers: { authorization: `Bearer ${key}`, ...(init.body ? { 'content-type': 'application/json' } : {}), ...init.headers },
  });
}

async function createKey(name: string, role: 'analyst' | 'reviewer' | 'viewer', expiresInDays?: number): Promise<{ id: string; key: string }> {
  const res = await admin.post('/api/v1/api-keys', { data: { name, role, ...(expiresInDays ? { expiresInDays } : {}) } });
  expect(res.status()).toBe(201);
  return res.json();
}

beforeAll(async () => {
  admin = (await signedInPage('admin@kestrelbay.example')).page.request;
  adminName = (await db.selectFrom('user').select('name').where('email', '=', 'admin@kestrelbay.example').executeTakeFirstOrThrow()).name;
});

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

describe('API keys', () => {
  it('shows the secret once, keeps only its hash and lists it by its first characters', async () => {
    const made = await createKey('Planning sync', 'analyst', 90);
    expect(made.key).toMatch(/^lwk_[A-Za-z0-9_-]{43}$/);
    const stored = await db.selectFrom('api_key').selectAll().where('id', '=', made.id).executeTakeFirstOrThrow();
    expect(stored.secret_hash).toBe(hashApiKey(made.key));
    expect(JSON.stringify(stored)).not.toContain(made.key);
    // Expires in 90 days, to the minute (the request takes far less than a minute).
    expect(Math.abs(stored.expires_at!.getTime() - Date.now() - 90 * 86_400_000)).toBeLessThan(60_000);
    const listed = (await (await admin.get('/api/v1/api-keys')).json()).apiKeys.find((k: { id: string }) => k.id === made.id);
    expect(listed).toMatchObject({ name: 'Planning sync', role: 'analyst', prefix: made.key.slice(0, 12), lastUsedAt: null, revokedAt: null });
    expect(JSON.stringify(listed)).not.toContain(made.key);
    // Refusals of the body, in the documented shape.
    const bad = await admin.post('/api/v1/api-keys', { data: { name: '', role: 'admin', expiresInDays: 0 } });
    expect(bad.status()).toBe(422);
    expect(Object.keys((await bad.json()).error.fields).sort()).toEqual(['expiresInDays', 'name', 'role']);
  });

  it('acts in its organisation with its role, without a session or an Origin, and its writes are attributed to it', async () => {
    const { key } = await createKey('Board reporting', 'analyst');
    const list = await withKey(key, '/api/v1/projects');
    expect(list.status).toBe(200);
    const created = await withKey(key, '/api/v1/projects', { method: 'POST', body: JSON.stringify({ name: 'Keyed project (e2e)' }) });
    expect(created.status).toBe(201);
    const projectId = (await created.json()).project.id;
    const activity = (await (await admin.get(`/api/v1/projects/${projectId}/activity`)).json()).activity;
    expect(activity[0]).toMatchObject({ action: 'project.create', actor: `API key Board reporting (created by ${adminName})` });
    const row = await db.selectFrom('api_key').select('last_used_at').where('secret_hash', '=', hashApiKey(key)).executeTakeFirstOrThrow();
    expect(row.last_used_at).not.toBeNull();

    const viewer = await createKey('BI dashboard', 'viewer');
    expect((await withKey(viewer.key, '/api/v1/projects')).status).toBe(200);
    expect((await withKey(viewer.key, '/api/v1/projects', { method: 'POST', body: JSON.stringify({ name: 'Not allowed' }) })).status).toBe(403);
    expect((await withKey(viewer.key, `/api/v1/projects/${projectId}`, { method: 'DELETE' })).status).toBe(403);
    // Keys are an admin's business only, and a key is never an admin.
    expect((await withKey(key, '/api/v1/api-keys')).status).toBe(403);

    // Another organisation's project does not exist for this key.
    const outsider = await db
      .selectFrom('member')
      .innerJoin('user', 'user.id', 'member.userId')
      .select(['member.organizationId', 'user.id'])
      .where('user.email', '=', 'owner@harrowfen.example')
      .executeTakeFirstOrThrow();
    const foreign = await createProject(db, { orgId: outsider.organizationId, ownerId: outsider.id, name: 'Not theirs (e2e)', currency: 'EUR' });
    expect((await withKey(key, `/api/v1/projects/${foreign.id}`)).status).toBe(404);
    expect((await withKey(key, `/api/v1/projects/${foreign.id}`, { method: 'DELETE' })).status).toBe(404);
    await db.deleteFrom('project').where('id', '=', foreign.id).execute();
    expect((await withKey(key, `/api/v1/projects/${projectId}`, { method: 'DELETE' })).status).toBe(204);
  });

  it('answers 401 to a missing, wrong, malformed, revoked or expired key, and to one whose creator is no longer an admin', async () => {
    const statusOf = async (authorization?: string) => (await fetch(`${BASE_URL}/api/v1/projects`, { headers: authorization ? { authorization } : {} })).status;
    expect(await statusOf()).toBe(401);
    expect(await statusOf('Bearer lwk_' + 'x'.repeat(43))).toBe(401);
    expect(await statusOf('Bearer not-a-key')).toBe(401);
    expect(await statusOf('Basic YWRtaW46YWRtaW4=')).toBe(401);
    expect(await statusOf('Bearer')).toBe(401);

    const revoked = await createKey('Revoked soon', 'viewer');
    expect((await withKey(revoked.key, '/api/v1/projects')).status).toBe(200);
    expect((await admin.delete(`/api/v1/api-keys/${revoked.id}`)).status()).toBe(204);
    expect((await withKey(revoked.key, '/api/v1/projects')).status).toBe(401);
    expect((await admin.delete(`/api/v1/api-keys/${revoked.id}`)).status()).toBe(404);

    const expired = await createKey('Expired', 'viewer', 1);
    await db
      .updateTable('api_key')
      .set({ expires_at: new Date(Date.now() - 1000) })
      .where('id', '=', expired.id)
      .execute();
    const expiredAnswer = await withKey(expired.key, '/api/v1/projects');
    expect(expiredAnswer.status).toBe(401);
    expect((await expiredAnswer.json()).error.message).toMatch(/expired/);

    // As if its creator had been made an analyst: the key is only as good as an admin's standing.
    const orphan = await createKey('Creator demoted', 'viewer');
    const analyst = await db.selectFrom('user').select('id').where('email', '=', 'analyst@kestrelbay.example').executeTakeFirstOrThrow();
    await db.updateTable('api_key').set({ created_by: analyst.id }).where('id', '=', orphan.id).execute();
    expect((await withKey(orphan.key, '/api/v1/projects')).status).toBe(401);

    // With a key in the header, the session cookie is not a fallback.
    expect((await admin.get('/api/v1/projects', { headers: { authorization: 'Bearer lwk_wrong' } })).status()).toBe(401);
  });

  it('refuses a key in a URL', async () => {
    const { key } = await createKey('Leaky script', 'viewer');
    for (const query of [`?api_key=${key}`, `?token=${key}`, `?anything=${key}`, '?key=x'])
      expect((await fetch(`${BASE_URL}/api/v1/projects${query}`)).status, query).toBe(400);
    expect((await withKey(key, `/api/v1/projects?access_token=${key}`)).status).toBe(400);
  });

  it(`answers 429 with Retry-After past ${API_KEY_REQUESTS_PER_MINUTE} requests a minute from one key, and not to another key`, async () => {
    const { key } = await createKey('Runaway loop', 'viewer');
    const statuses: number[] = [];
    for (let batch = 0; batch < API_KEY_REQUESTS_PER_MINUTE / 20; batch++)
      statuses.push(...(await Promise.all(Array.from({ length: 20 }, async () => (await withKey(key, '/api/v1/settings')).status))));
    expect(statuses.filter((s) => s !== 200)).toEqual([]);
    const refused = await withKey(key, '/api/v1/settings');
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    const other = await createKey('Well-behaved', 'viewer');
    expect((await withKey(other.key, '/api/v1/settings')).status).toBe(200);
  }, 240_000);

  it('is created, copied once and revoked in Settings → API keys with the keyboard', async () => {
    const { page } = await signedInPage('admin@kestrelbay.example');
    await page.goto('/settings/api-keys');
    // A person types once the form works (its button is enabled then, components/ui/button.tsx).
    // Twice on CI under load the key was never created; the cause is not known. It is not text
    // typed before React takes the page over: react-hook-form 7.92 keeps it (isEditedBeforeReady).
    await expect.poll(() => page.getByRole('button', { name: 'Create key' }).isEnabled(), { timeout: 30_000 }).toBe(true);
    // A name of its own, so a second run against the same database finds its own row.
    const name = `Warehouse export ${Date.now().toString(36)}`;
    await page.getByLabel('Name').pressSequentially(name);
    await page.getByLabel('Role').selectOption('reviewer');
    await page.getByRole('button', { name: 'Create key' }).click();
    await expect.poll(() => page.getByText('is ready. Copy it now', { exact: false }).isVisible(), { timeout: 30_000 }).toBe(true);
    const key = await page.getByLabel('Key', { exact: true }).inputValue();
    expect(key).toMatch(/^lwk_/);
    expect((await withKey(key, '/api/v1/reviews')).status).toBe(200);
    await expect.poll(() => page.getByRole('cell', { name, exact: true }).isVisible(), { timeout: 30_000 }).toBe(true);
    await page.getByRole('button', { name: `Revoke the key ${name}` }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Revoke' }).click();
    await expect.poll(async () => (await withKey(key, '/api/v1/reviews')).status, { timeout: 30_000 }).toBe(401);
    await expect
      .poll(
        () =>
          page
            .getByRole('row', { name: new RegExp(name) })
            .getByText(/^Revoked /)
            .isVisible(),
        { timeout: 30_000 },
      )
      .toBe(true);
    // Other roles are refused the page.
    const analyst = await signedInPage('analyst@kestrelbay.example');
    await analyst.page.goto('/settings/api-keys');
    expect(await analyst.page.getByRole('textbox', { name: 'Name' }).count()).toBe(0);
  }, 120_000);
});
