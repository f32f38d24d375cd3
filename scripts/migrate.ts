/**
 * `npm run migrate -- up|down|status`: up migrates to the latest (and installs the job queues,
 * lib/jobs/install.ts), down undoes the last one.
 * Uses DATABASE_URL, or the project-local cluster (PG_DATABASE picks the database).
 */
import { db } from '../db';
import { assertMigrated, migrator } from '../db/migrator';
import { installQueues } from '../lib/jobs/install';

async function main(command: string) {
  const m = migrator(db);
  if (command === 'up') {
    const result = await m.migrateToLatest();
    assertMigrated(result);
    const applied = result.results?.filter((r) => r.status === 'Success') ?? [];
    console.log(applied.length === 0 ? '› migrations: up to date' : applied.map((r) => `› migrated up: ${r.migrationName}`).join('\n'));
    await installQueues();
    console.log('› job queues: ready');
  } else if (command === 'down') {
    const result = await m.migrateDown();
    assertMigrated(result);
    console.log(result.results?.map((r) => `› migrated down: ${r.migrationName}`).join('\n') || '› nothing to undo');
  } else if (command === 'status') {
    for (const info of await m.getMigrations()) console.log(`${info.executedAt ? 'applied' : 'pending'}  ${info.name}`);
  } else {
    console.error('usage: npm run migrate -- up|down|status');
    process.exitCode = 2;
  }
  await db.destroy();
}

void main(process.argv[2] ?? 'up').catch(async (error) => {
  console.error(String(error.message ?? error));
  await db.destroy();
  process.exit(1);
});
