/**
 * Per-account backoff: after FREE_FAILURES wrong passwords in a row for one e-mail address, each
 * further attempt must wait, doubling from BASE_DELAY_S up to MAX_DELAY_S, whatever address the
 * attempts come from (the per-address limit of lib/auth.ts cannot stop an attacker with many
 * addresses). A successful sign-in clears the count. The counter lives in PostgreSQL so every app
 * server shares it. Common practice (OWASP ASVS 2.2.1, "anti-automation"); the numbers are ours.
 */
import type { Database } from '@/db';
import { findSignInFailures } from '@/db/queries/sign-in-failures';

export const FREE_FAILURES = 5;
const BASE_DELAY_S = 30;
const MAX_DELAY_S = 15 * 60;

/** Seconds to wait after `failures` consecutive failures before the next attempt is heard. */
export function backoffSeconds(failures: number): number {
  if (failures < FREE_FAILURES) return 0;
  return Math.min(MAX_DELAY_S, BASE_DELAY_S * 2 ** (failures - FREE_FAILURES));
}

/** Seconds left before this account may try again (0: it may now). */
export async function secondsUntilAllowed(db: Database, email: string, now = new Date()): Promise<number> {
  const row = await findSignInFailures(db, { email });
  if (!row) return 0;
  const readyAt = new Date(row.last_failure_at).getTime() + backoffSeconds(row.failures) * 1000;
  return Math.max(0, Math.ceil((readyAt - now.getTime()) / 1000));
}
