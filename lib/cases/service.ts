/**
 * Cases as routes change them: each change and its audit entry in one transaction, every lookup
 * scoped to the member's organisation (another organisation's case is "no such case", 404).
 * Valuing, duplicating, submitting and deciding live in their own modules for now
 * (lib/store-valuation.ts, lib/review/).
 */
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import {
  createCase as insertCase,
  deleteCaseWithoutReviews,
  duplicateCase as copyCase,
  findCase,
  listCases as listCasesOfProject,
  listCasesWithProjects,
  saveCase as updateCase,
  startRevision,
  type CaseContent,
} from '@/db/queries/cases';
import { latestRunByCase, listProjectActivity } from '@/db/queries/summaries';
import type { Case } from '@/db/types';
import type { Member } from '../dal';
import { AppError } from '../errors';
import { readProject } from '../projects/service';
import { statusLabels } from '../review/transitions';
import { missingCase, requireCase } from './require-case';

export async function listCases(member: Member) {
  return listCasesWithProjects(db, { orgId: member.orgId });
}

/** A project's cases, each with its latest stored valuation (null before any). */
export async function listProjectCases(member: Member, projectId: string) {
  await readProject(member, projectId);
  return casesWithLatestRun({ orgId: member.orgId, projectId });
}

/**
 * What a project's page shows: the project, its cases with their latest valuations and its audit
 * trail, the project read once (it is the check that the member may see the rest).
 */
export async function readProjectOverview(member: Member, projectId: string) {
  const project = await readProject(member, projectId);
  const scope = { orgId: member.orgId, projectId };
  const [cases, activity] = await Promise.all([casesWithLatestRun(scope), listProjectActivity(db, scope)]);
  return { project, cases, activity };
}

/** Only after the caller has read the project, which checks the member may see it. */
async function casesWithLatestRun(scope: { orgId: string; projectId: string }) {
  const [cases, latest] = await Promise.all([listCasesOfProject(db, scope), latestRunByCase(db, scope)]);
  return cases.map((c) => ({ stored: c, latest: latest.get(c.id) ?? null }));
}

export async function createCase(member: Member, projectId: string, content: CaseContent): Promise<Case> {
  return db.transaction().execute(async (trx) => {
    const made = await insertCase(trx, { orgId: member.orgId, projectId, createdBy: member.userId, content });
    if (!made) throw new AppError('not_found', 'No such project in your organisation.');
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.create',
      subjectType: 'case',
      subjectId: made.id,
      detail: { name: content.name, projectId },
    });
    return made;
  });
}

/** Copies a case into a new, independent draft of the same project. */
export async function duplicateCase(member: Member, caseId: string, name: string): Promise<Case> {
  return db.transaction().execute(async (trx) => {
    const copy = await copyCase(trx, { orgId: member.orgId, caseId, name, createdBy: member.userId });
    if (!copy) throw missingCase();
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.duplicate',
      subjectType: 'case',
      subjectId: copy.id,
      detail: { from: caseId, name: copy.name, projectId: copy.project_id },
    });
    return copy;
  });
}

export async function readCase(member: Member, caseId: string): Promise<Case> {
  return requireCase(db, member.orgId, caseId);
}

/**
 * Saves a case's content on the version it was based on (409 when someone saved since, or when
 * it is in review or approved), with the audit entry `action` and its detail. `undone` ends each
 * refusal: what did not happen ("Nothing was changed.").
 */
export async function saveCase(
  member: Member,
  caseId: string,
  args: { expectedVersion: number; content: CaseContent; action: string; detail: Record<string, unknown>; undone: string },
): Promise<Case> {
  return db.transaction().execute(async (trx) => {
    const saved = await updateCase(trx, { orgId: member.orgId, caseId, expectedVersion: args.expectedVersion, content: args.content });
    if (!saved.ok && saved.reason === 'not_found') throw missingCase();
    if (!saved.ok && saved.reason === 'in_review')
      throw new AppError('conflict', `This case is in review and cannot be edited until a reviewer returns it. ${args.undone}`);
    if (!saved.ok && saved.reason === 'approved')
      throw new AppError(
        'conflict',
        `This case is approved: start a revision to change it (the approved version and its board pack stay as they are). ${args.undone}`,
      );
    if (!saved.ok)
      throw new AppError(
        'conflict',
        `This case was saved by someone else meanwhile (now version ${saved.currentVersion}); reload it and try again. Nothing was overwritten.`,
      );
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: args.action,
      subjectType: 'case',
      subjectId: saved.row.id,
      detail: { version: saved.row.version, name: saved.row.name, ...args.detail },
    });
    return saved.row;
  });
}

export async function deleteCase(member: Member, caseId: string): Promise<void> {
  await db.transaction().execute(async (trx) => {
    const gone = await deleteCaseWithoutReviews(trx, { orgId: member.orgId, caseId });
    if (!gone) {
      if (await findCase(trx, { orgId: member.orgId, caseId }))
        throw new AppError(
          'conflict',
          'This case has been submitted for review, so its record is kept: it cannot be deleted. Duplicate it to start a new version.',
        );
      throw missingCase();
    }
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.delete',
      subjectType: 'case',
      subjectId: caseId,
      detail: { name: gone.name, projectId: gone.project_id },
    });
  });
}

/** Starts a revision of an approved case: a draft at the next version (the approved snapshot and its pack stay). */
export async function reviseCase(member: Member, caseId: string): Promise<Case> {
  return db.transaction().execute(async (trx) => {
    const revised = await startRevision(trx, { orgId: member.orgId, caseId });
    if (!revised) {
      const found = await requireCase(trx, member.orgId, caseId);
      throw new AppError('conflict', `Only an approved case is revised; this one is ${statusLabels[found.status].toLowerCase()} and can be edited as it is.`);
    }
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.revise',
      subjectType: 'case',
      subjectId: revised.id,
      detail: { name: revised.name, version: revised.version },
    });
    return revised;
  });
}
