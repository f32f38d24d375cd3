/** Consecutive failed sign-ins per e-mail address (lib/sign-in-backoff.ts decides what they mean). */
import { sql } from 'kysely';
import type { Database } from '../index';

const key = (email: string) => email.trim().toLowerCase();

export async function findSignInFailures(db: Database, { email }: { email: string }) {
  return db.selectFrom('sign_in_failure').select(['failures', 'last_failure_at']).where('email', '=', key(email)).executeTakeFirst();
}

export async function addSignInFailure(db: Database, { email }: { email: string }): Promise<void> {
  await db
    .insertInto('sign_in_failure')
    .values({ email: key(email), failures: 1, last_failure_at: new Date() })
    .onConflict((c) => c.column('email').doUpdateSet({ failures: sql`sign_in_failure.failures + 1`, last_failure_at: new Date() }))
    .execute();
}

export async function clearSignInFailures(db: Database, { email }: { email: string }): Promise<void> {
  await db.deleteFrom('sign_in_failure').where('email', '=', key(email)).execute();
}
