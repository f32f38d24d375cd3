/**
 * Putting work on the queue from the app. Jobs are rows in PostgreSQL, written through the app's
 * own connection — inside the caller's transaction when one is given, so a job exists exactly
 * when the change that asked for it was committed (an approval and its e-mail, a simulation row
 * and its run). Only `npm run worker` processes take jobs off the queue.
 */
import { CompiledQuery, type Kysely, type Transaction } from 'kysely';
import PgBoss from 'pg-boss';
import { db } from '@/db';
import type { DB } from '@/db/types';
import { QUEUE_POLICIES, type JobData, type QueueName } from './queues';

export type Executor = Kysely<DB> | Transaction<DB>;

/** pg-boss's SQL run through Kysely, so it joins the caller's transaction. */
const through = (executor: Executor): PgBoss.Db => ({
  executeSql: async (text, values) => executor.executeQuery(CompiledQuery.raw(text, values)),
});

// Sending and cancelling need no started instance: no polling, no maintenance, no pool of its own.
let client: PgBoss | undefined;
const boss = () => (client ??= new PgBoss({ db: through(db) }));

export async function enqueue<Q extends QueueName>(queue: Q, data: JobData[Q], options: { executor?: Executor; id?: string } = {}): Promise<string> {
  const { name: _name, ...policy } = QUEUE_POLICIES[queue];
  const id = await boss().send(queue, data as object, { ...policy, id: options.id, db: through(options.executor ?? db) });
  if (!id) throw new Error(`the "${queue}" queue does not exist: run npm run migrate`);
  return id;
}

/** Cancels a job that has not finished; a worker running it notices through the app's own row. */
export async function cancelJob(queue: QueueName, id: string, executor: Executor = db): Promise<void> {
  await boss().cancel(queue, id, { db: through(executor) });
}
