/**
 * The review workflow's data: snapshots frozen at submission, decisions, comments and the review
 * queue. Every status change locks the case row (SELECT … FOR UPDATE) inside the caller's
 * transaction and asks the caller's status machine (lib/review/transitions.ts, passed in as
 * `allowed`) about the status it finds there, so two reviewers acting at once cannot both win:
 * the second sees the first one's status and gets a conflict.
 */
import { sql, type Transaction } from 'kysely';
import type { Database } from '../index';
import { NO_SUCH_CASE } from './cases';
import type { CaseSnapshot, CaseStatus, DB } from '../types';

/** The status machine's answer for the locked case's status: the status to move to, or why not. */
export type StatusCheck = (status: CaseStatus) => { ok: true; to: CaseStatus } | { ok: false; code: 'forbidden' | 'conflict'; message: string };

export type ReviewOutcome<T> = { ok: true; value: T } | { ok: false; code: 'not_found' | 'forbidden' | 'conflict'; message: string };

async function lockCase(trx: Transaction<DB>, orgId: string, caseId: string) {
  return trx.selectFrom('case').selectAll().where('organization_id', '=', orgId).where('id', '=', caseId).forUpdate().executeTakeFirst();
}

/** The case's snapshot in review (at most one), with who submitted it. */
function waitingSnapshot(trx: Transaction<DB>, orgId: string, caseId: string) {
  return trx
    .selectFrom('case_snapshot')
    .select(['id', 'submitted_by'])
    .where('organization_id', '=', orgId)
    .where('case_id', '=', caseId)
    .where('status', '=', 'in_review')
    .executeTakeFirst();
}

export interface FrozenValuation {
  inputs: unknown;
  model: unknown;
  result: unknown;
  engineVersion: string;
  inputHash: string;
}

/**
 * Submits the case for review: freezes `frozen` (valued from the case at `caseVersion`) and the
 * analyst's written recommendation as a snapshot and moves the case to in_review. Refused if the case changed since it was valued.
 */
export async function submitCase(
  trx: Transaction<DB>,
  args: {
    orgId: string;
    caseId: string;
    allowed: StatusCheck;
    userId: string;
    caseVersion: number;
    frozen: FrozenValuation;
    recommendation: string;
    /** When it was submitted; now unless given (the demo seed's history). */
    at?: Date;
  },
): Promise<ReviewOutcome<CaseSnapshot>> {
  const row = await lockCase(trx, args.orgId, args.caseId);
  if (!row) return { ok: false, code: 'not_found', message: NO_SUCH_CASE };
  const check = args.allowed(row.status);
  if (!check.ok) return check;
  if (row.version !== args.caseVersion)
    return { ok: false, code: 'conflict', message: 'The case was saved again while it was being valued; submit it once more.' };
  // The names the record will print, as they are now: renaming anything later changes no approved pack.
  const names = await trx
    .selectFrom('project')
    .innerJoin('organization', 'organization.id', 'project.organization_id')
    .select(['project.name as project_name', 'project.description', 'project.currency', 'organization.name as organization_name', 'organization.metadata'])
    .where('project.id', '=', row.project_id)
    .executeTakeFirstOrThrow();
  const submitter = await trx.selectFrom('user').select('name').where('id', '=', args.userId).executeTakeFirst();
  const snapshot = await trx
    .insertInto('case_snapshot')
    .values({
      organization_id: args.orgId,
      case_id: row.id,
      case_version: row.version,
      case_name: row.name,
      inputs: JSON.stringify(args.frozen.inputs),
      model: JSON.stringify(args.frozen.model),
      result: JSON.stringify(args.frozen.result),
      engine_version: args.frozen.engineVersion,
      input_hash: args.frozen.inputHash,
      submitted_by: args.userId,
      project_name: names.project_name,
      project_description: names.description,
      currency: names.currency,
      organization_name: names.organization_name,
      organization_is_demo: names.metadata?.includes('"demo":true') ?? false,
      submitted_by_name: submitter?.name ?? null,
      recommendation: args.recommendation,
      ...(args.at ? { submitted_at: args.at } : {}),
    })
    .returningAll()
    .executeTakeFirstOrThrow();
  await trx.updateTable('case').set({ status: check.to }).where('id', '=', row.id).execute();
  return { ok: true, value: snapshot };
}

