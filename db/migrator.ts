/**
 * Runs the migrations listed in migrations/index.ts (each NNNN_name.ts with up/down on
 * Kysely<any>). Used by scripts/migrate.ts, the start command and the database tests.
 */
import { Migrator, type Kysely, type MigrationResultSet } from 'kysely';
import { migrations } from '../migrations';

export function migrator(db: Kysely<any>): Migrator {
  return new Migrator({ db, provider: { getMigrations: async () => migrations } });
}

/** Throws with the failing migration's name when a step fails. */
export function assertMigrated({ error, results }: MigrationResultSet): void {
  if (!error) return;
  const failed = results?.find((r) => r.status === 'Error');
  throw new Error(`migration ${failed?.migrationName ?? '(unknown)'} failed: ${String((error as Error).message ?? error)}`);
}
