/**
 * Re-valuing a portfolio is a job: one row per request keeps its progress (cases done of the
 * cases taken), status and outcome, so any app server can report on it while a worker runs it.
 * Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('portfolio_revaluation')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('requested_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('status', 'text', (c) => c.notNull().defaultTo('running'))
    .addColumn('total', 'integer')
    .addColumn('done', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('failed', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('error', 'text')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('finished_at', 'timestamptz')
    .addCheckConstraint('portfolio_revaluation_status', sql`status in ('running', 'done', 'failed')`)
    .execute();
  await db.schema.createIndex('portfolio_revaluation_org_idx').on('portfolio_revaluation').columns(['organization_id', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('portfolio_revaluation').ifExists().execute();
}