/** Approves or returns the case's snapshot under review. */
export async function decideCase(
  trx: Transaction<DB>,
  args: {
    orgId: string;
    caseId: string;
    allowed: StatusCheck;
    userId: string;
    reason?: string;
    /** When it was decided; now unless given (the demo seed's history). */ at?: Date;
  },
): Promise<ReviewOutcome<CaseSnapshot>> {
  const row = await lockCase(trx, args.orgId, args.caseId);
  if (!row) return { ok: false, code: 'not_found', message: NO_SUCH_CASE };
  const check = args.allowed(row.status);
  if (!check.ok) return check;
  const waiting = await waitingSnapshot(trx, args.orgId, row.id);
  if (!waiting) return { ok: false, code: 'conflict', message: 'There is no snapshot waiting for a decision.' };
  // Four eyes: whoever submitted a version never approves or returns it, whatever their role now.
  if (waiting.submitted_by === args.userId)
    return { ok: false, code: 'forbidden', message: 'You submitted this version, so another reviewer must decide on it.' };
  const decider = await trx.selectFrom('user').select('name').where('id', '=', args.userId).executeTakeFirst();
  const snapshot = await trx
    .updateTable('case_snapshot')
    .set({
      status: check.to as 'approved' | 'returned',
      decided_by: args.userId,
      decided_by_name: decider?.name ?? null,
      decided_at: args.at ?? new Date(),
      decision_reason: args.reason ?? null,
    })
    .where('id', '=', waiting.id)
    .returningAll()
    .executeTakeFirstOrThrow();
  await trx.updateTable('case').set({ status: check.to }).where('id', '=', row.id).execute();
  return { ok: true, value: snapshot };
}

/**
 * Withdraws the submission waiting for review: only whoever submitted it may. The snapshot stays,
 * marked withdrawn with the time; the case becomes a draft again at the same version.
 */
export async function withdrawSubmission(
  trx: Transaction<DB>,
  args: { orgId: string; caseId: string; allowed: StatusCheck; userId: string },
): Promise<ReviewOutcome<CaseSnapshot>> {
  const row = await lockCase(trx, args.orgId, args.caseId);
  if (!row) return { ok: false, code: 'not_found', message: NO_SUCH_CASE };
  const check = args.allowed(row.status);
  if (!check.ok) return check;
  const waiting = await waitingSnapshot(trx, args.orgId, row.id);
  if (!waiting) return { ok: false, code: 'conflict', message: 'There is no submission waiting for review.' };
  if (waiting.submitted_by !== args.userId) return { ok: false, code: 'forbidden', message: 'Only the person who submitted this version can withdraw it.' };
  const snapshot = await trx
    .updateTable('case_snapshot')
    .set({ status: 'withdrawn', decided_at: new Date() })
    .where('id', '=', waiting.id)
    .returningAll()
    .executeTakeFirstOrThrow();
  await trx.updateTable('case').set({ status: check.to }).where('id', '=', row.id).execute();
  return { ok: true, value: snapshot };
}

export async function listSnapshots(db: Database, { orgId, caseId }: { orgId: string; caseId: string }) {
  return db
    .selectFrom('case_snapshot')
    .leftJoin('user as submitter', 'submitter.id', 'case_snapshot.submitted_by')
    .leftJoin('user as decider', 'decider.id', 'case_snapshot.decided_by')
    .select([
      'case_snapshot.id',
      'case_snapshot.case_version',
      'case_snapshot.case_name',
      'case_snapshot.submitted_by',
      'case_snapshot.status',
      'case_snapshot.submitted_at',
      'case_snapshot.decided_at',
      'case_snapshot.decision_reason',
      'case_snapshot.recommendation',
      'case_snapshot.engine_version',
      'case_snapshot.input_hash',
      'submitter.name as submitted_by_name',
      'decider.name as decided_by_name',
      sql<number>`(case_snapshot.result->>'staticNpv')::float8`.as('static_npv'),
      sql<number>`(case_snapshot.result->>'optionPremium')::float8`.as('option_premium'),
      sql<number>`(case_snapshot.result->>'expandedNpv')::float8`.as('expanded_npv'),
    ])
    .where('case_snapshot.organization_id', '=', orgId)
    .where('case_snapshot.case_id', '=', caseId)
    .orderBy('case_snapshot.submitted_at', 'desc')
    .execute();
}

export async function latestApprovedSnapshot(db: Database, { orgId, caseId }: { orgId: string; caseId: string }) {
  return db
    .selectFrom('case_snapshot')
    .selectAll()
    .where('organization_id', '=', orgId)
    .where('case_id', '=', caseId)
    .where('status', '=', 'approved')
    .orderBy('decided_at', 'desc')
    .limit(1)
    .executeTakeFirst();
}

