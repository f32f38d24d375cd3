/**
 * Projects as the API and pages change them: each change and its audit entry in one
 * transaction, every lookup scoped to the member's organisation (another organisation's project
 * is "no such project", 404).
 */
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { createProject as insertProject, deleteProjectWithoutReviews, findProject, updateProject as changeProject } from '@/db/queries/projects';
import { findSettings } from '@/db/queries/settings';
import { listProjectActivity, listProjectSummaries } from '@/db/queries/summaries';
import type { Project } from '@/db/types';
import type { Member } from '../dal';
import { AppError } from '../errors';
import type { ProjectCreate, ProjectUpdate } from '../validations/project';

const missing = () => new AppError('not_found', 'No such project in your organisation.');

export async function listProjects(member: Member) {
  return listProjectSummaries(db, { orgId: member.orgId });
}

export async function readProject(member: Member, projectId: string): Promise<Project> {
  const project = await findProject(db, { orgId: member.orgId, projectId });
  if (!project) throw missing();
  return project;
}

export async function createProject(member: Member, body: ProjectCreate): Promise<Project> {
  const currency = body.currency ?? (await findSettings(db, { orgId: member.orgId })).currency;
  return db.transaction().execute(async (trx) => {
    const project = await insertProject(trx, { orgId: member.orgId, ownerId: member.userId, name: body.name, description: body.description, currency });
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'project.create',
      subjectType: 'project',
      subjectId: project.id,
      detail: { name: body.name },
    });
    return project;
  });
}

export async function updateProject(member: Member, projectId: string, change: ProjectUpdate): Promise<Project> {
  return db.transaction().execute(async (trx) => {
    const project = await changeProject(trx, { orgId: member.orgId, projectId, change });
    if (!project) throw missing();
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'project.update',
      subjectType: 'project',
      subjectId: project.id,
      detail: change,
    });
    return project;
  });
}

export async function deleteProject(member: Member, projectId: string): Promise<void> {
  await db.transaction().execute(async (trx) => {
    const name = await deleteProjectWithoutReviews(trx, { orgId: member.orgId, projectId });
    if (name === undefined) {
      if (await findProject(trx, { orgId: member.orgId, projectId }))
        throw new AppError(
          'conflict',
          'A case of this project has been submitted for review, so the project keeps its record: archive it instead of deleting it.',
        );
      throw missing();
    }
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'project.delete',
      subjectType: 'project',
      subjectId: projectId,
      detail: { name },
    });
  });
}

/** The audit trail of a project and its cases, newest first. */
export async function readProjectActivity(member: Member, projectId: string) {
  await readProject(member, projectId);
  return listProjectActivity(db, { orgId: member.orgId, projectId });
}
