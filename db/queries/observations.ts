/** Dated observations of a followed case's project value, per organisation. */
import { sql } from 'kysely';
import type { Database } from '../index';

export async function addObservation(
  db: Database,
  args: { orgId: string; caseId: string; observedOn: string; value: number; note: string; source: string; recordedBy: string },
) {
  return db
    .insertInto('case_observation')
    .values({
      organization_id: args.orgId,
      case_id: args.caseId,
      observed_on: args.observedOn,
      value: args.value,
      note: args.note,
      source: args.source,
      recorded_by: args.recordedBy,
    })
    .returning(['id'])
    .executeTakeFirstOrThrow();
}

/** The case's observations, oldest date first (the latest is the last). */
export async function listObservations(db: Database, { orgId, caseId }: { orgId: string; caseId: string }) {
  return db
    .selectFrom('case_observation')
    .leftJoin('user', 'user.id', 'case_observation.recorded_by')
    .select([
      'case_observation.id',
      sql<string>`case_observation.observed_on::text`.as('observedOn'),
      'case_observation.value',
      'case_observation.note',
      'case_observation.source',
      'case_observation.created_at as recordedAt',
      'user.name as recordedBy',
    ])
    .where('case_observation.organization_id', '=', orgId)
    .where('case_observation.case_id', '=', caseId)
    .orderBy('case_observation.observed_on')
    .orderBy('case_observation.created_at')
    .execute();
}

/** The latest approved snapshot of every case of the organisation, with its project: the models followed. */
export async function listFollowedSnapshots(db: Database, { orgId }: { orgId: string }) {
  const rows = await db
    .selectFrom('case_snapshot')
    .innerJoin('case', 'case.id', 'case_snapshot.case_id')
    .innerJoin('project', 'project.id', 'case.project_id')
    .distinctOn('case_snapshot.case_id')
    .selectAll('case_snapshot')
    .select(['project.id as projectId', 'project.name as projectName', 'project.currency as projectCurrency'])
    .where('case_snapshot.organization_id', '=', orgId)
    .where('case_snapshot.status', '=', 'approved')
    .where('project.status', '=', 'active')
    .orderBy('case_snapshot.case_id')
    .orderBy('case_snapshot.decided_at', 'desc')
    .execute();
  return rows.map(({ projectId, projectName, projectCurrency, ...snapshot }) => ({
    caseId: snapshot.case_id,
    caseName: snapshot.case_name,
    projectId,
    projectName,
    currency: snapshot.currency ?? projectCurrency,
    snapshot,
  }));
}

/** Every case, across organisations, with an approved version in an active project: what the daily check looks at. */
export async function listAllFollowedCases(db: Database) {
  return db
    .selectFrom('case_snapshot')
    .innerJoin('case', 'case.id', 'case_snapshot.case_id')
    .innerJoin('project', 'project.id', 'case.project_id')
    .select(['case_snapshot.organization_id as orgId', 'case_snapshot.case_id as caseId'])
    .distinct()
    .where('case_snapshot.status', '=', 'approved')
    .where('project.status', '=', 'active')
    .execute();
}
