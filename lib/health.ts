/**
 * What `/api/health` reports: can the app reach its database, does the engine answer a tiny
 * canary valuation within its deadline, and is the job queue worked. Each check is bounded and
 * never throws: a failed check is reported, not raised.
 */
import 'server-only';
import { db } from '@/db';
import { ping } from '@/db/queries/ping';
import { ENGINE_VERSION, type ProjectModel } from '@/lattice';
import { enginePoolStats, valueInWorker } from './engine/pool';
import { AppError } from './errors';
import { queueHealth, type QueueHealth } from './jobs/queue-health';
import { sharedFor } from './shared-answer';

/** A valuation small enough to answer in milliseconds: it proves a worker is alive. */
const canary: ProjectModel = {
  underlying: { value: 100, volatility: 0.3 },
  riskFreeRate: 0.03,
  horizon: 1,
  steps: 4,
  options: [{ kind: 'abandon', salvage: 90, window: { kind: 'american', from: 0, to: 1 } }],
};

async function databaseCheck(): Promise<{ database: 'ok' | 'unreachable'; databaseMs: number }> {
  const started = performance.now();
  try {
    await ping(db);
    return { database: 'ok', databaseMs: Math.round(performance.now() - started) };
  } catch {
    return { database: 'unreachable', databaseMs: Math.round(performance.now() - started) };
  }
}

async function engineCheck(): Promise<{ engine: 'ok' | 'busy' | 'unavailable'; engineMs: number }> {
  const started = performance.now();
  try {
    await valueInWorker(canary, { extras: false }, { owner: 'health-check', deadlineMs: 5_000 });
    return { engine: 'ok', engineMs: Math.round(performance.now() - started) };
  } catch (error) {
    // A full queue is load, not an outage; anything else (a deadline, a dead worker) is.
    const busy = error instanceof AppError && error.code === 'rate_limited';
    return { engine: busy ? 'busy' : 'unavailable', engineMs: Math.round(performance.now() - started) };
  }
}

/** The job queue's state; null when the database cannot be asked (reported above). */
async function jobsCheck(): Promise<QueueHealth | null> {
  try {
    return await queueHealth();
  } catch {
    return null;
  }
}

async function check() {
  const [database, engine, jobs] = await Promise.all([databaseCheck(), engineCheck(), jobsCheck()]);
  // A queue with no worker delays e-mail and simulations but serves every page: reported, not failed.
  const healthy = database.database === 'ok' && engine.engine !== 'unavailable';
  return { healthy, report: { status: healthy ? 'ok' : 'degraded', ...database, ...engine, queue: enginePoolStats(), jobs, engineVersion: ENGINE_VERSION } };
}

/**
 * The report, one check at a time shared by every request meanwhile, and a healthy one kept for
 * a second: the route needs no sign-in, and a flood of it held the database pool (two queries
 * each) and the engine's queue (a canary each) from signed-in work. A degraded report is not
 * kept, so a recovery shows on the next request.
 */
export const healthReport = sharedFor(1_000, check, (answer) => answer.healthy);
