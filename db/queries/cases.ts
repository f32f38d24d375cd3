/**
 * Cases: named scenarios of a project, each edited independently. Every save names the version
 * it was based on; a save against a stale version changes nothing and reports a conflict, so
 * two people editing one case never overwrite each other silently.
 */
import type { Database } from '../index';
import type { Case } from '../types';

export interface CaseContent {
  name: string;
  cashFlows: unknown;
  settings: unknown;
  options: unknown[];
}

export type CaseSave = { ok: true; row: Case } | { ok: false; reason: 'not_found' | 'conflict' | 'in_review' | 'approved'; currentVersion?: number };

export async function createCase(db: Database, args: { orgId: string; projectId: string; createdBy: string; content: CaseContent }): Promise<Case | undefined> {
  const project = await db.selectFrom('project').select('id').where('organization_id', '=', args.orgId).where('id', '=', args.projectId).executeTakeFirst();
  if (!project) return undefined;
  return db
    .insertInto('case')
    .values({
      organization_id: args.orgId,
      project_id: project.id,
      name: args.content.name,
      cash_flows: JSON.stringify(args.content.cashFlows),
      settings: JSON.stringify(args.content.settings),
      options: JSON.stringify(args.content.options),
      created_by: args.createdBy,
    })
    .returningAll()
    .executeTakeFirstOrThrow();
}

/** What every lookup of a case that is not there (or is another organisation's) answers. */
export const NO_SUCH_CASE = 'No such case in your organisation.';

export async function findCase(db: Database, { orgId, caseId }: { orgId: string; caseId: string }): Promise<Case | undefined> {
  return db.selectFrom('case').selectAll().where('organization_id', '=', orgId).where('id', '=', caseId).executeTakeFirst();
}

export async function listCases(db: Database, { orgId, projectId }: { orgId: string; projectId: string }): Promise<Case[]> {
  return db.selectFrom('case').selectAll().where('organization_id', '=', orgId).where('project_id', '=', projectId).orderBy('created_at').execute();
}

/**
 * Saves new content if the case is still at `expectedVersion` and editable (a draft or returned),
 * and moves it to the next version. A case in review waits for its reviewer; an approved case
 * is changed only through an explicit revision (`startRevision`), so no keystroke quietly turns
 * an approved case into a draft (lib/review/transitions.ts).
 */
export async function saveCase(db: Database, args: { orgId: string; caseId: string; expectedVersion: number; content: CaseContent }): Promise<CaseSave> {
  const row = await db
    .updateTable('case')
    .set((eb) => ({
      name: args.content.name,
      cash_flows: JSON.stringify(args.content.cashFlows),
      settings: JSON.stringify(args.content.settings),
      options: JSON.stringify(args.content.options),
      version: eb('version', '+', 1),
      status: 'draft' as const,
      updated_at: new Date(),
    }))
    .where('organization_id', '=', args.orgId)
    .where('id', '=', args.caseId)
    .where('version', '=', args.expectedVersion)
    .where('status', 'in', ['draft', 'returned'])
    .returningAll()
    .executeTakeFirst();
  if (row) return { ok: true, row };
  const current = await findCase(db, { orgId: args.orgId, caseId: args.caseId });
  if (!current) return { ok: false, reason: 'not_found' };
  const reason = current.status === 'in_review' ? 'in_review' : current.status === 'approved' ? 'approved' : 'conflict';
  return { ok: false, reason, currentVersion: current.version };
}

/**
 * Starts a revision of an approved case: it becomes a draft at the next version, to be edited
 * and submitted again. The approved snapshot, its figures and its board pack stay as they are.
 * Undefined when the case is not approved (or not in the organisation).
 */
export async function startRevision(db: Database, args: { orgId: string; caseId: string }): Promise<Case | undefined> {
  return db
    .updateTable('case')
    .set((eb) => ({ status: 'draft' as const, version: eb('version', '+', 1), updated_at: new Date() }))
    .where('organization_id', '=', args.orgId)
    .where('id', '=', args.caseId)
    .where('status', '=', 'approved')
    .returningAll()
    .executeTakeFirst();
}

/** A copy of a case, as a new case at version 1 under the same project. */
export async function duplicateCase(db: Database, args: { orgId: string; caseId: string; name: string; createdBy: string }): Promise<Case | undefined> {
  const source = await findCase(db, args);
  if (!source) return undefined;
  return createCase(db, {
    orgId: args.orgId,
    projectId: source.project_id,
    createdBy: args.createdBy,
    content: { name: args.name, cashFlows: source.cash_flows, settings: source.settings, options: source.options },
  });
}

/** Every case of the organisation with its project, for pickers (by project name, then age). */
export async function listCasesWithProjects(db: Database, { orgId }: { orgId: string }) {
  return db
    .selectFrom('case')
    .innerJoin('project', 'project.id', 'case.project_id')
    .select(['case.id', 'case.name', 'case.status', 'project.id as projectId', 'project.name as projectName'])
    .where('case.organization_id', '=', orgId)
    .orderBy('project.name')
    .orderBy('case.created_at')
    .execute();
}

/** Cases of the organisation with their project's name and currency (the review e-mails, the comparison); missing ids are left out. */
export async function findCasesWithProject(db: Database, { orgId, caseIds }: { orgId: string; caseIds: string[] }) {
  if (caseIds.length === 0) return [];
  return db
    .selectFrom('case')
    .innerJoin('project', 'project.id', 'case.project_id')
    .selectAll('case')
    .select(['project.name as project_name', 'project.currency'])
    .where('case.organization_id', '=', orgId)
    .where('case.id', 'in', caseIds)
    .execute();
}

/**
 * Deletes a case unless it was ever submitted (its review record is kept: such a case is never
 * deleted); its name and project when it was deleted.
 */
export async function deleteCaseWithoutReviews(db: Database, { orgId, caseId }: { orgId: string; caseId: string }) {
  return db
    .deleteFrom('case')
    .where('organization_id', '=', orgId)
    .where('id', '=', caseId)
    .where((eb) => eb.not(eb.exists(eb.selectFrom('case_snapshot').select('case_snapshot.id').whereRef('case_snapshot.case_id', '=', 'case.id'))))
    .returning(['name', 'project_id'])
    .executeTakeFirst();
}
