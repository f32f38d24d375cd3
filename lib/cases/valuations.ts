/**
 * A stored case's valuations as the Value button and the API ask for them: value the case as it
 * is saved and keep the run (lib/store-valuation.ts), or list its runs, newest first.
 */
import 'server-only';
import { db } from '@/db';
import { listValuationRuns } from '@/db/queries/valuation-runs';
import type { Member } from '../dal';
import { valueAndStore } from '../store-valuation';
import { readCase } from './service';

export async function valueCase(member: Member, caseId: string, signal?: AbortSignal) {
  const stored = await readCase(member, caseId);
  return valueAndStore(stored, member, { owner: member.userId, signal });
}

export async function listCaseRuns(member: Member, caseId: string) {
  await readCase(member, caseId);
  return listValuationRuns(db, { orgId: member.orgId, caseId });
}
