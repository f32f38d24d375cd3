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
