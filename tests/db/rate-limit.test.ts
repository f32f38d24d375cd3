/**
 * Sign-in limits that hold (lib/auth.ts, lib/sign-in-backoff.ts), driven through better-auth's
 * real request handler with the counters in PostgreSQL:
 * - 10 attempts a minute per client address, the address being the one scripts/serve.ts vouches
 *   for (CLIENT_ADDRESS_HEADER), never a client's own X-Forwarded-For;
 * - after 5 wrong passwords in a row for one account, a wait before the next attempt, from any
 *   address, cleared by a successful sign-in.
 */
import { sql } from 'kysely';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { seedDemo } from '@/demo/seed';
import { auth } from '@/lib/auth';
import { CLIENT_ADDRESS_HEADER } from '@/lib/client-address';
import { backoffSeconds, FREE_FAILURES } from '@/lib/sign-in-backoff';

function attempt(address: string, email: string, password = 'not the password', extra: Record<string, string> = {}) {
  return auth.handler(
    new Request('http://127.0.0.1:3000/api/auth/sign-in/email', {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: 'http://127.0.0.1:3000', [CLIENT_ADDRESS_HEADER]: address, ...extra },
      body: JSON.stringify({ email, password }),
    }),
  );
}

describe('sign-in limits', () => {
  it('refuses the eleventh attempt within a minute from one address with 429, and only for that address', async () => {
    await seedDemo();
    const statuses: number[] = [];
    // A different (unknown) account each time, so only the per-address limit is in play.
    for (let k = 0; k < 11; k++) statuses.push((await attempt('198.51.100.7', `nobody-${k}@example.com`)).status);
    expect(statuses.slice(0, 10)).toEqual(Array(10).fill(401));
    expect(statuses[10]).toBe(429);
    expect((await attempt('198.51.100.8', 'nobody-else@example.com')).status).toBe(401);
  });

  it('ignores a client-supplied X-Forwarded-For: varying it does not reset the count', async () => {
    const statuses: number[] = [];
    for (let k = 0; k < 11; k++)
      statuses.push((await attempt('198.51.100.9', `someone-${k}@example.com`, 'not the password', { 'x-forwarded-for': `203.0.113.${k + 1}` })).status);
    expect(statuses[10]).toBe(429);
  });

  it(`makes an account wait after ${FREE_FAILURES} wrong passwords from any addresses, and clears on success`, async () => {
    await seedDemo();
    const email = 'reviewer@kestrelbay.example';
    for (let k = 0; k < FREE_FAILURES; k++) expect((await attempt(`192.0.2.${k + 1}`, email)).status).toBe(401);
    // Even the right password waits now, from a fresh address.
    const blocked = await attempt('192.0.2.100', email, 'leeway-demo-2026');
    expect(blocked.status).toBe(429);
    expect((await blocked.json()).message).toMatch(/Too many wrong passwords for this account/);
    // The wait passes (moved back in time rather than slept through).
    await sql`update sign_in_failure set last_failure_at = now() - make_interval(secs => ${backoffSeconds(FREE_FAILURES) + 1}) where email = ${email}`.execute(
      db,
    );
    expect((await attempt('192.0.2.101', email, 'leeway-demo-2026')).status).toBe(200);
    expect(await db.selectFrom('sign_in_failure').select('failures').where('email', '=', email).executeTakeFirst()).toBeUndefined();
  });

  it('doubles the wait after each further failure, up to a quarter of an hour', () => {
    expect([4, 5, 6, 7, 20].map(backoffSeconds)).toEqual([0, 30, 60, 120, 900]);
  });
});
