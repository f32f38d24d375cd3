/** The cheapest round trip, for the health check: does the database answer? Throws when it does not. */
import { sql } from 'kysely';
import type { Database } from '../index';

export async function ping(db: Database): Promise<void> {
  await sql`select 1`.execute(db);
}
