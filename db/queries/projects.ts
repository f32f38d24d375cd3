/** Projects, always scoped by organisation. */
import type { Database } from '../index';
import type { Project } from '../types';

export async function createProject(
  db: Database,
  args: { orgId: string; ownerId: string; name: string; description?: string; currency: string },
): Promise<Project> {
  return db
    .insertInto('project')
    .values({ organization_id: args.orgId, owner_id: args.ownerId, name: args.name, description: args.description ?? '', currency: args.currency })
    .returningAll()
    .executeTakeFirstOrThrow();
}

export async function listProjects(db: Database, { orgId }: { orgId: string }): Promise<Project[]> {
  return db.selectFrom('project').selectAll().where('organization_id', '=', orgId).orderBy('name').execute();
}

export async function findProject(db: Database, { orgId, projectId }: { orgId: string; projectId: string }): Promise<Project | undefined> {
  return db.selectFrom('project').selectAll().where('organization_id', '=', orgId).where('id', '=', projectId).executeTakeFirst();
}

/** A project of the organisation by its exact name (the demo seed leaves one that exists alone). */
export async function findProjectByName(db: Database, { orgId, name }: { orgId: string; name: string }): Promise<Project | undefined> {
  return db.selectFrom('project').selectAll().where('organization_id', '=', orgId).where('name', '=', name).executeTakeFirst();
}

export async function updateProject(
  db: Database,
  { orgId, projectId, change }: { orgId: string; projectId: string; change: Partial<Pick<Project, 'name' | 'description' | 'status'>> },
): Promise<Project | undefined> {
  return db
    .updateTable('project')
    .set({ ...change, updated_at: new Date() })
    .where('organization_id', '=', orgId)
    .where('id', '=', projectId)
    .returningAll()
    .executeTakeFirst();
}

/**
 * Deletes a project with its cases unless one of them was ever submitted (review records are
 * kept: such a project is archived instead); its name when it was deleted.
 */
export async function deleteProjectWithoutReviews(db: Database, { orgId, projectId }: { orgId: string; projectId: string }): Promise<string | undefined> {
  const gone = await db
    .deleteFrom('project')
    .where('organization_id', '=', orgId)
    .where('id', '=', projectId)
    .where((eb) =>
      eb.not(
        eb.exists(
          eb
            .selectFrom('case_snapshot')
            .innerJoin('case', 'case.id', 'case_snapshot.case_id')
            .select('case_snapshot.id')
            .whereRef('case.project_id', '=', 'project.id'),
        ),
      ),
    )
    .returning('name')
    .executeTakeFirst();
  return gone?.name;
}
