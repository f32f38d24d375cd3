/**
 * Board packs in the database: the data a pack is drawn from (one approved snapshot and the
 * names in its record), and the stored PDFs, one per snapshot and page size.
 */
import { createHash } from 'node:crypto';
import { sql } from 'kysely';
import { db } from '@/db';
import { AppError } from '../errors';
import type { BoardPackData, FollowThrough, PageSize, RecordEvent } from './data';

/**
 * Everything the pack shows, from the approved snapshot alone: its frozen inputs and results and
 * the names captured at submission and decision, never today's names (migration 0007).
 */
export async function boardPackData(orgId: string, snapshotId: string, pageSize: PageSize): Promise<BoardPackData> {
  const row = await db.selectFrom('case_snapshot').selectAll().where('organization_id', '=', orgId).where('id', '=', snapshotId).executeTakeFirst();
  if (!row || row.status !== 'approved' || !row.decided_at) throw new AppError('not_found', 'No approved snapshot to make a board pack from.');
  // The case's earlier submissions: all frozen (snapshots are append-only), so the record never changes.
  const earlier = await db
    .selectFrom('case_snapshot')
    .select(['case_version', 'status', 'submitted_at', 'submitted_by_name', 'decided_at', 'decided_by_name', 'decision_reason'])
    .where('organization_id', '=', orgId)
    .where('case_id', '=', row.case_id)
    // Compared in SQL: the JavaScript Date of row.submitted_at has lost the microseconds.
    .where('submitted_at', '<=', (eb) => eb.selectFrom('case_snapshot as approved').select('approved.submitted_at').where('approved.id', '=', row.id))
    .orderBy('submitted_at')
    .execute();
  const former = 'a former member';
  const record: RecordEvent[] = earlier.flatMap((s): RecordEvent[] => {
    const submitted: RecordEvent = {
      kind: 'submitted',
      caseVersion: s.case_version,
      by: s.submitted_by_name ?? former,
      at: new Date(s.submitted_at).toISOString(),
    };
    if (!s.decided_at || s.status === 'in_review') return [submitted];
    const decided = new Date(s.decided_at).toISOString();
    if (s.status === 'withdrawn') return [submitted, { kind: 'withdrawn', caseVersion: s.case_version, by: s.submitted_by_name ?? former, at: decided }];
    return [
      submitted,
      {
        kind: s.status,
        caseVersion: s.case_version,
        by: s.decided_by_name ?? former,
        at: decided,
        ...(s.decision_reason ? { reason: s.decision_reason } : {}),
      },
    ];
  });
  const followThrough = await followThroughBefore(orgId, row.case_id, row.id);
  return {
    ...(followThrough ? { followThrough } : {}),
    pageSize,
    organisation: row.organization_name ?? '',
    isDemo: row.organization_is_demo ?? false,
    project: { name: row.project_name ?? row.case_name, description: row.project_description ?? '', currency: row.currency ?? '' },
    snapshot: {
      id: row.id,
      caseName: row.case_name,
      caseVersion: row.case_version,
      inputs: row.inputs as BoardPackData['snapshot']['inputs'],
      model: row.model as BoardPackData['snapshot']['model'],
      result: row.result as BoardPackData['snapshot']['result'],
      engineVersion: row.engine_version,
      inputHash: row.input_hash,
      submittedBy: row.submitted_by_name ?? 'a former member',
      submittedAt: new Date(row.submitted_at).toISOString(),
      decidedBy: row.decided_by_name ?? 'a former member',
      decidedAt: new Date(row.decided_at).toISOString(),
      recommendation: row.recommendation,
    },
    record,
  };
}

/**
 * The follow-through of the case's version approved before `snapshotId`: values and decisions
 * recorded up to this snapshot's submission (compared in SQL, to the microsecond), so a pack
 * rendered again later reads the same.
 */
async function followThroughBefore(orgId: string, caseId: string, snapshotId: string): Promise<FollowThrough | undefined> {
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
  return {
    caseVersion: previous.case_version,
    approvedAt: new Date(previous.decided_at).toISOString(),
    observations,
    decisions: decisions.map((d) => ({ ...d, by: d.by ?? 'a former member' })),
  };
}

export async function findBoardPack(orgId: string, snapshotId: string, pageSize: PageSize) {
  return db
    .selectFrom('board_pack')
    .select(['pdf', 'sha256'])
    .where('organization_id', '=', orgId)
    .where('snapshot_id', '=', snapshotId)
    .where('page_size', '=', pageSize)
    .executeTakeFirst();
}

/** Stores a rendered pack; when two first requests race, both rendered the same bytes and the first insert wins. */
export async function saveBoardPack(orgId: string, snapshotId: string, pageSize: PageSize, pdf: Buffer): Promise<{ pdf: Buffer; sha256: string }> {
  const sha256 = createHash('sha256').update(pdf).digest('hex');
  await db
    .insertInto('board_pack')
    .values({ organization_id: orgId, snapshot_id: snapshotId, page_size: pageSize, pdf, sha256 })
    .onConflict((c) => c.columns(['snapshot_id', 'page_size']).doNothing())
    .execute();
  return { pdf, sha256 };
}
