/** What a validation report reads besides the case: the names it prints and the version's latest cross-check. */
import type { Database } from '../index';

export async function findReportNames(db: Database, { orgId, projectId }: { orgId: string; projectId: string }) {
  const row = await db
    .selectFrom('project')
    .innerJoin('organization', 'organization.id', 'project.organization_id')
    .select(['project.name as project_name', 'project.currency', 'organization.name as organization_name', 'organization.metadata'])
    .where('project.organization_id', '=', orgId)
    .where('project.id', '=', projectId)
    .executeTakeFirstOrThrow();
  return { projectName: row.project_name, currency: row.currency, organisation: row.organization_name, isDemo: row.metadata?.includes('"demo":true') ?? false };
}

/** The newest finished cross-check of one version of a case, if any. */
export async function latestFinishedCrossCheck(db: Database, { orgId, caseId, caseVersion }: { orgId: string; caseId: string; caseVersion: number }) {
  return db
    .selectFrom('cross_check')
    .select(['id', 'paths', 'seed', 'engine_version', 'result', 'created_at'])
    .where('organization_id', '=', orgId)
    .where('case_id', '=', caseId)
    .where('case_version', '=', caseVersion)
    .where('status', '=', 'done')
    .orderBy('created_at', 'desc')
    .limit(1)
    .executeTakeFirst();
}
