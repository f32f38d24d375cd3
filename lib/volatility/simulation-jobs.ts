/**
 * Monte Carlo volatility estimates as jobs: a row in `volatility_simulation` holds the
 * specification (with its seed), progress, status and result, so any app server can report on a
 * run; the run itself is a worker thread of the server that started it. Progress is written as
 * it arrives (about fifty times a run); a run whose row was marked cancelled — by this server or
 * another — is stopped at its next progress report.
 */
import 'server-only';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import { db } from '@/db';
import { recordAudit, type AuditEvent } from '@/db/queries/audit';
import type { CashFlowSchedule } from '../cash-flows';
import type { SimulationResult, SimulationSpec } from './monte-carlo';

const running = new Map<string, Worker>();
const workerFile = () => path.join(/*turbopackIgnore: true*/ process.cwd(), '.data', 'simulation-worker.mjs');

async function finish(id: string, values: { status: 'done' | 'failed'; result?: SimulationResult; error?: string }) {
  running.delete(id);
  await db
    .updateTable('volatility_simulation')
    .set({
      status: values.status,
      progress: values.status === 'done' ? 1 : undefined,
      result: values.result ? JSON.stringify(values.result) : null,
      error: values.error ?? null,
      finished_at: new Date(),
    })
    .where('id', '=', id)
    .where('status', '=', 'running')
    .execute();
}

export async function startSimulation(args: {
  orgId: string;
  caseId: string;
  userId: string;
  schedule: CashFlowSchedule;
  spec: SimulationSpec;
  /** The audit entry for the new run, written in the transaction that stores it. */
  audit: (simulationId: string) => AuditEvent;
}): Promise<string> {
  const row = await db.transaction().execute(async (trx) => {
    const row = await trx
      .insertInto('volatility_simulation')
      .values({ organization_id: args.orgId, case_id: args.caseId, spec: JSON.stringify(args.spec), created_by: args.userId })
      .returning('id')
      .executeTakeFirstOrThrow();
    await recordAudit(trx, args.audit(row.id));
    return row;
  });
  const worker = new Worker(workerFile(), { workerData: { schedule: args.schedule, spec: args.spec } });
  running.set(row.id, worker);
  worker.on('message', async (message: { progress?: number; done?: SimulationResult; failed?: string }) => {
    try {
      if (message.done) return await finish(row.id, { status: 'done', result: message.done });
      if (message.failed) return await finish(row.id, { status: 'failed', error: message.failed });
      if (message.progress !== undefined) {
        const updated = await db
          .updateTable('volatility_simulation')
          .set({ progress: message.progress })
          .where('id', '=', row.id)
          .where('status', '=', 'running')
          .returning('id')
          .executeTakeFirst();
        // No running row: it was cancelled (perhaps from another server).
        if (!updated) await stopLocal(row.id);
      }
    } catch (error) {
      console.error('[leeway] simulation bookkeeping failed', row.id, error);
    }
  });
  worker.on('error', (error) => void finish(row.id, { status: 'failed', error: error.message }));
  return row.id;
}

async function stopLocal(id: string) {
  const worker = running.get(id);
  running.delete(id);
  await worker?.terminate();
}

/** Marks a running simulation cancelled and stops it; returns false when it had already ended. */
export async function cancelSimulation(orgId: string, id: string): Promise<boolean> {
  const updated = await db
    .updateTable('volatility_simulation')
    .set({ status: 'cancelled', finished_at: new Date() })
    .where('organization_id', '=', orgId)
    .where('id', '=', id)
    .where('status', '=', 'running')
    .returning('id')
    .executeTakeFirst();
  await stopLocal(id);
  return !!updated;
}

export async function findSimulation(orgId: string, id: string) {
  return db.selectFrom('volatility_simulation').selectAll().where('organization_id', '=', orgId).where('id', '=', id).executeTakeFirst();
}