/** The approved version before the latest: the one a new approval replaced, if any. */
export async function previousApprovedSnapshot(db: Database, { orgId, caseId }: { orgId: string; caseId: string }) {
  return db
    .selectFrom('case_snapshot')
    .select(['id', 'case_version', 'decided_at'])
    .where('organization_id', '=', orgId)
    .where('case_id', '=', caseId)
    .where('status', '=', 'approved')
    .orderBy('decided_at', 'desc')
    .offset(1)
    .limit(1)
    .executeTakeFirst();
}

/** Cases waiting for a decision, oldest submission first, with their headline figures. */
export async function listReviewQueue(db: Database, { orgId, statuses = ['in_review'] }: { orgId: string; statuses?: CaseStatus[] }) {
  return (
    db
      .selectFrom('case')
      .innerJoin('project', 'project.id', 'case.project_id')
      .innerJoin('case_snapshot', (join) => join.onRef('case_snapshot.case_id', '=', 'case.id'))
      .leftJoin('user', 'user.id', 'case_snapshot.submitted_by')
      .select([
        'case.id as caseId',
        'case.name as caseName',
        'case.status',
        'project.id as projectId',
        'project.name as projectName',
        'project.currency',
        'case_snapshot.id as snapshotId',
        'case_snapshot.submitted_at as submittedAt',
        'case_snapshot.decided_at as decidedAt',
        'user.name as submittedBy',
        sql<number>`(case_snapshot.result->>'staticNpv')::float8`.as('staticNpv'),
        sql<number>`(case_snapshot.result->>'optionPremium')::float8`.as('optionPremium'),
        sql<number>`(case_snapshot.result->>'expandedNpv')::float8`.as('expandedNpv'),
      ])
      .where('case.organization_id', '=', orgId)
      .where('case.status', 'in', statuses)
      // The snapshot that holds the case's current status: the latest one.
      .where('case_snapshot.submitted_at', '=', (eb) =>
        eb
          .selectFrom('case_snapshot as s')
          .select((e) => e.fn.max('s.submitted_at').as('m'))
          .whereRef('s.case_id', '=', 'case.id'),
      )
      .orderBy('case_snapshot.submitted_at')
      .execute()
  );
}

export const commentSections = ['general', 'cash-flows', 'uncertainty', 'flexibility', 'results', 'lattice'] as const;

export async function addComment(db: Database, args: { orgId: string; caseId: string; authorId: string; section: string; body: string }) {
  const row = await db.selectFrom('case').select(['id']).where('organization_id', '=', args.orgId).where('id', '=', args.caseId).executeTakeFirst();
  if (!row) return undefined;
  const snapshot = await db.selectFrom('case_snapshot').select('id').where('case_id', '=', row.id).orderBy('submitted_at', 'desc').limit(1).executeTakeFirst();
  return db
    .insertInto('review_comment')
    .values({
      organization_id: args.orgId,
      case_id: row.id,
      snapshot_id: snapshot?.id ?? null,
      section: args.section,
      body: args.body,
      author_id: args.authorId,
    })
    .returningAll()
    .executeTakeFirstOrThrow();
}

export async function listComments(db: Database, { orgId, caseId }: { orgId: string; caseId: string }) {
  return db
    .selectFrom('review_comment')
    .leftJoin('user', 'user.id', 'review_comment.author_id')
    .select([
      'review_comment.id',
      'review_comment.section',
      'review_comment.body',
      'review_comment.created_at',
      'review_comment.snapshot_id',
      'user.name as author',
    ])
    .where('review_comment.organization_id', '=', orgId)
    .where('review_comment.case_id', '=', caseId)
    .orderBy('review_comment.created_at')
    .execute();
}

/**
 * What a reviewer compares before deciding: the snapshot in review, the version last returned,
 * and the inputs of every approved snapshot of the case, newest first (the caller reads them in
 * today's shape to find the same inputs approved before: jsonb equality would miss a version
 * stored by an older engine). Null when nothing is in review.
 */
export async function findSubmissionContext(db: Database, { orgId, caseId }: { orgId: string; caseId: string }) {
  const ofCase = db.selectFrom('case_snapshot').where('organization_id', '=', orgId).where('case_id', '=', caseId);
  const current = await ofCase.select(['id', 'inputs', 'result', 'currency']).where('status', '=', 'in_review').executeTakeFirst();
  if (!current) return null;
  const [returned, approved] = await Promise.all([
    ofCase.select(['case_version', 'inputs', 'result', 'decided_at']).where('status', '=', 'returned').orderBy('submitted_at', 'desc').executeTakeFirst(),
    ofCase.select(['case_version', 'inputs', 'decided_at']).where('status', '=', 'approved').orderBy('decided_at', 'desc').execute(),
  ]);
  return { current, returned, approved };
}
