/**
 * Monte Carlo volatility estimates as jobs: a row in `volatility_simulation` holds the
 * specification (with its seed), progress, status and result, so any app server can report on a
 * run; the run itself is a job on the `volatility-simulation` queue (lib/jobs/queues.ts) whose id
 * is the row's, taken by whichever worker process is free (lib/jobs/run-simulation.ts).
 */
import 'server-only';
import { db } from '@/db';
import { lockForOrganisation } from '@/db/queries/locks';
import { recordAudit, type AuditEvent } from '@/db/queries/audit';
import { countRunningJobs, markJobCancelled } from '@/db/queries/job-rows';
import { findSimulation as findSimulationRow, insertSimulation } from '@/db/queries/simulations';
import type { CashFlowSchedule } from '../cash-flows';
import { AppError } from '../errors';
import { cancelJob, enqueue } from '../jobs/enqueue';
import { QUEUES } from '../jobs/queues';
import type { SimulationSpec } from './monte-carlo';

/** Estimates one organisation may have waiting or running at once, so no team crowds out the others. */
export const SIMULATIONS_PER_ORGANISATION = Number(process.env.SIMULATIONS_PER_ORGANISATION ?? 3);

export async function startSimulation(args: {
  orgId: string;
  caseId: string;
  userId: string;
  schedule: CashFlowSchedule;
  spec: SimulationSpec;
  /** The audit entry for the new run, written in the transaction that stores it. */
  audit: (simulationId: string) => AuditEvent;
}): Promise<string> {
  return db.transaction().execute(async (trx) => {
    // One organisation's requests are counted one at a time (the lock), so the limit holds under a burst.
    await lockForOrganisation(trx, 'volatility_simulation', args.orgId);
    if ((await countRunningJobs(trx, 'volatility_simulation', { orgId: args.orgId })) >= SIMULATIONS_PER_ORGANISATION)
      throw new AppError(
        'rate_limited',
        `Your organisation already has ${SIMULATIONS_PER_ORGANISATION} Monte Carlo estimates waiting or running; wait for one to finish, or cancel one, and try again.`,
        undefined,
        15,
      );
    const id = await insertSimulation(trx, { orgId: args.orgId, caseId: args.caseId, spec: args.spec, userId: args.userId });
    await recordAudit(trx, args.audit(id));
    await enqueue(QUEUES.simulation, { simulationId: id, schedule: args.schedule, spec: args.spec }, { executor: trx, id });
    return id;
  });
}

/** Marks a running simulation cancelled and withdraws its job; returns false when it had already ended. */
export async function cancelSimulation(orgId: string, id: string): Promise<boolean> {
  return db.transaction().execute(async (trx) => {
    const cancelled = await markJobCancelled(trx, 'volatility_simulation', { orgId, id });
    if (cancelled) await cancelJob(QUEUES.simulation, id, trx);
    return cancelled;
  });
}

export async function findSimulation(orgId: string, id: string) {
  return findSimulationRow(db, { orgId, id });
}
