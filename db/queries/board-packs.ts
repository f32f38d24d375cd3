/**
 * What a board pack is drawn from and where packs are kept: an approved snapshot, the case's
 * submissions up to it, the follow-through of the version approved before it, and the stored PDFs.
 * Times are compared in SQL: a JavaScript Date has lost the microseconds of a timestamp.
 */
import { sql } from 'kysely';
import type { Database } from '../index';
import type { BoardPackTable } from '../types';

type PageSize = BoardPackTable['page_size'];

export async function findSnapshotForPack(db: Database, { orgId, snapshotId }: { orgId: string; snapshotId: string }) {
  return db.selectFrom('case_snapshot').selectAll().where('organization_id', '=', orgId).where('id', '=', snapshotId).executeTakeFirst();
}

/** The case's submissions up to and including the snapshot's, oldest first: all frozen (snapshots are append-only). */
export async function listSubmissionsUpTo(db: Database, { orgId, caseId, snapshotId }: { orgId: string; caseId: string; snapshotId: string }) {
  return db
    .selectFrom('case_snapshot')
    .select(['case_version', 'status', 'submitted_at', 'submitted_by_name', 'decided_at', 'decided_by_name', 'decision_reason'])
    .where('organization_id', '=', orgId)
    .where('case_id', '=', caseId)
    .where('submitted_at', '<=', (eb) => eb.selectFrom('case_snapshot as approved').select('approved.submitted_at').where('approved.id', '=', snapshotId))
    .orderBy('submitted_at')
    .execute();
}

/**
 * The version approved before `snapshotId` and what was recorded on it up to that snapshot's
 * submission: the values observed since its approval and the decisions on its rights.
 */
export async function followThroughBefore(db: Database, { orgId, caseId, snapshotId }: { orgId: string; caseId: string; snapshotId: string }) {
  const submittedAt = sql<Date>`(select submitted_at from case_snapshot where id = ${snapshotId})`;
  const previous = await db
    .selectFrom('case_snapshot')
    .select(['id', 'case_version', 'decided_at'])
    .where('organization_id', '=', orgId)
    .where('case_id', '=', caseId)
    .where('status', '=', 'approved')
    .where('id', '<>', snapshotId)
    .where('decided_at', '<', submittedAt)
    .orderBy('decided_at', 'desc')
    .limit(1)
    .executeTakeFirst();
  if (!previous?.decided_at) return undefined;
  const [observations, decisions] = await Promise.all([
    db
      .selectFrom('case_observation')
      .select([sql<string>`observed_on::text`.as('date'), 'value', 'source'])
      .where('organization_id', '=', orgId)
      .where('case_id', '=', caseId)
      .where('observed_on', '>=', sql<string>`${previous.decided_at}::date`)
      .where('created_at', '<=', submittedAt)
      .orderBy('observed_on')
      .orderBy('created_at')
      .execute(),
    db
      .selectFrom('right_decision')
      .leftJoin('user', 'user.id', 'right_decision.recorded_by')
      .select([
        sql<string>`right_decision.decided_on::text`.as('date'),
        'right_decision.right_id as right',
        'right_decision.decision',
        'right_decision.reason',
        'user.name as by',
      ])
      .where('right_decision.organization_id', '=', orgId)
      .where('right_decision.snapshot_id', '=', previous.id)
      .where('right_decision.created_at', '<=', submittedAt)
      .orderBy('right_decision.decided_on')
      .orderBy('right_decision.created_at')
      .execute(),
  ]);
  return { previous: { caseVersion: previous.case_version, decidedAt: previous.decided_at }, observations, decisions };
}

export async function findStoredPack(db: Database, { orgId, snapshotId, pageSize }: { orgId: string; snapshotId: string; pageSize: PageSize }) {
  return db
    .selectFrom('board_pack')
    .select(['pdf', 'sha256'])
    .where('organization_id', '=', orgId)
    .where('snapshot_id', '=', snapshotId)
    .where('page_size', '=', pageSize)
    .executeTakeFirst();
}

/**
 * Keeps a rendered pack; when two first requests race the first insert wins. True when this one
 * was stored (saveBoardPack reads the stored pack back only when it was not).
 */
export async function insertStoredPack(db: Database, args: { orgId: string; snapshotId: string; pageSize: PageSize; pdf: Buffer; sha256: string }) {
  const stored = await db
    .insertInto('board_pack')
    .values({ organization_id: args.orgId, snapshot_id: args.snapshotId, page_size: args.pageSize, pdf: args.pdf, sha256: args.sha256 })
    .onConflict((c) => c.columns(['snapshot_id', 'page_size']).doNothing())
    .returning('snapshot_id')
    .executeTakeFirst();
  return stored !== undefined;
}
