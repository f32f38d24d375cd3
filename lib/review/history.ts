/** A case's review history: every frozen snapshot and its decision, and what changed since the last return. */
import 'server-only';
import { db } from '@/db';
import { listSnapshots } from '@/db/queries/reviews';
import { requireCase } from '../cases/require-case';
import type { Member } from '../dal';
import { versionChanges } from './version-changes';

export async function readReviewHistory(member: Member, caseId: string) {
  const found = await requireCase(db, member.orgId, caseId);
  const [snapshots, changes] = await Promise.all([listSnapshots(db, { orgId: member.orgId, caseId: found.id }), versionChanges(member.orgId, found.id)]);
  return { found, snapshots, changes };
}
