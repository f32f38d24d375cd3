/**
 * Monte Carlo volatility estimates run as jobs: the specification and seed, progress, status and
 * result are kept in PostgreSQL so any app server can report on (or cancel) a run another one
 * started. Valuation runs also record where the case's volatility came from.
 * Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('volatility_simulation')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('case_id', 'text', (c) => c.notNull().references('case.id').onDelete('cascade'))
    .addColumn('spec', 'jsonb', (c) => c.notNull())
    .addColumn('status', 'text', (c) => c.notNull().defaultTo('running'))
    .addColumn('progress', 'double precision', (c) => c.notNull().defaultTo(0))
    .addColumn('result', 'jsonb')
    .addColumn('error', 'text')
    .addColumn('created_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('finished_at', 'timestamptz')
    .addCheckConstraint('volatility_simulation_status', sql`status in ('running', 'done', 'cancelled', 'failed')`)
    .execute();
  await db.schema.createIndex('volatility_simulation_case_idx').on('volatility_simulation').columns(['organization_id', 'case_id', 'created_at']).execute();
  await db.schema.alterTable('valuation_run').addColumn('volatility_source', 'jsonb').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('valuation_run').dropColumn('volatility_source').execute();
  await db.schema.dropTable('volatility_simulation').ifExists().execute();
}
