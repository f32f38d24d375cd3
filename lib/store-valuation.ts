/**
 * Values a stored case and keeps the run, with its audit entry in the same transaction: what
 * "Value case" does, and what a portfolio re-valuation does for each case it takes.
 */
import 'server-only';
import { db } from '@/db';
import type { Case } from '@/db/types';
import type { RunOptions } from './engine/pool';
import { recordValuation } from './cases/record-valuation';
import { valueStoredCase } from './value-case';

export async function valueAndStore(stored: Case, actor: { orgId: string; userId: string }, run: RunOptions = {}) {
  const valuation = await valueStoredCase(stored, undefined, run);
  const saved = await db.transaction().execute((trx) => recordValuation(trx, { actor, stored, valuation }));
  return { ...valuation, run: saved };
}
