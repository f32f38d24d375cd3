/**
 * Supporting documents attached to a case (PDF, XLSX, CSV, PNG), stored in PostgreSQL with their
 * type as judged by content, size and fingerprint, and who uploaded them when.
 * Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('attachment')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('case_id', 'text', (c) => c.notNull().references('case.id').onDelete('cascade'))
    .addColumn('filename', 'text', (c) => c.notNull())
    .addColumn('kind', 'text', (c) => c.notNull())
    .addColumn('size', 'integer', (c) => c.notNull())
    .addColumn('sha256', 'text', (c) => c.notNull())
    .addColumn('data', 'bytea', (c) => c.notNull())
    .addColumn('uploaded_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('attachment_kind', sql`kind in ('pdf', 'xlsx', 'csv', 'png')`)
    .execute();
  await db.schema.createIndex('attachment_case_idx').on('attachment').columns(['organization_id', 'case_id', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('attachment').ifExists().execute();
}
