/**
 * Prints the SQL better-auth would run for its tables with our configuration (run against an
 * empty database). Its output is committed as migrations/0001_auth_tables.ts; better-auth's own
 * CLI crashes on Node 20, and we do not migrate at run time.
 * Usage: PG_DATABASE=<empty db> npx tsx scripts/dev/print-auth-schema.ts
 */
import { getMigrations } from 'better-auth/db/migration';
import { auth } from '../../lib/auth';

async function main() {
  const { compileMigrations } = await getMigrations(auth.options);
  console.log(await compileMigrations());
  process.exit(0);
}
void main();
