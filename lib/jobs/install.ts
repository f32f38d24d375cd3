/**
 * Creates pg-boss's schema (`pgboss`, its own migrations) and Leeway's queues with their
 * policies; run by `npm run migrate up`, so the app can queue jobs before any worker has started.
 * Idempotent: an existing queue has its policy brought up to date.
 */
import PgBoss from 'pg-boss';
import { databaseUrl } from '../env';
import { QUEUE_POLICIES, QUEUES, type QueueName } from './queues';

// Every queue, dead-letter queues first: a queue's dead-letter queue must exist before it.
const deadLetters = new Set(Object.values(QUEUE_POLICIES).map((policy) => policy.deadLetter));
const ORDER: QueueName[] = [
  ...Object.values(QUEUES).filter((name) => deadLetters.has(name)),
  ...Object.values(QUEUES).filter((name) => !deadLetters.has(name)),
];

export async function installQueues(connectionString = databaseUrl()): Promise<void> {
  const boss = new PgBoss({ connectionString, max: 1, supervise: false, schedule: false });
  boss.on('error', (error) => console.error('[leeway] queue install:', error.message));
  await boss.start();
  try {
    for (const name of ORDER) {
      await boss.createQueue(name, QUEUE_POLICIES[name]);
      await boss.updateQueue(name, QUEUE_POLICIES[name]);
    }
  } finally {
    await boss.stop({ graceful: false });
  }
}
