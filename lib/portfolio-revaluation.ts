/**
 * Re-valuing a portfolio, the app's side: a request row and its job are written in one
 * transaction (one request running per organisation at a time). A request whose job the queue
 * gave up on is marked failed by the worker (lib/jobs/revalue-portfolio.ts).
 */
import 'server-only';
import { sql } from 'kysely';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { AppError } from './errors';
import { enqueue } from './jobs/enqueue';
import { QUEUES } from './jobs/queues';

export async function startRevaluation(actor: { orgId: string; userId: string }): Promise<string> {
  return db.transaction().execute(async (trx) => {
    await sql`select pg_advisory_xact_lock(hashtext('portfolio_revaluation'), hashtext(${actor.orgId}))`.execute(trx);
    const running = await trx
      .selectFrom('portfolio_revaluation')
      .select('id')
      .where('organization_id', '=', actor.orgId)
      .where('status', '=', 'running')
      .executeTakeFirst();
    if (running) throw new AppError('conflict', 'A re-valuation of this portfolio is already running; wait for it to finish.');
    const row = await trx
      .insertInto('portfolio_revaluation')
      .values({ organization_id: actor.orgId, requested_by: actor.userId })
      .returning('id')
      .executeTakeFirstOrThrow();
    await recordAudit(trx, {
      orgId: actor.orgId,
      actorId: actor.userId,
      action: 'portfolio.revalue',
      subjectType: 'organization',
      subjectId: actor.orgId,
      detail: { revaluation: row.id },
    });
    await enqueue(QUEUES.revaluation, { revaluationId: row.id, orgId: actor.orgId, userId: actor.userId }, { executor: trx, id: row.id });
    return row.id;
  });
}

export async function findRevaluation(orgId: string, id: string) {
  return db.selectFrom('portfolio_revaluation').selectAll().where('organization_id', '=', orgId).where('id', '=', id).executeTakeFirst();
}
