/**
 * Organisation defaults (currency, risk-free rate, WACC, fiscal calendar) and the audit log.
 * Rates are fractions per year in double precision (0.04 = 4 %), as the engine reads them.
 * Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('organization_settings')
    .addColumn('organization_id', 'text', (c) => c.primaryKey().references('organization.id').onDelete('cascade'))
    .addColumn('currency', 'text', (c) => c.notNull().defaultTo('EUR'))
    .addColumn('risk_free_rate', 'double precision', (c) => c.notNull().defaultTo(0.03))
    .addColumn('wacc', 'double precision', (c) => c.notNull().defaultTo(0.08))
    .addColumn('fiscal_year_start_month', 'integer', (c) => c.notNull().defaultTo(1))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addCheckConstraint('organization_settings_currency_code', sql`currency ~ '^[A-Z]{3}$'`)
    .addCheckConstraint('organization_settings_month', sql`fiscal_year_start_month between 1 and 12`)
    .execute();

  await db.schema
    .createTable('audit_log')
    .addColumn('id', 'bigserial', (c) => c.primaryKey())
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('actor_id', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('action', 'text', (c) => c.notNull())
    .addColumn('subject_type', 'text', (c) => c.notNull())
    .addColumn('subject_id', 'text')
    .addColumn('detail', 'jsonb', (c) => c.notNull().defaultTo(sql`'{}'::jsonb`))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('audit_log_org_time_idx').on('audit_log').columns(['organization_id', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('audit_log').ifExists().execute();
  await db.schema.dropTable('organization_settings').ifExists().execute();
}
