/**
 * Read models for the portfolio and project pages: each project or case with the headline
 * figures of its latest stored valuation run, and the case version those figures are of (a
 * submission stores its run, so a case in review or approved shows its submitted figures). The figures are read out of the stored result
 * in SQL (`result->>'…'`), so a listing never ships whole lattice results to the app.
 */
import { sql } from 'kysely';
import type { Database } from '../index';

export interface Headline {
  runId: string;
  caseId: string;
  caseName: string;
  /** The case version these figures are of, and the case's version now (later when edited since). */
  caseVersion: number;
  currentVersion: number;
  /** The engine that computed them (an older one than today's is flagged, with a re-value). */
  engineVersion: string;
  staticNpv: number;
  optionPremium: number;
  expandedNpv: number;
  valuedAt: Date;
}

const figure = (key: string) => sql<number>`(valuation_run.result->>${sql.lit(key)})::float8`;

/** The latest run of every case of the organisation (optionally of one project), newest first. */
function latestRuns(db: Database, orgId: string, projectId?: string) {
  let query = db
    .selectFrom('valuation_run')
    .innerJoin('case', 'case.id', 'valuation_run.case_id')
    .distinctOn('valuation_run.case_id')
    .select([
      'valuation_run.id as runId',
      'valuation_run.case_id as caseId',
      'case.name as caseName',
      'valuation_run.case_version as caseVersion',
      'valuation_run.engine_version as engineVersion',
      'case.version as currentVersion',
      'case.project_id as projectId',
      'case.created_at as caseCreatedAt',
      'valuation_run.created_at as valuedAt',
      figure('staticNpv').as('staticNpv'),
      figure('optionPremium').as('optionPremium'),
      figure('expandedNpv').as('expandedNpv'),
    ])
    .where('valuation_run.organization_id', '=', orgId)
    .orderBy('valuation_run.case_id')
    .orderBy('valuation_run.created_at', 'desc');
  if (projectId) query = query.where('case.project_id', '=', projectId);
  return query.execute();
}

/** The project's most recently approved snapshot: what the committee last approved, and its board pack. */
export interface Approval {
  snapshotId: string;
  caseId: string;
  caseName: string;
  caseVersion: number;
  staticNpv: number;
  optionPremium: number;
  /** The premium's two parts (the engine's premiumSplit); null when the approved run has no split. */
  betterPlan: number | null;
  flexibility: number | null;
  expandedNpv: number;
  decidedAt: Date;
}

/** The latest approved snapshot of every project of the organisation, keyed by project id. */
async function latestApprovals(db: Database, orgId: string): Promise<Map<string, Approval>> {
  const rows = await db
    .selectFrom('case_snapshot')
    .innerJoin('case', 'case.id', 'case_snapshot.case_id')
    .distinctOn('case.project_id')
    .select([
      'case.project_id as projectId',
      'case_snapshot.id as snapshotId',
      'case_snapshot.case_id as caseId',
      'case_snapshot.case_name as caseName',
      'case_snapshot.case_version as caseVersion',
      'case_snapshot.decided_at as decidedAt',
      sql<number>`(case_snapshot.result->>'staticNpv')::float8`.as('staticNpv'),
      sql<number>`(case_snapshot.result->>'optionPremium')::float8`.as('optionPremium'),
      sql<number | null>`(case_snapshot.result->'premiumSplit'->>'betterPlan')::float8`.as('betterPlan'),
      sql<number | null>`(case_snapshot.result->'premiumSplit'->>'uncertainty')::float8`.as('flexibility'),
      sql<number>`(case_snapshot.result->>'expandedNpv')::float8`.as('expandedNpv'),
    ])
    .where('case_snapshot.organization_id', '=', orgId)
    .where('case_snapshot.status', '=', 'approved')
    .orderBy('case.project_id')
    .orderBy('case_snapshot.decided_at', 'desc')
    .execute();
  return new Map(rows.map(({ projectId, decidedAt, ...rest }) => [projectId, { ...rest, decidedAt: decidedAt! }]));
}

