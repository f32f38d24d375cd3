/** Decisions recorded on the rights of a followed (approved) version, per organisation. */
import { sql } from 'kysely';
import type { Database } from '../index';
import type { RightDecisionKind } from '../types';

export async function addRightDecision(
  db: Database,
  args: {
    orgId: string;
    caseId: string;
    snapshotId: string;
    rightId: string;
    decision: RightDecisionKind;
    decidedOn: string;
    reason: string;
    recordedBy: string;
  },
) {
  return db
    .insertInto('right_decision')
    .values({
      organization_id: args.orgId,
      case_id: args.caseId,
      snapshot_id: args.snapshotId,
      right_id: args.rightId,
      decision: args.decision,
      decided_on: args.decidedOn,
      reason: args.reason,
      recorded_by: args.recordedBy,
    })
    .returning(['id'])
    .executeTakeFirstOrThrow();
}

/** The decisions on one followed version, oldest first. */
export async function listRightDecisions(db: Database, { orgId, snapshotId }: { orgId: string; snapshotId: string }) {
  return db
    .selectFrom('right_decision')
    .leftJoin('user', 'user.id', 'right_decision.recorded_by')
    .select([
      'right_decision.id',
      'right_decision.right_id as rightId',
      'right_decision.decision',
      sql<string>`right_decision.decided_on::text`.as('decidedOn'),
      'right_decision.reason',
      'right_decision.created_at as recordedAt',
      'user.name as recordedBy',
    ])
    .where('right_decision.organization_id', '=', orgId)
    .where('right_decision.snapshot_id', '=', snapshotId)
    .orderBy('right_decision.decided_on')
    .orderBy('right_decision.created_at')
    .execute();
}

export type RightDecisionRow = Awaited<ReturnType<typeof listRightDecisions>>[number];
