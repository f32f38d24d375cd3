/**
 * A Monte Carlo volatility estimate inside a Node worker thread (bundled by
 * scripts/build-engine-worker.sh into .data/simulation-worker.mjs): posts `{ progress }` about
 * every 2 % of the paths, then `{ done: result }` or `{ failed: message }`. Cancelling is
 * terminating the thread.
 */
import { parentPort, workerData } from 'node:worker_threads';
import type { CashFlowSchedule } from '../cash-flows';
import { simulateVolatility, type SimulationSpec } from './monte-carlo';

const { schedule, spec } = workerData as { schedule: CashFlowSchedule; spec: SimulationSpec };
try {
  const result = simulateVolatility(schedule, spec, (progress) => parentPort!.postMessage({ progress }));
  parentPort!.postMessage({ done: result });
} catch (error) {
  parentPort!.postMessage({ failed: error instanceof Error ? error.message : String(error) });
}
