/**
 * Reproducible runs: each valuation run keeps the SHA-256 of its result in canonical JSON
 * (RFC 8785), so a re-run of its stored model can say whether it reproduces. Runs stored before
 * this have none; their hash is computed from the stored result when asked (the same value).
 * Frozen in time: this file never imports application code.
 */
import type { Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('valuation_run').addColumn('result_hash', 'text').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('valuation_run').dropColumn('result_hash').execute();
}
