/**
 * The database handle: one pg Pool shared by Kysely and better-auth.
 *
 * Numbers: pg returns `numeric` and `bigint` as strings. Leeway stores model inputs and money
 * amounts as `double precision` (the engine computes in doubles anyway, and no column needs
 * exact decimal arithmetic), counts as `integer`, so nothing arrives as a string; the one
 * `bigint` we read (COUNT(*)) is cast to integer in SQL where it is used.
 */
import { Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';
import { databaseUrl } from './url';
import type { DB } from './types';

declare global {
  var leewayPool: pg.Pool | undefined;
}

/**
 * One pool per process, kept on globalThis: Next.js loads this module once for pages and once for
 * route handlers (and again on a hot reload in development), and a pool per copy held up to 20
 * connections where 10 was meant (measured on `npm start` after the load script).
 *
 * Bounded waits: a connection that cannot be had in 5 s, or a statement running over 30 s, fails
 * that request (503 or 500) instead of holding it. An idle client whose server went away emits 'error' on the pool; it is
 * logged and dropped, and the pool reconnects when PostgreSQL is back, with no restart.
 */
function newPool(): pg.Pool {
  const created = new pg.Pool({
    connectionString: databaseUrl(),
    max: 10,
    connectionTimeoutMillis: 5_000,
    idleTimeoutMillis: 30_000,
    statement_timeout: 30_000,
  });
  created.on('error', (error) => console.error('[leeway] database connection lost:', error.message));
  return created;
}

globalThis.leewayPool ??= newPool();
export const pool: pg.Pool = globalThis.leewayPool;

export const db = new Kysely<DB>({ dialect: new PostgresDialect({ pool }) });

export type Database = Kysely<DB>;
