/**
 * Cross-checks as jobs: the row keeps the case version's model, the engine version and the seed
 * (db/queries/cross-checks.ts); the run is a job on the `cross-check` queue whose id is the
 * row's (lib/jobs/run-cross-check.ts). Started and cancelled here, each with its audit entry in
 * the same transaction.
 */
import 'server-only';
import { randomInt } from 'node:crypto';
import { db } from '@/db';
import { lockForOrganisation } from '@/db/queries/locks';
import { recordAudit } from '@/db/queries/audit';
import { findCrossCheck, insertCrossCheck, listCrossChecks } from '@/db/queries/cross-checks';
import { countRunningJobs, markJobCancelled } from '@/db/queries/job-rows';
import { ENGINE_VERSION } from '@/lattice';
import { caseToModel } from '../case-model';
import { requireCase } from '../cases/require-case';
import type { Member } from '../dal';
import type { CaseInput } from '../validations/case';
import type { CrossCheckStart } from '../validations/cross-check';
import { AppError } from '../errors';
import { cancelJob, enqueue } from '../jobs/enqueue';
import { QUEUES } from '../jobs/queues';
import { CROSS_CHECKS_PER_ORGANISATION, PATH_LIMITS } from './limits';
import { tooMuchWork, type CrossCheckResult } from './run';

type Row = NonNullable<Awaited<ReturnType<typeof findCrossCheck>>>;

const missing = () => new AppError('not_found', 'No such cross-check of this case.');

/** A cross-check as the API answers it. */
export function crossCheckAnswer(row: Row) {
  return {
    id: row.id,
    caseId: row.case_id,
    caseVersion: row.case_version,
    engineVersion: row.engine_version,
    paths: row.paths,
    seed: row.seed,
    status: row.status,
    progress: row.progress,
    result: row.result as CrossCheckResult | null,
    error: row.error,
    createdAt: row.created_at,
    finishedAt: row.finished_at,
  };
}

export async function readCrossCheck(member: Member, caseId: string, id: string) {
  await requireCase(db, member.orgId, caseId);
  const row = await findCrossCheck(db, { orgId: member.orgId, caseId, id });
  if (!row) throw missing();
  return crossCheckAnswer(row);
}

export async function readCrossChecks(member: Member, caseId: string) {
  await requireCase(db, member.orgId, caseId);
  return (await listCrossChecks(db, { orgId: member.orgId, caseId, limit: 20 })).map(crossCheckAnswer);
}

export async function startCrossCheck(member: Member, caseId: string, request: CrossCheckStart): Promise<string> {
  const args = { orgId: member.orgId, userId: member.userId };
  const found = await requireCase(db, member.orgId, caseId);
  const { model } = caseToModel({ name: found.name, cashFlows: found.cash_flows, settings: found.settings, options: found.options } as CaseInput);
  const paths = request.paths ?? PATH_LIMITS.default;
  const seed = request.seed ?? randomInt(0, 2 ** 31 - 1);
  const refusal = tooMuchWork(model, paths);
  if (refusal) throw new AppError('unprocessable', refusal, { paths: [refusal] });
  return db.transaction().execute(async (trx) => {
    // One organisation's requests are counted one at a time (the lock), so the limit holds under a burst.
    await lockForOrganisation(trx, 'cross_check', args.orgId);
    if ((await countRunningJobs(trx, 'cross_check', { orgId: args.orgId })) >= CROSS_CHECKS_PER_ORGANISATION)
      throw new AppError(
        'rate_limited',
        `Your organisation already has ${CROSS_CHECKS_PER_ORGANISATION} cross-checks waiting or running; wait for one to finish, or cancel one, and try again.`,
        undefined,
        15,
      );
    const id = await insertCrossCheck(trx, {
      orgId: args.orgId,
      caseId: found.id,
      caseVersion: found.version,
      engineVersion: ENGINE_VERSION,
      model,
      paths,
      seed,
      userId: args.userId,
    });
    await recordAudit(trx, {
      orgId: args.orgId,
      actorId: args.userId,
      action: 'case.cross_check',
      subjectType: 'case',
      subjectId: found.id,
      detail: { name: found.name, version: found.version, crossCheck: id, paths, seed },
    });
    await enqueue(QUEUES.crossCheck, { crossCheckId: id }, { executor: trx, id });
    return id;
  });
}

/** Cancels a running cross-check and withdraws its job; 409 when it had already ended. */
export async function cancelCrossCheck(member: Member, caseId: string, id: string): Promise<void> {
  const current = await readCrossCheck(member, caseId, id);
  const cancelled = await db.transaction().execute(async (trx) => {
    if (!(await markJobCancelled(trx, 'cross_check', { orgId: member.orgId, id }))) return false;
    await cancelJob(QUEUES.crossCheck, id, trx);
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.cross_check_cancel',
      subjectType: 'case',
      subjectId: caseId,
      detail: { crossCheck: id },
    });
    return true;
  });
  if (!cancelled) throw new AppError('conflict', `The cross-check has already ended (${current.status}).`);
}
