/**
 * Transaction-scoped advisory locks: one per purpose and organisation, so that "how many are
 * running for this organisation?" and the insert that follows are one step for concurrent
 * requests (held until the transaction ends). Pass the transaction, never the global handle.
 */
import { sql } from 'kysely';
import type { Database } from '../index';

export type LockPurpose = 'portfolio_revaluation' | 'cross_check' | 'volatility_simulation';

export async function lockForOrganisation(trx: Database, purpose: LockPurpose, orgId: string): Promise<void> {
  await sql`select pg_advisory_xact_lock(hashtext(${purpose}), hashtext(${orgId}))`.execute(trx);
}