export interface ProjectSummary {
  id: string;
  name: string;
  description: string;
  currency: string;
  status: 'active' | 'archived';
  ownerName: string | null;
  caseCount: number;
  updatedAt: Date;
  /** The latest run of the project's first valued case (its base case), or null when no case has been valued. */
  latest: Headline | null;
  /** The last approval of any of its cases, or null when none was approved. */
  approved: Approval | null;
  /** How many of its cases wait for a review decision now. */
  inReview: number;
}

export async function listProjectSummaries(db: Database, { orgId }: { orgId: string }): Promise<ProjectSummary[]> {
  const projects = await db
    .selectFrom('project')
    .leftJoin('user', 'user.id', 'project.owner_id')
    .select((eb) => [
      'project.id',
      'project.name',
      'project.description',
      'project.currency',
      'project.status',
      'project.updated_at',
      'user.name as ownerName',
      eb
        .selectFrom('case')
        .select(sql<number>`count(*)::int`.as('n'))
        .whereRef('case.project_id', '=', 'project.id')
        .as('caseCount'),
      eb
        .selectFrom('case')
        .select(sql<number>`count(*)::int`.as('n'))
        .whereRef('case.project_id', '=', 'project.id')
        .where('case.status', '=', 'in_review')
        .as('inReview'),
    ])
    .where('project.organization_id', '=', orgId)
    .orderBy('project.name')
    .execute();
  const runs = await latestRuns(db, orgId);
  const approvals = await latestApprovals(db, orgId);
  return projects.map((p) => {
    // The base case speaks for the project: scenarios are read on the project's own page.
    const mine = runs.filter((r) => r.projectId === p.id).sort((a, b) => +a.caseCreatedAt - +b.caseCreatedAt);
    const latest = mine[0] ? toHeadline(mine[0]) : null;
    return {
      id: p.id,
      name: p.name,
      description: p.description,
      currency: p.currency,
      status: p.status,
      ownerName: p.ownerName,
      caseCount: p.caseCount ?? 0,
      updatedAt: p.updated_at,
      latest,
      approved: approvals.get(p.id) ?? null,
      inReview: p.inReview ?? 0,
    };
  });
}

function toHeadline(r: Awaited<ReturnType<typeof latestRuns>>[number]): Headline {
  return {
    runId: r.runId,
    caseId: r.caseId,
    caseName: r.caseName,
    caseVersion: r.caseVersion,
    currentVersion: r.currentVersion,
    engineVersion: r.engineVersion,
    staticNpv: r.staticNpv,
    optionPremium: r.optionPremium,
    expandedNpv: r.expandedNpv,
    valuedAt: r.valuedAt,
  };
}

/** Each case's latest run, keyed by case id, for one project. */
export async function latestRunByCase(db: Database, { orgId, projectId }: { orgId: string; projectId: string }): Promise<Map<string, Headline>> {
  const runs = await latestRuns(db, orgId, projectId);
  return new Map(runs.map((r) => [r.caseId, toHeadline(r)]));
}

/** The audit trail of a project and its cases, newest first. */
export async function listProjectActivity(db: Database, { orgId, projectId, limit = 30 }: { orgId: string; projectId: string; limit?: number }) {
  return db
    .selectFrom('audit_log')
    .leftJoin('user', 'user.id', 'audit_log.actor_id')
    .select([
      'audit_log.id',
      'audit_log.action',
      'audit_log.subject_type',
      'audit_log.subject_id',
      'audit_log.detail',
      'audit_log.created_at',
      'user.name as actorName',
    ])
    .where('audit_log.organization_id', '=', orgId)
    .where((eb) =>
      eb.or([
        eb.and([eb('audit_log.subject_type', '=', 'project'), eb('audit_log.subject_id', '=', projectId)]),
        eb.and([
          eb('audit_log.subject_type', '=', 'case'),
          eb('audit_log.subject_id', 'in', eb.selectFrom('case').select('case.id').where('case.project_id', '=', projectId)),
        ]),
        eb.and([eb('audit_log.subject_type', '=', 'case'), sql<boolean>`audit_log.detail->>'projectId' = ${projectId}`]),
      ]),
    )
    .orderBy('audit_log.created_at', 'desc')
    .orderBy('audit_log.id', 'desc')
    .limit(limit)
    .execute();
}
