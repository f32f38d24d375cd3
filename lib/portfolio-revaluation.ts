/**
 * Re-valuing a portfolio, the app's side: a request row and its job are written in one
 * transaction (one request running per organisation at a time). A request whose job the queue
 * gave up on is marked failed by the worker (lib/jobs/revalue-portfolio.ts).
 */
import 'server-only';
import { db } from '@/db';
import { lockForOrganisation } from '@/db/queries/locks';
import { recordAudit } from '@/db/queries/audit';
import { findRevaluation as findRevaluationRow, findRunningRevaluation, insertRevaluation } from '@/db/queries/revaluations';
import { AppError } from './errors';
import { enqueue } from './jobs/enqueue';
import { QUEUES } from './jobs/queues';

export async function startRevaluation(actor: { orgId: string; userId: string }): Promise<string> {
  return db.transaction().execute(async (trx) => {
    await lockForOrganisation(trx, 'portfolio_revaluation', actor.orgId);
    if (await findRunningRevaluation(trx, { orgId: actor.orgId }))
      throw new AppError('conflict', 'A re-valuation of this portfolio is already running; wait for it to finish.');
    const id = await insertRevaluation(trx, { orgId: actor.orgId, userId: actor.userId });
    await recordAudit(trx, {
      orgId: actor.orgId,
      actorId: actor.userId,
      action: 'portfolio.revalue',
      subjectType: 'organization',
      subjectId: actor.orgId,
      detail: { revaluation: id },
    });
    await enqueue(QUEUES.revaluation, { revaluationId: id, orgId: actor.orgId, userId: actor.userId }, { executor: trx, id });
    return id;
  });
}

export async function findRevaluation(orgId: string, id: string) {
  return findRevaluationRow(db, { orgId, id });
}
