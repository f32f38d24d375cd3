/**
 * Projects, their cases (named scenarios with a version for optimistic concurrency) and stored
 * valuation runs. A case keeps its inputs as JSON documents validated by the app's zod schemas
 * (cash-flow schedule, valuation settings, option templates); a run keeps the exact engine
 * input, the result, the engine version and a hash of the input.
 * Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('project')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('description', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('owner_id', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('currency', 'text', (c) => c.notNull())
    .addColumn('status', 'text', (c) => c.notNull().defaultTo('active'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('project_status', sql`status in ('active', 'archived')`)
    .addCheckConstraint('project_currency_code', sql`currency ~ '^[A-Z]{3}$'`)
    .execute();
  await db.schema.createIndex('project_org_idx').on('project').columns(['organization_id', 'name']).execute();

  await db.schema
    .createTable('case')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('project_id', 'text', (c) => c.notNull().references('project.id').onDelete('cascade'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('version', 'integer', (c) => c.notNull().defaultTo(1))
    .addColumn('status', 'text', (c) => c.notNull().defaultTo('draft'))
    .addColumn('cash_flows', 'jsonb', (c) => c.notNull())
    .addColumn('settings', 'jsonb', (c) => c.notNull())
    .addColumn('options', 'jsonb', (c) => c.notNull().defaultTo(sql`'[]'::jsonb`))
    .addColumn('created_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('case_version_positive', sql`version >= 1`)
    .execute();
  await db.schema.createIndex('case_project_idx').on('case').columns(['organization_id', 'project_id']).execute();

  await db.schema
    .createTable('valuation_run')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('case_id', 'text', (c) => c.notNull().references('case.id').onDelete('cascade'))
    .addColumn('case_version', 'integer', (c) => c.notNull())
    .addColumn('input', 'jsonb', (c) => c.notNull())
    .addColumn('input_hash', 'text', (c) => c.notNull())
    .addColumn('result', 'jsonb', (c) => c.notNull())
    .addColumn('engine_version', 'text', (c) => c.notNull())
    .addColumn('created_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('valuation_run_case_idx').on('valuation_run').columns(['organization_id', 'case_id', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('valuation_run').ifExists().execute();
  await db.schema.dropTable('case').ifExists().execute();
  await db.schema.dropTable('project').ifExists().execute();
}
