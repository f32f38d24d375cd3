/**
 * The worker: takes jobs off every queue (lib/jobs/queues.ts) and runs them. Any number of
 * workers may run, on this machine or others, against the same database; pg-boss hands each job
 * to one of them. Its maintenance fails or retries the jobs of a worker that died, once their
 * deadline has passed, so nothing stays "active" for ever.
 */
import PgBoss from 'pg-boss';
import { databaseUrl } from '../env';
import { checkEveryWatch, checkWatch } from './check-watch';
import { deliverMail } from './deliver-mail';
import { QUEUES, WATCH_DAILY_CRON, type JobData, type QueueName } from './queues';
import { renderBoardPacks } from './render-board-packs';
import { markRevaluationGaveUp, revaluePortfolio } from './revalue-portfolio';
import { markCrossCheckGaveUp, runCrossCheckJob } from './run-cross-check';
import { markSimulationGaveUp, runSimulation } from './run-simulation';
import { stopAllThreads } from './thread-job';

const seconds = (name: string, fallback: number) => Number(process.env[name] ?? fallback);

/** Jobs of each queue one worker process runs at once (simulations and cross-checks are the CPU-heavy ones). */
const CONCURRENCY: Record<QueueName, number> = {
  [QUEUES.mail]: 2,
  [QUEUES.boardPack]: 1,
  [QUEUES.simulation]: seconds('WORKER_SIMULATIONS', 1),
  [QUEUES.simulationGaveUp]: 1,
  [QUEUES.revaluation]: 1,
  [QUEUES.revaluationGaveUp]: 1,
  [QUEUES.watchCheck]: 1,
  [QUEUES.watchDaily]: 1,
  [QUEUES.crossCheck]: seconds('WORKER_CROSS_CHECKS', 1),
  [QUEUES.crossCheckGaveUp]: 1,
};

const HANDLERS: { [Q in QueueName]: (data: JobData[Q]) => Promise<void> } = {
  [QUEUES.mail]: deliverMail,
  [QUEUES.boardPack]: renderBoardPacks,
  [QUEUES.simulation]: runSimulation,
  [QUEUES.simulationGaveUp]: markSimulationGaveUp,
  [QUEUES.revaluation]: revaluePortfolio,
  [QUEUES.revaluationGaveUp]: markRevaluationGaveUp,
  [QUEUES.watchCheck]: checkWatch,
  [QUEUES.watchDaily]: checkEveryWatch,
  [QUEUES.crossCheck]: runCrossCheckJob,
  [QUEUES.crossCheckGaveUp]: markCrossCheckGaveUp,
};

export interface RunningWorker {
  /** Stops taking jobs; simulations and cross-checks go back on the queue at once, other jobs get `graceMs` to finish. */
  stop(graceMs?: number): Promise<void>;
}

export async function startWorker(): Promise<RunningWorker> {
  const boss = new PgBoss({
    connectionString: databaseUrl(),
    max: 4,
    // How often a worker looks for jobs a dead worker left active past their deadline.
    maintenanceIntervalSeconds: seconds('JOB_MAINTENANCE_SECONDS', 30),
    migrate: false,
    // Cron schedules (the daily check of followed cases); with several workers pg-boss sends each
    // scheduled job once.
    schedule: true,
  });
  // Without a listener an 'error' event (a lost connection while PostgreSQL restarts) would end the process.
  boss.on('error', (error) => console.error('[leeway worker] queue:', error.message));
  await boss.start();
  await boss.schedule(QUEUES.watchDaily, WATCH_DAILY_CRON, {}, { tz: 'UTC' });
  for (const queue of Object.keys(HANDLERS) as QueueName[]) {
    const handle = HANDLERS[queue] as (data: unknown) => Promise<void>;
    for (let k = 0; k < CONCURRENCY[queue]; k++)
      await boss.work(queue, { pollingIntervalSeconds: 1 }, async ([job]) => {
        if (!job) return;
        try {
          await handle(job.data);
        } catch (error) {
          // Logged here (pg-boss keeps only the last attempt's error), then thrown so the queue retries.
          console.error(`[leeway worker] ${queue} job ${job.id} failed:`, error instanceof Error ? error.message : error);
          throw error;
        }
      });
  }
  return {
    async stop(graceMs = 7_000) {
      await stopAllThreads();
      // pg-boss records a failed handler's job without waiting; give it a moment before closing its pool.
      await new Promise((resolve) => setTimeout(resolve, 500));
      await boss.stop({ graceful: true, timeout: graceMs });
    },
  };
}
