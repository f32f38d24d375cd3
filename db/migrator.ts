/**
 * Runs the migrations in migrations/ (NNNN_name.ts, each with up/down on Kysely<any>).
 * Used by scripts/migrate.ts, the start command and the database tests.
 */
import { promises as fs } from 'node:fs';
import path from 'node:path';
import { FileMigrationProvider, Migrator, type Kysely, type MigrationResultSet } from 'kysely';

export function migrator(db: Kysely<any>): Migrator {
  return new Migrator({
    db,
    provider: new FileMigrationProvider({ fs, path, migrationFolder: path.join(/*turbopackIgnore: true*/ process.cwd(), 'migrations') }),
  });
}

/** Throws with the failing migration's name when a step fails. */
export function assertMigrated({ error, results }: MigrationResultSet): void {
  if (!error) return;
  const failed = results?.find((r) => r.status === 'Error');
  throw new Error(`migration ${failed?.migrationName ?? '(unknown)'} failed: ${String((error as Error).message ?? error)}`);
}
