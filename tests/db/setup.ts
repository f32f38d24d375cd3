/** Before each database test file: the schema at its latest migration. */
import { beforeAll } from 'vitest';
import { db } from '@/db';
import { assertMigrated, migrator } from '@/db/migrator';

beforeAll(async () => {
  assertMigrated(await migrator(db).migrateToLatest());
});
