/**
 * Sign-in is rate-limited (lib/auth.ts: 10 attempts a minute per client address), with the
 * counters in PostgreSQL so every app server shares them. Driven through better-auth's real
 * request handler.
 */
import { describe, expect, it } from 'vitest';
import { auth } from '@/lib/auth';
import { seedDemo } from '@/demo/seed';

function attempt(address: string) {
  return auth.handler(
    new Request('http://127.0.0.1:3000/api/auth/sign-in/email', {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: 'http://127.0.0.1:3000', 'x-forwarded-for': address },
      body: JSON.stringify({ email: 'analyst@kestrelbay.example', password: 'not the password' }),
    }),
  );
}

describe('sign-in rate limit', () => {
  it('refuses the eleventh attempt within a minute with 429, and only for that client', async () => {
    await seedDemo();
    const statuses: number[] = [];
    for (let k = 0; k < 11; k++) statuses.push((await attempt('198.51.100.7')).status);
    expect(statuses.slice(0, 10).every((s) => s === 401)).toBe(true);
    expect(statuses[10]).toBe(429);
    expect((await attempt('198.51.100.8')).status).toBe(401);
  });
});
