/** The review queue: the organisation's cases waiting for a decision (or, when asked, the decided ones). */
import 'server-only';
import { db } from '@/db';
import { listReviewQueue } from '@/db/queries/reviews';
import type { CaseStatus } from '@/db/types';
import type { Member } from '../dal';

export async function readReviewQueue(member: Member, statuses: CaseStatus[]) {
  return listReviewQueue(db, { orgId: member.orgId, statuses });
}
