/**
 * Per-account backoff: after FREE_FAILURES wrong passwords in a row for one e-mail address, each
 * further attempt must wait, doubling from BASE_DELAY_S up to MAX_DELAY_S, whatever address the
 * attempts come from (the per-address limit of lib/auth.ts cannot stop an attacker with many
 * addresses). A successful sign-in clears the count. The counter lives in PostgreSQL so every app
 * server shares it. Common practice (OWASP ASVS 2.2.1, "anti-automation"); the numbers are ours.
 */
import { sql } from 'kysely';
import type { Database } from '@/db';

export const FREE_FAILURES = 5;
const BASE_DELAY_S = 30;
const MAX_DELAY_S = 15 * 60;

/** Seconds to wait after `failures` consecutive failures before the next attempt is heard. */
export function backoffSeconds(failures: number): number {
  if (failures < FREE_FAILURES) return 0;
  return Math.min(MAX_DELAY_S, BASE_DELAY_S * 2 ** (failures - FREE_FAILURES));
}

function key(email: string): string {
  return email.trim().toLowerCase();
}

/** Seconds left before this account may try again (0: it may now). */
export async function secondsUntilAllowed(db: Database, email: string, now = new Date()): Promise<number> {
  const row = await db.selectFrom('sign_in_failure').select(['failures', 'last_failure_at']).where('email', '=', key(email)).executeTakeFirst();
  if (!row) return 0;
  const readyAt = new Date(row.last_failure_at).getTime() + backoffSeconds(row.failures) * 1000;
  return Math.max(0, Math.ceil((readyAt - now.getTime()) / 1000));
}

export async function recordFailure(db: Database, email: string): Promise<void> {
  await db
    .insertInto('sign_in_failure')
    .values({ email: key(email), failures: 1, last_failure_at: new Date() })
    .onConflict((c) => c.column('email').doUpdateSet({ failures: sql`sign_in_failure.failures + 1`, last_failure_at: new Date() }))
    .execute();
}

export async function clearFailures(db: Database, email: string): Promise<void> {
  await db.deleteFrom('sign_in_failure').where('email', '=', key(email)).execute();
}
