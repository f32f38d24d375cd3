/**
 * Cross-checks: an independent least-squares Monte Carlo of a case version's model, run as a
 * job (docs/engine.md §11). The row keeps the model checked, the case version and the engine
 * version it was compared with, the seed and paths, progress, status and result, so any app
 * server can report on (or cancel) a run and the comparison can be read again later.
 * Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('cross_check')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('case_id', 'text', (c) => c.notNull().references('case.id').onDelete('cascade'))
    .addColumn('case_version', 'integer', (c) => c.notNull())
    .addColumn('engine_version', 'text', (c) => c.notNull())
    .addColumn('model', 'jsonb', (c) => c.notNull())
    .addColumn('paths', 'integer', (c) => c.notNull())
    .addColumn('seed', 'integer', (c) => c.notNull())
    .addColumn('status', 'text', (c) => c.notNull().defaultTo('running'))
    .addColumn('progress', 'double precision', (c) => c.notNull().defaultTo(0))
    .addColumn('result', 'jsonb')
    .addColumn('error', 'text')
    .addColumn('created_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('finished_at', 'timestamptz')
    .addCheckConstraint('cross_check_status', sql`status in ('running', 'done', 'cancelled', 'failed')`)
    .execute();
  await db.schema.createIndex('cross_check_case_idx').on('cross_check').columns(['organization_id', 'case_id', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('cross_check').ifExists().execute();
}
