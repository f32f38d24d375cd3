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
import { databaseUrl } from '@/lib/env';
import type { DB } from './types';

declare global {
  var leewayPool: pg.Pool | undefined;
}

/** One pool per process (kept across hot reloads in development). */
export const pool: pg.Pool = globalThis.leewayPool ?? new pg.Pool({ connectionString: databaseUrl(), max: 10 });
if (process.env.NODE_ENV !== 'production') globalThis.leewayPool = pool;

export const db = new Kysely<DB>({ dialect: new PostgresDialect({ pool }) });

export type Database = Kysely<DB>;
