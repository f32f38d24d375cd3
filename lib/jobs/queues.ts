/**
 * The job queues (pg-boss, in PostgreSQL's `pgboss` schema) and what each may do on failure.
 * A queue's policy is written once here and applied by `npm run migrate`: retries only where a
 * second attempt is safe, a deadline after which PostgreSQL itself fails a job whose worker died,
 * and a dead-letter queue where the app must learn that a job gave up (its row is then marked
 * failed, so nothing shows "running" for ever).
 */
import type PgBoss from 'pg-boss';
import type { CashFlowSchedule } from '../cash-flows';
import type { SimulationSpec } from '../volatility/monte-carlo';

/** Seconds a worker lets a Monte Carlo estimate run before it is stopped and marked failed. */
export const SIMULATION_DEADLINE_SECONDS = Number(process.env.SIMULATION_DEADLINE_SECONDS ?? 600);

/** Seconds a worker lets a cross-check run before it is stopped and marked failed. */
export const CROSS_CHECK_DEADLINE_SECONDS = Number(process.env.CROSS_CHECK_DEADLINE_SECONDS ?? 300);

export const QUEUES = {
  mail: 'mail',
  boardPack: 'board-pack',
  simulation: 'volatility-simulation',
  simulationGaveUp: 'volatility-simulation-gave-up',
  revaluation: 'portfolio-revaluation',
  revaluationGaveUp: 'portfolio-revaluation-gave-up',
  watchCheck: 'watch-check',
  watchDaily: 'watch-daily',
  crossCheck: 'cross-check',
  crossCheckGaveUp: 'cross-check-gave-up',
} as const;

/** When the daily check of every followed case runs (cron, UTC). */
export const WATCH_DAILY_CRON = process.env.WATCH_DAILY_CRON ?? '0 6 * * *';

export type QueueName = (typeof QUEUES)[keyof typeof QUEUES];

/** A board pack attached to an e-mail by reference: the worker reads the stored PDF. */
export interface BoardPackAttachment {
  orgId: string;
  snapshotId: string;
  pageSize: 'A4' | 'LETTER';
  filename: string;
}

export interface MailJob {
  to: string;
  subject: string;
  text: string;
  html?: string;
  boardPack?: BoardPackAttachment;
}

/** Render every page size of an approved snapshot's pack, then send `mail` with the A4 one attached. */
export interface BoardPackJob {
  orgId: string;
  snapshotId: string;
  mail?: Omit<MailJob, 'boardPack'> & { filename: string };
}

export interface SimulationJob {
  simulationId: string;
  schedule: CashFlowSchedule;
  spec: SimulationSpec;
}

export interface RevaluationJob {
  revaluationId: string;
  orgId: string;
  /** Who asked: the runs and their audit entries are theirs. */
  userId: string;
}

export interface WatchCheckJob {
  orgId: string;
  caseId: string;
}

export interface CrossCheckJob {
  crossCheckId: string;
}

export interface JobData {
  [QUEUES.mail]: MailJob;
  [QUEUES.boardPack]: BoardPackJob;
  [QUEUES.simulation]: SimulationJob;
  [QUEUES.simulationGaveUp]: SimulationJob;
  [QUEUES.revaluation]: RevaluationJob;
  [QUEUES.revaluationGaveUp]: RevaluationJob;
  [QUEUES.watchCheck]: WatchCheckJob;
  [QUEUES.watchDaily]: Record<string, never>;
  [QUEUES.crossCheck]: CrossCheckJob;
  [QUEUES.crossCheckGaveUp]: CrossCheckJob;
}

/**
 * Retries: an e-mail may be sent again (a duplicate is better than none) with backoff while the
 * mail server is away; a board pack is rendered idempotently; a seeded simulation gives the same
 * answer on every attempt, so a worker that died mid-run is simply replaced. `expireInSeconds` is
 * the deadline after which pg-boss's maintenance fails (or retries) a job left active.
 */
export const QUEUE_POLICIES: Record<QueueName, PgBoss.Queue> = {
  [QUEUES.mail]: { name: QUEUES.mail, retryLimit: 6, retryDelay: 5, retryBackoff: true, expireInSeconds: 60 },
  [QUEUES.boardPack]: { name: QUEUES.boardPack, retryLimit: 3, retryDelay: 5, retryBackoff: true, expireInSeconds: 180 },
  [QUEUES.simulation]: {
    name: QUEUES.simulation,
    retryLimit: 2,
    retryDelay: 2,
    retryBackoff: false,
    // The worker stops a run at its own deadline; the queue's is later, for a worker that died.
    expireInSeconds: SIMULATION_DEADLINE_SECONDS + 15,
    deadLetter: QUEUES.simulationGaveUp,
  },
  [QUEUES.simulationGaveUp]: { name: QUEUES.simulationGaveUp, retryLimit: 5, retryDelay: 5, retryBackoff: true, expireInSeconds: 60 },
  // A second attempt re-values only what is still stale, so a retry is safe.
  [QUEUES.revaluation]: {
    name: QUEUES.revaluation,
    retryLimit: 2,
    retryDelay: 5,
    retryBackoff: true,
    expireInSeconds: 1800,
    deadLetter: QUEUES.revaluationGaveUp,
  },
  [QUEUES.revaluationGaveUp]: { name: QUEUES.revaluationGaveUp, retryLimit: 5, retryDelay: 5, retryBackoff: true, expireInSeconds: 60 },
  // A check announces each change once (unique alert keys), so running it again is safe.
  [QUEUES.watchCheck]: { name: QUEUES.watchCheck, retryLimit: 3, retryDelay: 10, retryBackoff: true, expireInSeconds: 300 },
  [QUEUES.watchDaily]: { name: QUEUES.watchDaily, retryLimit: 2, retryDelay: 60, retryBackoff: true, expireInSeconds: 300 },
  // Seeded like a simulation: a second attempt gives the same answer.
  [QUEUES.crossCheck]: {
    name: QUEUES.crossCheck,
    retryLimit: 2,
    retryDelay: 2,
    retryBackoff: false,
    expireInSeconds: CROSS_CHECK_DEADLINE_SECONDS + 15,
    deadLetter: QUEUES.crossCheckGaveUp,
  },
  [QUEUES.crossCheckGaveUp]: { name: QUEUES.crossCheckGaveUp, retryLimit: 5, retryDelay: 5, retryBackoff: true, expireInSeconds: 60 },
};
